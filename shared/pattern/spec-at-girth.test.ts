import { describe, expect, it } from 'vitest';
import { computeLayout, EngineError, gradeSizes, presetSpec, specAtGirth } from './index.ts';
import type { StrapSpec } from '../schemas/strap-spec.ts';

const IN = 25.4;

/** The collar preset with a graded run: small and large sizes get their own width, holes and buckle. */
function gradedCollar(): StrapSpec {
  return {
    ...presetSpec('collar'),
    sizes: [
      { name: 'S', girthMm: 10 * IN, widthMm: 0.75 * IN, holes: { count: 3, spacingMm: 0.5 * IN } },
      { name: 'M', girthMm: 13 * IN },
      { name: 'XL', girthMm: 22 * IN, widthMm: 1.5 * IN, hardware: { buckleInsideWidthMm: 1.5 * IN } },
    ],
  };
}

describe('specAtGirth', () => {
  it('when fitted to a girth, then only the girth changes and the run is dropped', () => {
    const spec = gradedCollar();
    const one = specAtGirth(spec, { girthMm: 15 * IN });
    expect(one.girthMm).toBe(15 * IN);
    expect(one.sizes).toEqual([]);
    expect({ ...one, girthMm: spec.girthMm, sizes: spec.sizes }).toEqual(spec);
  });

  it('when fitted to a size, then the spec passed in is not changed', () => {
    const spec = gradedCollar();
    const before = structuredClone(spec);
    specAtGirth(spec, { sizeName: 'xl' });
    expect(spec).toEqual(before);
  });

  it('when a size names its width, holes and buckle, then the single-size spec carries them', () => {
    const s = specAtGirth(gradedCollar(), { sizeName: 'S' });
    expect(s.girthMm).toBe(10 * IN);
    expect(s.widthMm).toBeCloseTo(0.75 * IN, 9);
    const end = s.pieces[0]!.end;
    if (end.kind !== 'adjustable') throw new Error('collar tip is adjustable');
    expect(end.holes.count).toBe(3);
    expect(end.holes.spacingMm).toBeCloseTo(0.5 * IN, 9);
    // The middle of five stays the middle of three.
    expect(end.holes.middleHole).toBe(2);
    // The buckle follows the width when the size does not name one (bought to the strap's width).
    expect(s.hardware.buckle.insideWidthMm).toBeCloseTo(0.75 * IN, 9);
    // An English point keeps its proportion: 3/4 in deep on 1 in becomes 9/16 in on 3/4 in.
    expect(end.shape).toEqual({ kind: 'english-point', depthMm: expect.closeTo((0.75 * 0.75) * IN, 9) });
  });

  it('when the size names its buckle, then that buckle is used and the D-rings follow the width', () => {
    const s = specAtGirth(gradedCollar(), { sizeName: 'XL' });
    expect(s.hardware.buckle.insideWidthMm).toBeCloseTo(1.5 * IN, 9);
    expect(s.hardware.dRings.insideWidthMm).toBeCloseTo(1.5 * IN, 9);
  });

  it('when every size of the graded run is laid out, then each draws at its own width', () => {
    const spec = gradedCollar();
    const widths = spec.sizes.map((z) => computeLayout(specAtGirth(spec, { sizeName: z.name })).pieces[0]!.widthMm);
    expect(widths).toEqual([0.75 * IN, 1 * IN, 1.5 * IN].map((w) => expect.closeTo(w, 6)));
  });

  it('when gradeSizes runs the graded collar, then each row reports its graded width and hole range', () => {
    const r = gradeSizes(gradedCollar());
    expect(r.sizes.map((z) => z.widthMm)).toEqual([0.75 * IN, 1 * IN, 1.5 * IN].map((w) => expect.closeTo(w, 6)));
    // S: three holes 1/2 in apart span 1 in; M keeps five holes 3/4 in apart (3 in).
    expect(r.sizes[0]!.rangeMm[1] - r.sizes[0]!.rangeMm[0]).toBeCloseTo(1 * IN, 6);
    expect(r.sizes[1]!.rangeMm[1] - r.sizes[1]!.rangeMm[0]).toBeCloseTo(3 * IN, 6);
  });

  it('when the size is not in the run, then an EngineError on sizes lists the sizes there are', () => {
    try {
      specAtGirth(gradedCollar(), { sizeName: 'XXL' });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(EngineError);
      expect((e as EngineError).field).toBe('sizes');
      expect((e as EngineError).limit).toBe('one of S, M, XL');
    }
  });
});
