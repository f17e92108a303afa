import { describe, expect, it } from 'vitest';
import { inToMm } from '../units/length.ts';
import { computeLayout, drawLayout, presetSpec } from './index.ts';

describe('D-rings and keepers', () => {
  it('when the collar is laid out, then both D-rings ride in the fold loop between the tongue slot and the rivets at 5 in (from memory), evenly, and are drawn as dashed guide marks', () => {
    const s = presetSpec('collar');
    const layout = computeLayout(s);
    const strap = layout.pieces[0]!;
    const rings = strap.hardware!;
    expect(rings).toHaveLength(2);
    // Slot 1 in long centred on the fold at 3 3/4 in ends at 4 1/4 in; the loop closes at the 5 in rivet (1/8 in hole).
    const from = inToMm(4.25), to = inToMm(5) - inToMm(1 / 8) / 2;
    for (const r of rings) {
      expect(r.zoneMm[0]).toBeCloseTo(from, 6);
      expect(r.zoneMm[1]).toBeCloseTo(to, 6);
      // The note is printed for the maker: how the ring sits, not where the rule came from.
      expect(r.note).toBe('rides in the fold loop beside the buckle');
    }
    expect(rings[0]!.atMm).toBeCloseTo(from + (to - from) / 3, 6);
    expect(rings[1]!.atMm).toBeCloseTo(from + (2 * (to - from)) / 3, 6);
    expect(layout.warnings.map((w) => w.code)).not.toContain('d-ring-no-room');
    const piece = drawLayout(layout, s).pieces[0]!;
    const marks = piece.items.filter((i) => i.type === 'path' && i.layer === 'guide' && i.commands.length === 2);
    for (const r of rings) expect(marks.some((m) => m.type === 'path' && m.commands[0]!.op === 'M' && Math.abs(m.commands[0]!.x - r.atMm) < 1e-6)).toBe(true);
    expect(piece.items.some((i) => i.type === 'text' && i.text === '2 x D-ring in fold loop')).toBe(true);
  });

  it('when the first rivet pair sits right behind the slot, then d-ring-no-room says how much loop there is and how much the rings need', () => {
    const s = presetSpec('collar');
    const start = s.pieces[0]!.start;
    if (start.kind !== 'fold-over') throw new Error('collar starts with a fold-over');
    start.flapHoles = [{ fromEndMm: inToMm(3.1), yMm: 0, diameterMm: inToMm(1 / 8), fastener: 'rivet' }];
    start.slot = { lengthMm: inToMm(1), widthMm: inToMm(3 / 16) };
    const w = computeLayout(s).warnings.find((x) => x.code === 'd-ring-no-room');
    expect(w?.message).toMatch(/fold loop .* is .*; 2 D-rings of .* wire need about/);
  });

  it('when the strap has no buckle (the bag strap), then one D-ring sits in each end fold and both are in the cut list', () => {
    const layout = computeLayout(presetSpec('bag-strap'));
    expect(layout.pieces[0]!.hardware?.map((h) => h.atMm)).toEqual(layout.pieces[0]!.folds.map((f) => f.atMm));
    expect(layout.cutList.hardware.find((h) => h.item === 'D-ring')?.count).toBe(2);
  });

  it('when a strap has plain ends and no buckle, then no D-ring is placed on it (its rings belong to the bag)', () => {
    const s = presetSpec('bag-strap');
    const plain = { kind: 'plain' as const, holes: [], shape: { kind: 'square' as const } };
    s.pieces[0] = { ...s.pieces[0]!, start: plain, end: plain, stitchRows: [] };
    expect(computeLayout(s).pieces[0]!.hardware).toBeUndefined();
  });

  it('when the watch strap is laid out, then its keeper is a piece of its own in the cut list and the drawing, not "not cut here"', () => {
    const s = presetSpec('watch-strap');
    const layout = computeLayout(s);
    const keeper = layout.pieces.find((p) => p.id === 'keeper')!;
    expect(keeper.role).toBe('accessory');
    expect(layout.cutList.blanks.map((b) => b.pieceId)).toEqual(['long', 'short', 'keeper']);
    expect(layout.cutList.hardware.some((h) => h.item.startsWith('keeper'))).toBe(false);
    // Round two layers of the 20 mm strap: 2 x (20 + 2 x 2.8) + 1 mm ease inside, plus pi x T on the centreline (circle geometry).
    expect(keeper.blankLengthMm).toBeCloseTo(2 * (20 + 2 * 2.8) + 1 + Math.PI * 2.8, 6);
    expect(drawLayout(layout, s).pieces.map((p) => p.id)).toEqual(['long', 'short', 'keeper']);
  });
});
