import { describe, expect, it } from 'vitest';
import { EngineError, gradeSizes, presetSpec } from './index.ts';

const IN = 25.4;

describe('gradeSizes', () => {
  it('when collars are graded 2 in apart with 3 in of holes, then neighbouring fit ranges overlap by 1 in', () => {
    const r = gradeSizes(presetSpec('collar'), [{ name: 'M', girthMm: 13 * IN }, { name: 'S', girthMm: 11 * IN }, { name: 'L', girthMm: 15 * IN }]);
    expect(r.sizes.map((s) => s.name)).toEqual(['S', 'M', 'L']);
    for (const s of r.sizes) expect(s.rangeMm[1] - s.rangeMm[0]).toBeCloseTo(3 * IN, 6);
    expect(r.joins).toEqual([
      { between: ['S', 'M'], kind: 'overlap', mm: expect.closeTo(IN, 6) },
      { between: ['M', 'L'], kind: 'overlap', mm: expect.closeTo(IN, 6) },
    ]);
  });

  it('when sizes are 5 in apart, then the report shows a 2 in gap no hole covers', () => {
    const r = gradeSizes(presetSpec('collar'), [{ name: 'S', girthMm: 11 * IN }, { name: 'XL', girthMm: 16 * IN }]);
    expect(r.joins[0]).toEqual({ between: ['S', 'XL'], kind: 'gap', mm: expect.closeTo(2 * IN, 6) });
  });

  it('when no sizes are given, then an EngineError names "sizes"', () => {
    expect(() => gradeSizes(presetSpec('belt'), [])).toThrow(EngineError);
  });
});
