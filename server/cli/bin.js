#!/usr/bin/env node
// The `latchet` command: registers tsx so the TypeScript CLI runs without a build step.
import { register } from 'tsx/esm/api';
register();
await import('./latchet.ts');
