// Worker bootstrap: worker threads on Node 20 do not inherit the parent's `--import tsx`
// loader, so register tsx here (as server/cli/bin.js does) and load the TypeScript worker.
import { register } from 'tsx/esm/api';

register();
await import('./print-worker.ts');
