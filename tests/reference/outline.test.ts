// The cut outline of each end shape against closed-form geometry and against
// svg-path-properties (an independent SVG path measurer; it approximates curves, so we
// compare with a tolerance).
import { svgPathProperties } from 'svg-path-properties';
import { describe, expect, it } from 'vitest';
import { computeLayout, drawLayout, presetSpec, type StrapSpec } from '@shared/pattern/index.ts';
import type { EndShape } from '@shared/schemas/strap-spec.ts';
import { pathData } from '@shared/render/svg.ts';
import type { PathItem } from '@shared/render/drawing.ts';

const W = 25.4;
const H = W / 2;
const L = 300;

/** A plain strap (no holes, no fit) with the given tip shape and a square start. */
function plainStrap(shape: EndShape, width = W): StrapSpec {
  const s = presetSpec('bracelet');
  return {
    ...s,
    widthMm: width,
    mode: 'rule',
    rule: { measure: 'fixed', blankMm: L },
    edgeGuideMm: 3,
    pieces: [{ ...s.pieces[0]!, start: { kind: 'plain', holes: [], shape: { kind: 'square' } }, end: { kind: 'plain', holes: [], shape } }],
  };
}

function paths(spec: StrapSpec) {
  const d = drawLayout(computeLayout(spec), spec, { labels: false });
  const items = d.pieces[0]!.items.filter((i): i is PathItem => i.type === 'path');
  return { cut: pathData(items.find((i) => i.layer === 'cut')!.commands), guide: pathData(items.find((i) => i.layer === 'guide')!.commands) };
}

function sample(d: string, n = 4000) {
  const p = new svgPathProperties(d);
  const len = p.getTotalLength();
  return { len, pts: Array.from({ length: n }, (_, i) => p.getPointAtLength((i / n) * len)) };
}

function shoelace(pts: { x: number; y: number }[]): number {
  let a = 0;
  for (let i = 0; i < pts.length; i++) {
    const p = pts[i]!, q = pts[(i + 1) % pts.length]!;
    a += p.x * q.y - q.x * p.y;
  }
  return Math.abs(a) / 2;
}

const rhoOf = (d: number) => (d * d + H * H) / (2 * H);
const cases: { name: string; shape: EndShape; perimeter: number; area: number }[] = [
  { name: 'square', shape: { kind: 'square' }, perimeter: 2 * L + 2 * W, area: L * W },
  { name: 'round (semicircle, r = w/2)', shape: { kind: 'round' }, perimeter: 2 * (L - H) + W + Math.PI * H, area: (L - H) * W + (Math.PI * H * H) / 2 },
  { name: 'round corners r 5', shape: { kind: 'round', radiusMm: 5 }, perimeter: 2 * L + 2 * W - 2 * (2 * 5 - (Math.PI * 5) / 2), area: L * W - 2 * 25 * (1 - Math.PI / 4) },
  { name: 'clipped c 6', shape: { kind: 'clipped', chamferMm: 6 }, perimeter: 2 * L + 2 * W - 2 * (12 - 6 * Math.SQRT2), area: L * W - 36 },
  {
    name: 'English point d 19',
    shape: { kind: 'english-point', depthMm: 19 },
    perimeter: (() => { const r = rhoOf(19); return 2 * (L - 19) + W + 2 * r * Math.acos(1 - H / r); })(),
    area: (() => { const r = rhoOf(19); const t = Math.acos(1 - H / r); return (L - 19) * W + 19 * H + r * r * (t - Math.sin(t)); })(),
  },
  { name: 'spear d 20', shape: { kind: 'spear', depthMm: 20 }, perimeter: 2 * (L - 20) + W + 2 * Math.hypot(20, H), area: (L - 20) * W + 20 * H },
];

describe('cut outline per end shape (closed form and svg-path-properties)', () => {
  for (const c of cases) {
    it(`when the tip is ${c.name}, then the SVG outline length and area match the closed form within 0.05 %`, () => {
      const { cut } = paths(plainStrap(c.shape));
      const { len, pts } = sample(cut);
      expect(Math.abs(len - c.perimeter) / c.perimeter).toBeLessThan(5e-4);
      expect(Math.abs(shoelace(pts) - c.area) / c.area).toBeLessThan(5e-4);
    });

    it(`when the tip is ${c.name}, then the edge guide stays 3 mm inside the outline (within 0.1 mm)`, () => {
      const { cut, guide } = paths(plainStrap(c.shape));
      const o = sample(cut, 3000).pts;
      for (const g of sample(guide, 300).pts) {
        const d = Math.min(...o.map((p) => Math.hypot(p.x - g.x, p.y - g.y)));
        // Near sharp corners the nearest outline point is the corner itself: never closer than 3 mm.
        expect(d).toBeGreaterThan(3 - 0.1);
        expect(d).toBeLessThan(3 / Math.sin(Math.PI / 8) + 0.1);
      }
    });
  }

  it('when a piece tapers linearly from 20 to 16 mm, then its area is the trapezoid (20 + 16)/2 x length', () => {
    const s = plainStrap({ kind: 'square' }, 20);
    s.pieces[0]!.taper = [{ atMm: 0, from: 'start', widthMm: 20 }, { atMm: 0, from: 'end', widthMm: 16 }];
    const { cut } = paths(s);
    const { pts } = sample(cut);
    expect(shoelace(pts)).toBeCloseTo(((20 + 16) / 2) * L, 0);
  });

  it('when an English point is shallower than half the width, then the engine refuses it naming the field and the limit', () => {
    expect(() => computeLayout(plainStrap({ kind: 'english-point', depthMm: 10 }))).toThrow(expect.objectContaining({ field: 'pieces.0.end.shape.depthMm', limit: 'at least 1/2 in' }));
  });
});
