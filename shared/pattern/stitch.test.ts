import { describe, expect, it } from 'vitest';
import { computeLayout, presetSpec } from './index.ts';

describe('stitch rows', () => {
  it('when the bag strap is stitched along both edges, then holes land on both ends at an even pitch within 5 % of 3.85 mm', () => {
    const layout = computeLayout(presetSpec('bag-strap'));
    const rows = layout.pieces[0]!.stitchRows;
    expect(rows).toHaveLength(2);
    const L = layout.pieces[0]!.blankLengthMm;
    for (const r of rows) {
      const first = r.holes[0]!, last = r.holes[r.holes.length - 1]!;
      // The rows run between the riveted flaps: 4 1/2 in from each end.
      expect(first.x).toBeCloseTo(4.5 * 25.4, 6);
      expect(last.x).toBeCloseTo(L - 4.5 * 25.4, 6);
      expect(r.seamLengthMm).toBeCloseTo(L - 9 * 25.4, 6);
      expect(r.holes.length - 1).toBe(Math.round(r.seamLengthMm / 3.85));
      for (let i = 1; i < r.holes.length; i++) expect(Math.hypot(r.holes[i]!.x - r.holes[i - 1]!.x, r.holes[i]!.y - r.holes[i - 1]!.y)).toBeCloseTo(r.adjustedPitchMm, 6);
      expect(Math.abs(r.adjustedPitchMm - 3.85) / 3.85).toBeLessThan(0.05);
      // Saddle stitch takes about four times the seam length (common practice).
      expect(r.threadMm).toBeCloseTo(4 * r.seamLengthMm, 6);
    }
    expect(layout.cutList.threadMm).toBeCloseTo(rows.reduce((a, r) => a + r.threadMm, 0), 6);
  });

  it('when a row goes round the start end, then a hole lands on both corners of the U', () => {
    const s = presetSpec('bag-strap');
    s.pieces[0]!.stitchRows = [{ path: 'around-start', fromMm: 40, fromRef: 'start', toMm: 120, toRef: 'start', offsetMm: 4, pitchMm: 4, tolerancePct: 10 }];
    const r = computeLayout(s).pieces[0]!.stitchRows[0]!;
    const h = s.widthMm / 2 - 4;
    for (const corner of [{ x: 40, y: -h }, { x: 40, y: h }]) expect(r.holes.some((p) => Math.hypot(p.x - corner.x, p.y - corner.y) < 1e-6), JSON.stringify(corner)).toBe(true);
  });

  it('when the watch strap tapers, then its stitch rows stay 2.5 mm inside the slanted edge', () => {
    const layout = computeLayout(presetSpec('watch-strap'));
    const long = layout.pieces.find((p) => p.id === 'long')!;
    const st = long.widthStations;
    const row = long.stitchRows[0]!;
    let checked = 0;
    for (const p of row.holes) {
      // Distance from the top edge line between the two stations.
      const a = st[1]!, b = st[2]!;
      if (p.x < a.atMm || p.x > b.atMm) continue;
      const ax = a.atMm, ay = -a.widthMm / 2, bx = b.atMm, by = -b.widthMm / 2;
      const d = Math.abs((by - ay) * p.x - (bx - ax) * p.y + bx * ay - by * ax) / Math.hypot(by - ay, bx - ax);
      expect(d).toBeCloseTo(2.5, 2);
      checked++;
    }
    expect(checked).toBeGreaterThan(10);
  });
});
