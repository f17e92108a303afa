// Stitch rows on random straps (fast-check): every hole sits offsetMm inside the cut outline,
// on the blank, at the adjusted pitch along the row, with 4 x seam of thread (common practice).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { EndShape, StrapSpec } from '../schemas/strap-spec.ts';
import { computeLayout, EngineError, parseSpec, presetSpec } from './index.ts';
import { pieceOutline } from './outline.ts';
import { primEnd, primStart, type Prim, type Pt } from './prims.ts';
import { widthProfile } from './width-profile.ts';

const shapeArb: fc.Arbitrary<EndShape> = fc.oneof(
  fc.constant({ kind: 'square' as const }),
  fc.record({ kind: fc.constant('round' as const) }),
  fc.record({ kind: fc.constant('round' as const), radiusMm: fc.double({ min: 0.5, max: 20, noNaN: true }) }),
  fc.record({ kind: fc.constant('clipped' as const), chamferMm: fc.double({ min: 0.5, max: 20, noNaN: true }) }),
  fc.record({ kind: fc.constant('english-point' as const), depthMm: fc.double({ min: 20, max: 60, noNaN: true }) }),
  fc.record({ kind: fc.constant('spear' as const), depthMm: fc.double({ min: 1, max: 60, noNaN: true }) }),
);

const specArb = fc
  .record({
    width: fc.double({ min: 12, max: 40, noNaN: true }),
    start: shapeArb,
    end: shapeArb,
    taperTo: fc.option(fc.double({ min: 12, max: 40, noNaN: true }), { nil: undefined }),
    path: fc.constantFrom('both-edges' as const, 'top-edge' as const, 'bottom-edge' as const, 'around-start' as const, 'around-end' as const),
    from: fc.double({ min: 0, max: 120, noNaN: true }),
    to: fc.double({ min: 0, max: 120, noNaN: true }),
    offset: fc.double({ min: 1, max: 5, noNaN: true }),
    pitch: fc.double({ min: 2, max: 8, noNaN: true }),
  })
  .map((r): StrapSpec => {
    const s = presetSpec('bracelet');
    const piece = s.pieces[0]!;
    return {
      ...s,
      widthMm: r.width,
      rule: { measure: 'fixed', blankMm: 400 },
      mode: 'rule',
      pieces: [
        {
          ...piece,
          start: { kind: 'plain', holes: [], shape: r.start },
          end: { kind: 'plain', holes: [], shape: r.end },
          taper: r.taperTo === undefined ? [] : [{ atMm: 100, from: 'start', widthMm: r.width }, { atMm: 100, from: 'end', widthMm: r.taperTo }],
          // A row round an end takes in the whole end shape here; a row turning across the
          // strap short of the end (a U) is checked in stitch.test.ts.
          stitchRows: [{ path: r.path, fromMm: r.path === 'around-start' ? 0 : r.from, fromRef: 'start', toMm: r.path === 'around-end' ? 0 : r.to, toRef: 'end', offsetMm: r.offset, pitchMm: r.pitch, tolerancePct: 8 }],
        },
      ],
    };
  });

function distToPrim(p: Pt, q: Prim): number {
  if (q.type === 'line') {
    const dx = q.b.x - q.a.x, dy = q.b.y - q.a.y;
    const f = Math.min(1, Math.max(0, ((p.x - q.a.x) * dx + (p.y - q.a.y) * dy) / (dx * dx + dy * dy || 1)));
    return Math.hypot(p.x - q.a.x - f * dx, p.y - q.a.y - f * dy);
  }
  const t = Math.atan2(p.y - q.c.y, p.x - q.c.x);
  const lo = Math.min(q.a0, q.a1), hi = Math.max(q.a0, q.a1);
  for (let k = -2; k <= 2; k++) if (t + 2 * Math.PI * k >= lo && t + 2 * Math.PI * k <= hi) return Math.abs(Math.hypot(p.x - q.c.x, p.y - q.c.y) - q.r);
  const a = primStart(q), b = primEnd(q);
  return Math.min(Math.hypot(p.x - a.x, p.y - a.y), Math.hypot(p.x - b.x, p.y - b.y));
}

/** Even-odd test against the outline sampled finely (arcs as 64-gons). */
function inside(p: Pt, outline: readonly Prim[]): boolean {
  const poly: Pt[] = [];
  for (const q of outline) {
    if (q.type === 'line') poly.push(q.a);
    else for (let i = 0; i < 64; i++) { const t = q.a0 + ((q.a1 - q.a0) * i) / 64; poly.push({ x: q.c.x + q.r * Math.cos(t), y: q.c.y + q.r * Math.sin(t) }); }
  }
  let c = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i]!, b = poly[j]!;
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) c = !c;
  }
  return c;
}

describe('stitch rows along the whole outline (fast-check)', () => {
  it('when a random row is laid out on a random strap, then every hole is offsetMm inside the cut outline, on the blank, and the pitch along the row is even', () => {
    let rowsChecked = 0;
    fc.assert(
      fc.property(specArb, (spec) => {
        let layout;
        try {
          layout = computeLayout(parseSpec(spec));
        } catch (e) {
          expect(e).toBeInstanceOf(EngineError);
          return;
        }
        const p = layout.pieces[0]!;
        const ps = spec.pieces[0]!;
        const outline = pieceOutline(widthProfile(ps, spec.widthMm, p.blankLengthMm), ps.start.shape, ps.end.shape);
        const offset = ps.stitchRows[0]!.offsetMm;
        const tol = ps.stitchRows[0]!.tolerancePct / 100;
        const warned = layout.warnings.some((w) => w.code === 'stitch-pitch-off');
        for (const row of p.stitchRows) {
          rowsChecked++;
          for (const h of row.holes) {
            const d = Math.min(...outline.map((q) => distToPrim(h, q)));
            // Where a taper widens, the offset edges meet in a mitre (as the edge guide does), a
            // hair further than offsetMm from the bend: o / cos(bend / 2), under 0.5 % for these tapers.
            expect(Math.abs(d - offset)).toBeLessThan(0.005 * offset + 1e-6);
            expect(inside(h, outline)).toBe(true);
          }
          for (let i = 1; i < row.holes.length; i++) {
            const a = row.holes[i - 1]!, b = row.holes[i]!;
            // A chord is never longer than the arc it spans, and holes land on corners, so no
            // chord cuts one: within tolerance every spacing is at most the stretched pitch.
            if (!warned) expect(Math.hypot(b.x - a.x, b.y - a.y)).toBeLessThanOrEqual(row.pitchMm * (1 + tol) + 1e-6);
          }
          if (!warned) expect(Math.abs(row.adjustedPitchMm - row.pitchMm) / row.pitchMm).toBeLessThanOrEqual(tol + 1e-9);
          expect(row.threadMm).toBeCloseTo(4 * row.seamLengthMm, 6);
        }
      }),
      { numRuns: 400, seed: 20261202 },
    );
    expect(rowsChecked).toBeGreaterThan(150);
  });
});
