// The README's spec example is what `latchet spec --preset collar` prints: the documented file
// format stays true as the schema grows.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseSpec, presetSpec } from '@shared/pattern/index.ts';

const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');

describe('README spec example', () => {
  it('when the collar example is parsed, then it is a valid spec equal to the collar preset', () => {
    const section = readme.slice(readme.indexOf('Example: the collar preset'));
    const json = /```json\n([\s\S]*?)\n```/.exec(section)?.[1];
    expect(json, 'README has a ```json block after "Example: the collar preset"').toBeDefined();
    const spec = parseSpec(JSON.parse(json!));
    expect(spec).toEqual(presetSpec('collar'));
  });
});
