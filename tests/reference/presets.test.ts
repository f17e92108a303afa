// Each preset against what it says it is (its doc comment and the kind's blurb): folds, holes
// through one or two layers, hardware, piece count and fit. Figures are common practice
// unless marked "from memory" in the preset.
import { describe, expect, it } from 'vitest';
import { computeLayout, presetSpec, presetVariant, type Feature, type PatternLayout, type PieceLayout } from '@shared/pattern/index.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';

const IN = 25.4; // mm per inch, exact (1959 agreement)
const near = (a: number, b: number, digits = 6) => expect(a).toBeCloseTo(b, digits);
const holes = (p: PieceLayout, kind: Feature['kind']) => p.features.filter((f) => f.kind === kind);
/** Every flap hole has a partner mirrored across its fold (x' = 2F - x) and both go through 2 layers. */
function expectMirrored(p: PieceLayout) {
  const flap = p.features.filter((f) => f.onFlap);
  expect(flap.length).toBeGreaterThan(0);
  for (const f of flap) {
    const fold = p.folds.reduce((best, fd) => (Math.abs(fd.atMm - f.atMm) < Math.abs(best.atMm - f.atMm) ? fd : best));
    const partner = p.features.find((g) => g !== f && Math.abs(g.atMm - (2 * fold.atMm - f.atMm)) < 1e-6 && g.kind === f.kind);
    expect(partner, `${p.name}: partner of the hole at ${f.atMm}`).toBeDefined();
    expect([f.layers, partner!.layers]).toEqual([2, 2]);
  }
}
const laid = (s: StrapSpec): PatternLayout => computeLayout(s);

describe('presets do what they claim', () => {
  it('collar: one piece folded round a centre-bar buckle through a tongue slot, riveted flap, two D-rings in the fold loop, five holes 3/4 in apart, no warning', () => {
    const l = laid(presetSpec('collar'));
    expect(l.pieces).toHaveLength(1);
    const p = l.pieces[0]!;
    expect(p.folds).toHaveLength(1);
    expect(holes(p, 'slot')).toHaveLength(1);
    expectMirrored(p);
    expect(p.hardware?.map((h) => h.item)).toEqual(['D-ring', 'D-ring']);
    const adj = holes(p, 'adjust-hole');
    expect(adj).toHaveLength(5);
    near(adj[1]!.atMm - adj[0]!.atMm, 0.75 * IN);
    expect(l.warnings).toEqual([]);
  });

  it('belt: folds round a heel-bar buckle held by two screws through both layers, five holes 1 in apart, a keeper piece, size at the middle hole = waist + 2 in', () => {
    const s = presetSpec('belt');
    const l = laid(s);
    expect(s.hardware.buckle.style).toBe('heel-bar');
    expect(l.pieces.map((p) => p.role)).toEqual(['strap', 'accessory']);
    const p = l.pieces[0]!;
    expect(p.folds).toHaveLength(1);
    expect(holes(p, 'screw').filter((f) => f.onFlap)).toHaveLength(2);
    expectMirrored(p);
    const adj = holes(p, 'adjust-hole');
    expect(adj).toHaveLength(5);
    near(adj[1]!.atMm - adj[0]!.atMm, IN);
    // Buckle bar (the fold) to the middle hole = waist + 2 in.
    near(adj[2]!.atMm - p.folds[0]!.atMm, s.girthMm + 2 * IN);
  });

  it('watch strap: long and short pieces each folded round a spring bar, the short one also round the buckle through a tongue slot, seven holes, a keeper', () => {
    const l = laid(presetSpec('watch-strap'));
    expect(l.pieces.map((p) => p.role)).toEqual(['strap', 'bridge', 'accessory']);
    const [long, short] = l.pieces;
    expect(long!.folds).toHaveLength(1);
    expect(short!.folds).toHaveLength(2);
    expect(holes(short!, 'slot')).toHaveLength(1);
    expect(holes(long!, 'adjust-hole')).toHaveLength(7);
    near(long!.widthMm, 20);
  });

  it('bag strap: one piece folded round a D-ring at both ends, each flap riveted through both layers, 48 in from ring to ring, blank = length + 4 in', () => {
    const s = presetSpec('bag-strap');
    const l = laid(s);
    expect(l.pieces).toHaveLength(1);
    const p = l.pieces[0]!;
    expect(p.folds.map((f) => f.atMm / IN)).toEqual([expect.closeTo(2, 6), expect.closeTo(50, 6)]);
    expectMirrored(p);
    expect(holes(p, 'rivet').filter((f) => f.layers === 1)).toEqual([]);
    expect(p.hardware?.map((h) => [h.item, h.atMm / IN])).toEqual([
      ['D-ring', expect.closeTo(2, 6)],
      ['D-ring', expect.closeTo(50, 6)],
    ]);
    near(p.blankLengthMm, 52 * IN);
    near(p.folds[1]!.atMm - p.folds[0]!.atMm, s.girthMm);
    expect(l.warnings).toEqual([]);
  });

  it('adjustable bag strap: a swivel snap at each end, buckle adjustment with nine holes, 44 in snap to snap at the middle hole and 4 in either way', () => {
    const s = presetVariant('bag-strap', 'adjustable');
    expect(s.kind).toBe('bag-strap');
    const l = laid(s);
    expect(l.pieces.map((p) => p.role)).toEqual(['strap', 'bridge']);
    const [long, short] = l.pieces;
    expect([...(long!.hardware ?? []), ...(short!.hardware ?? [])].map((h) => h.item)).toEqual(['swivel snap', 'swivel snap']);
    expect(holes(short!, 'slot')).toHaveLength(1);
    expectMirrored(long!);
    expectMirrored(short!);
    expect(holes(long!, 'adjust-hole')).toHaveLength(9);
    near(l.fit!.holes[l.fit!.nominalIndex]!.innerMm, 44 * IN);
    expect(l.fit!.rangeMm.map((x) => x / IN)).toEqual([expect.closeTo(40, 6), expect.closeTo(48, 6)]);
    expect(l.cutList.hardware.map((h) => h.item)).toEqual(['centre-bar buckle', 'swivel snap', 'keeper (not cut here)']);
    expect(l.warnings).toEqual([]);
  });

  it('leash: one piece folded back at both ends (hook eye and hand loop), each loop closed by two rivets through both layers', () => {
    const l = laid(presetSpec('leash'));
    expect(l.pieces).toHaveLength(1);
    const p = l.pieces[0]!;
    expect(p.folds).toHaveLength(2);
    expect(holes(p, 'rivet').filter((f) => f.onFlap)).toHaveLength(4);
    expectMirrored(p);
  });

  it('bracelet: one piece with rounded ends that overlap and close with a snap at each end, blank = wrist + 3/4 to 1 in', () => {
    const s = presetSpec('bracelet');
    const l = laid(s);
    expect(l.pieces).toHaveLength(1);
    expect(holes(l.pieces[0]!, 'snap')).toHaveLength(2);
    const over = (l.pieces[0]!.blankLengthMm - s.girthMm) / IN;
    expect(over).toBeGreaterThanOrEqual(0.75);
    expect(over).toBeLessThanOrEqual(1 + 1e-9);
  });

  it('keeper: one plain strip round two layers of a 1 1/2 in belt, 2 x (width + 2 x thickness) plus ease', () => {
    const s = presetSpec('keeper');
    const l = laid(s);
    expect(l.pieces).toHaveLength(1);
    expect(l.pieces[0]!.folds).toEqual([]);
    expect(s.girthMm).toBeGreaterThan(2 * 1.5 * IN);
  });
});
