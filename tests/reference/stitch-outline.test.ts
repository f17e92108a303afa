// Stitch rows that follow the offset of the whole cut outline, end shapes included, checked
// against closed-form circle and line geometry and against svg-path-properties (an
// independent SVG path measurer, which approximates curves: compared with a tolerance).
import { svgPathProperties } from 'svg-path-properties';
import { describe, expect, it } from 'vitest';
import { computeLayout, drawLayout, presetSpec, type StrapSpec } from '@shared/pattern/index.ts';
import type { EndShape } from '@shared/schemas/strap-spec.ts';
import type { PathItem } from '@shared/render/drawing.ts';
import { pathData } from '@shared/render/svg.ts';

const W = 25.4;
const H = W / 2;
const L = 300;
type Row = StrapSpec['pieces'][number]['stitchRows'][number];

function strap(shape: EndShape, row: Partial<Row>, startShape: EndShape = { kind: 'square' }): StrapSpec {
  const s = presetSpec('bracelet');
  return {
    ...s,
    widthMm: W,
    mode: 'rule',
    rule: { measure: 'fixed', blankMm: L },
    edgeGuideMm: row.offsetMm ?? 3,
    pieces: [
      {
        ...s.pieces[0]!,
        start: { kind: 'plain', holes: [], shape: startShape },
        end: { kind: 'plain', holes: [], shape },
        stitchRows: [{ path: 'around-end', fromMm: 50, fromRef: 'start', toMm: 0, toRef: 'end', offsetMm: 3, pitchMm: 4, tolerancePct: 10, ...row }],
      },
    ],
  };
}

const rowsOf = (s: StrapSpec) => computeLayout(s).pieces[0]!.stitchRows;
const near = (holes: { x: number; y: number }[], p: { x: number; y: number }) => holes.some((h) => Math.hypot(h.x - p.x, h.y - p.y) < 1e-6);

describe('stitch rows round the end shapes (closed form)', () => {
  it('when a row goes round a semicircular round end, then its seam is two straight runs plus a semicircle of radius w/2 - offset (circle geometry)', () => {
    const o = 3;
    const r = rowsOf(strap({ kind: 'round' }, { offsetMm: o }))[0]!;
    // Straight from x = 50 to where the semicircle starts (L - w/2), both edges, then pi x (w/2 - o).
    expect(r.seamLengthMm).toBeCloseTo(2 * (L - H - 50) + Math.PI * (H - o), 6);
    expect(r.threadMm).toBeCloseTo(4 * r.seamLengthMm, 6); // 4 x seam, saddle stitch (common practice)
    // Tangent joins are no corners: one run, so the count is the seam over the pitch, rounded.
    expect(r.holes.length - 1).toBe(Math.round(r.seamLengthMm / 4));
    expect(near(r.holes, { x: 50, y: -(H - o) })).toBe(true);
    expect(near(r.holes, { x: 50, y: H - o })).toBe(true);
  });

  it('when a top-edge row runs to the tip of a round end, then it ends at the apex after a quarter circle of radius w/2 - offset', () => {
    const o = 2.5;
    const r = rowsOf(strap({ kind: 'round' }, { path: 'top-edge', offsetMm: o }))[0]!;
    expect(r.seamLengthMm).toBeCloseTo(L - H - 50 + (Math.PI * (H - o)) / 2, 6);
    const last = r.holes[r.holes.length - 1]!;
    expect(last.x).toBeCloseTo(L - o, 5);
    expect(last.y).toBeCloseTo(0, 5);
  });

  it('when a row goes round a spear, then holes land on both edge joins and on the tip, o / sin(half angle) behind the cut tip (line geometry)', () => {
    const d = 30, o = 3;
    const r = rowsOf(strap({ kind: 'spear', depthMm: d }, { offsetMm: o }))[0]!;
    const alpha = Math.atan2(H, d); // half angle of the V at the tip
    const tipX = L - o / Math.sin(alpha);
    // The edge turns by alpha onto the V side; a corner offset by o moves back o x tan(turn / 2) along the edge.
    const joinX = L - d - o * Math.tan(alpha / 2);
    expect(near(r.holes, { x: tipX, y: 0 })).toBe(true);
    expect(near(r.holes, { x: joinX, y: -(H - o) })).toBe(true);
    expect(near(r.holes, { x: joinX, y: H - o })).toBe(true);
    expect(r.seamLengthMm).toBeCloseTo(2 * (joinX - 50) + 2 * Math.hypot(tipX - joinX, H - o), 6);
    expect(r.points.length).toBe(5); // both ends of the row and its three corners
  });

  it('when a row goes round an English point, then it follows both arcs at radius rho - offset and a hole lands on the tip', () => {
    const d = 19.05, o = 3;
    const rho = (d * d + H * H) / (2 * H);
    const r = rowsOf(strap({ kind: 'english-point', depthMm: d }, { offsetMm: o }))[0]!;
    const ri = rho - o;
    const dx = Math.sqrt(ri * ri - (rho - H) ** 2); // where the inset arc meets the centreline
    const sweep = Math.PI / 2 + Math.atan2(H - rho, dx);
    expect(r.seamLengthMm).toBeCloseTo(2 * (L - d - 50) + 2 * ri * sweep, 6);
    expect(near(r.holes, { x: L - d + dx, y: 0 })).toBe(true);
  });

  it('when a row goes round a clipped end, then holes land on all four chamfer joins', () => {
    const c = 6, o = 3;
    const r = rowsOf(strap({ kind: 'clipped', chamferMm: c }, { offsetMm: o }))[0]!;
    // Each join turns 45 degrees: offset by o it moves o x tan(22.5 deg) back along the edge
    // before it and forward along the edge after it.
    const t = o * Math.tan(Math.PI / 8);
    const xEdge = L - c - t, xEnd = L - o;
    const yEdge = H - o, yEnd = H - c - t;
    for (const p of [{ x: xEdge, y: -yEdge }, { x: xEnd, y: -yEnd }, { x: xEnd, y: yEnd }, { x: xEdge, y: yEdge }]) expect(near(r.holes, p), JSON.stringify(p)).toBe(true);
  });
});

describe('stitch rows against svg-path-properties', () => {
  for (const shape of [{ kind: 'round' }, { kind: 'english-point', depthMm: 25 }, { kind: 'spear', depthMm: 40 }, { kind: 'clipped', chamferMm: 5 }] as EndShape[]) {
    it(`when a row runs all round a ${shape.kind} end from the square start, then its seam is the edge guide at the same offset less the start's straight side`, () => {
      const o = 3;
      const s = strap(shape, { offsetMm: o, fromMm: 0 });
      const r = rowsOf(s)[0]!;
      const guide = drawLayout(computeLayout(s), s, { labels: false }).pieces[0]!.items.find((i): i is PathItem => i.type === 'path' && i.layer === 'guide')!;
      const guideLen = new svgPathProperties(pathData(guide.commands)).getTotalLength();
      expect(Math.abs(r.seamLengthMm - (guideLen - (W - 2 * o))) / guideLen).toBeLessThan(1e-3);
    });
  }
});

describe('stitch rows along both edges into a point', () => {
  it('when both edges run to the tip of a spear, then the tip hole is punched once and both rows end on it', () => {
    const d = 30, o = 3;
    const rows = rowsOf(strap({ kind: 'spear', depthMm: d }, { path: 'both-edges', offsetMm: o }));
    const tip = { x: L - o / Math.sin(Math.atan2(H, d)), y: 0 }; // the inset V's apex (line geometry)
    const at = rows.flatMap((r) => r.holes).filter((h) => Math.hypot(h.x - tip.x, h.y - tip.y) < 1e-6);
    expect(at).toHaveLength(1);
    for (const r of rows) expect(r.points.some((p) => Math.hypot(p.x - tip.x, p.y - tip.y) < 1e-6)).toBe(true);
  });
});
