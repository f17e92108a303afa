import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { codePointCount } from './draw-labels.ts';

describe('codePointCount', () => {
  it('when any string is counted, then it equals the code points the string iterator yields (ECMAScript String.prototype[@@iterator])', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: 'binary' }), fc.string({ unit: 'grapheme' }), fc.constantFrom('', '\uD800', '\uDC00\uD800', '😀😀', 'a\uD83D')), (s) => {
        expect(codePointCount(s)).toBe([...s].length);
      }),
      { numRuns: 5000, seed: 20261203 },
    );
  });
});
