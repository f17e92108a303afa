// Property tests (fast-check) over thousands of random specs derived from the presets.
import fc from 'fast-check';
import { Window } from 'happy-dom';
import { describe, expect, it } from 'vitest';
import type { EndShape, StrapSpec } from '../schemas/strap-spec.ts';
import { renderSvg } from '../render/svg.ts';
import { computeLayout, drawLayout, EngineError, parseSpec, presetSpec, PRESET_NAMES } from './index.ts';

const shapeArb: fc.Arbitrary<EndShape> = fc.oneof(
  fc.constant({ kind: 'square' as const }),
  fc.record({ kind: fc.constant('round' as const) }),
  fc.record({ kind: fc.constant('round' as const), radiusMm: fc.double({ min: 0.5, max: 40, noNaN: true }) }),
  fc.record({ kind: fc.constant('clipped' as const), chamferMm: fc.double({ min: 0.5, max: 40, noNaN: true }) }),
  fc.record({ kind: fc.constant('english-point' as const), depthMm: fc.double({ min: 1, max: 80, noNaN: true }) }),
  fc.record({ kind: fc.constant('spear' as const), depthMm: fc.double({ min: 1, max: 80, noNaN: true }) }),
);

/** A random spec: a preset with girth, width, thickness, mode, hole pattern and tip shape varied. */
const specArb: fc.Arbitrary<StrapSpec> = fc
  .record({
    preset: fc.constantFrom(...PRESET_NAMES),
    girth: fc.double({ min: 40, max: 2000, noNaN: true }),
    ease: fc.double({ min: -30, max: 80, noNaN: true }),
    width: fc.double({ min: 6, max: 60, noNaN: true }),
    oz: fc.double({ min: 1, max: 16, noNaN: true }),
    mode: fc.constantFrom('rule' as const, 'fit' as const),
    units: fc.constantFrom('in' as const, 'mm' as const),
    count: fc.integer({ min: 1, max: 9 }),
    nominal: fc.integer({ min: 0, max: 8 }),
    spacing: fc.double({ min: 3, max: 40, noNaN: true }),
    tipGap: fc.double({ min: 5, max: 150, noNaN: true }),
    shape: shapeArb,
    taperTo: fc.option(fc.double({ min: 4, max: 60, noNaN: true }), { nil: undefined }),
    taperFromEnd: fc.double({ min: 0, max: 400, noNaN: true }),
    stitch: fc.option(fc.record({ pitch: fc.double({ min: 2, max: 8, noNaN: true }), offset: fc.double({ min: 1, max: 6, noNaN: true }), path: fc.constantFrom('both-edges' as const, 'around-start' as const, 'top-edge' as const) }), { nil: undefined }),
  })
  .map((r) => {
    const s = presetSpec(r.preset);
    s.girthMm = r.girth;
    s.easeMm = r.ease;
    s.widthMm = r.width;
    s.thickness = { unit: 'oz', value: r.oz };
    s.mode = r.mode;
    s.units = r.units;
    const strap = s.pieces.find((p) => p.role === 'strap')!;
    // An optional taper from the given width at the start to `taperTo` near the end.
    strap.taper = r.taperTo === undefined ? [] : [{ atMm: 0, from: 'start', widthMm: r.width }, { atMm: r.taperFromEnd, from: 'end', widthMm: r.taperTo }];
    if (r.stitch) strap.stitchRows = [{ path: r.stitch.path, fromMm: 60, fromRef: 'start', toMm: 60, toRef: 'end', offsetMm: r.stitch.offset, pitchMm: r.stitch.pitch, tolerancePct: 5 }];
    if (strap.end.kind === 'adjustable') {
      strap.end.holes = { ...strap.end.holes, count: r.count, middleHole: r.nominal + 1, spacingMm: r.spacing, firstFromTipMm: r.tipGap };
    }
    strap.end.shape = r.shape;
    return s;
  });

function layoutOrEngineError(spec: unknown) {
  try {
    return computeLayout(parseSpec(spec));
  } catch (e) {
    expect(e).toBeInstanceOf(EngineError);
    expect((e as EngineError).field.length).toBeGreaterThan(0);
    return null;
  }
}

describe('engine properties (fast-check)', () => {
  it('when any random spec is laid out, then every feature lies on the blank, positions are finite and ordered, or the error is an EngineError with a field', () => {
    let laidOut = 0;
    fc.assert(
      fc.property(specArb, (spec) => {
        const layout = layoutOrEngineError(spec);
        if (!layout) return;
        laidOut++;
        for (const p of layout.pieces) {
          expect(Number.isFinite(p.blankLengthMm) && p.blankLengthMm > 0).toBe(true);
          let prev = -Infinity;
          for (const f of p.features) {
            const half = (f.diameterMm ?? f.lengthMm ?? 0) / 2;
            expect(Number.isFinite(f.atMm) && Number.isFinite(f.yMm)).toBe(true);
            expect(f.atMm - half).toBeGreaterThanOrEqual(-1e-6);
            expect(f.atMm + half).toBeLessThanOrEqual(p.blankLengthMm + 1e-6);
            expect(f.atMm).toBeGreaterThanOrEqual(prev);
            prev = f.atMm;
          }
          const halfAt = (x: number) => {
            const st = p.widthStations;
            const i = st.findIndex((s) => s.atMm >= x);
            // Past the last station (inside the end shape) the width stays the last station's.
            if (i < 0) return st[st.length - 1]!.widthMm / 2;
            if (i === 0) return st[0]!.widthMm / 2;
            const a = st[i - 1]!, b = st[i]!;
            return (a.widthMm + ((x - a.atMm) / (b.atMm - a.atMm || 1)) * (b.widthMm - a.widthMm)) / 2;
          };
          for (const row of p.stitchRows)
            for (const h of row.holes) {
              expect(h.x >= 0 && h.x <= p.blankLengthMm && Number.isFinite(h.y)).toBe(true);
              // Stitch holes stay inside the (tapered) edges.
              expect(Math.abs(h.y)).toBeLessThan(halfAt(h.x));
            }
        }
        const fit = layout.fit!;
        for (let i = 1; i < fit.holes.length; i++) expect(fit.holes[i]!.innerMm).toBeGreaterThan(fit.holes[i - 1]!.innerMm);
        expect(fit.rangeMm[0]).toBeLessThanOrEqual(fit.rangeMm[1]);
      }),
      { numRuns: 2000, seed: 20261202 },
    );
    // The generator must mostly produce drawable specs, or the property says little.
    expect(laidOut).toBeGreaterThan(600);
  });

  it('when a spec is laid out twice, then the warnings (codes and sentences) are the same each time', () => {
    fc.assert(
      fc.property(specArb, (spec) => {
        const a = layoutOrEngineError(spec);
        if (!a) return;
        const b = computeLayout(parseSpec(structuredClone(spec)));
        expect(b.warnings).toEqual(a.warnings);
        for (const w of a.warnings) {
          expect(w.code).toMatch(/^[a-z-]+$/);
          expect(w.message.length).toBeGreaterThan(10);
        }
      }),
      { numRuns: 1000, seed: 7 },
    );
  });

  it('when arbitrary JSON is given as a spec, then parsing either succeeds or throws an EngineError naming a field', () => {
    fc.assert(
      fc.property(fc.oneof(fc.anything(), specArb.chain((s) => fc.constantFrom(...Object.keys(s)).map((k) => ({ ...s, [k]: -1 })))), (input) => {
        layoutOrEngineError(input);
      }),
      { numRuns: 2000, seed: 11 },
    );
  });

  it('when the same spec is drawn and rendered twice, then the SVG bytes are the same', () => {
    const w = new Window();
    const dom = { window: w, document: w.document };
    fc.assert(
      fc.property(specArb, (spec) => {
        const layout = layoutOrEngineError(spec);
        if (!layout) return;
        const once = renderSvg(drawLayout(layout, spec), dom);
        const again = renderSvg(drawLayout(computeLayout(parseSpec(structuredClone(spec))), spec), dom);
        expect(again).toBe(once);
      }),
      { numRuns: 300, seed: 3 },
    );
  });
});
