import { describe, expect, it } from 'vitest';
import type { StrapSpec } from '../schemas/strap-spec.ts';
import { computeLayout, presetSpec, type WarningCode } from './index.ts';

const IN = 25.4;
const codes = (s: StrapSpec) => computeLayout(s).warnings.map((w) => w.code);
const collar = () => presetSpec('collar');
const flapOf = (s: StrapSpec) => {
  const st = s.pieces[0]!.start;
  if (st.kind !== 'fold-over') throw new Error('preset changed');
  return st;
};

describe('layout warnings', () => {
  it('when the presets are laid out, then only the expected warnings appear (rule-mode collar tighter than the neck at its middle hole, leash longer than a 60 in strip, rule-mode leash and bracelet off target)', () => {
    const expected: Record<string, WarningCode[]> = { collar: [], belt: [], 'watch-strap': [], 'bag-strap': [], leash: ['fit-misses-target', 'blank-longer-than-strip'], bracelet: ['fit-misses-target'], keeper: [] };
    for (const [name, want] of Object.entries(expected)) expect(codes(presetSpec(name as never)).sort(), name).toEqual([...want].sort());
  });

  it('when a screw hole sits 4 mm from the edge, then hole-near-edge says how far it is and what it needs (8 mm, common practice)', () => {
    const s = presetSpec('bag-strap');
    const start = s.pieces[0]!.start;
    if (start.kind !== 'fold-over') throw new Error('preset changed');
    start.flapHoles[0] = { ...start.flapHoles[0]!, fastener: 'screw', yMm: s.widthMm / 2 - 4 };
    const w = computeLayout(s).warnings.find((x) => x.code === 'hole-near-edge')!;
    expect(w.message).toMatch(/5\/32 in from the edge.*needs 5\/16 in/);
  });

  it('when a body hole is put 5 mm from a rivet, then features-too-close reports both', () => {
    const s = collar();
    flapOf(s).bodyHoles.push({ fromEndMm: 7 * IN + 5, yMm: 0, diameterMm: IN / 8, fastener: 'rivet' });
    expect(codes(s)).toContain('features-too-close');
  });

  it('when a flap rivet is 3 mm from the fold, then rivet-on-bend warns (the legs meet only past bar radius + T)', () => {
    const s = collar();
    flapOf(s).flapHoles.push({ fromEndMm: 3.75 * IN - 3, yMm: 0, diameterMm: IN / 8, fastener: 'rivet' });
    flapOf(s).slot = null;
    expect(codes(s)).toContain('rivet-on-bend');
  });

  it('when the tongue slot is 8 mm, then tongue-slot-short names the length it needs (BA 180° + 2 tongue wires)', () => {
    const s = collar();
    flapOf(s).slot = { lengthMm: 8, widthMm: 4 };
    const t = computeLayout(s).thicknessMm;
    const need = Math.PI * (1.5 + 0.5 * t) + 2 * 3;
    const w = computeLayout(s).warnings.find((x) => x.code === 'tongue-slot-short')!;
    expect(need).toBeGreaterThan(8);
    expect(w.message).toContain('shorter than');
  });

  it('when the tip is 20 mm past the last hole, then tail-short warns that the tail cannot pass the buckle', () => {
    const s = collar();
    const end = s.pieces[0]!.end;
    if (end.kind !== 'adjustable') throw new Error('preset changed');
    end.holes.firstFromTipMm = 20;
    end.holes.count = 3;
    end.holes.middleHole = 3;
    expect(codes(s)).toContain('tail-short');
  });

  it('when the rule blank is far too short for the girth, then fit-misses-target says the target is outside the range', () => {
    const s = collar();
    s.rule = { measure: 'blank', allowanceMm: 4 * IN };
    expect(codes(s)).toContain('fit-misses-target');
    expect(codes({ ...s, mode: 'fit' })).not.toContain('fit-misses-target');
  });

  // Blank = neck + 8 in (common practice); the middle hole sits 3 + 1 1/2 in from the tip and
  // the bar at the fold 3 3/4 in from the buckle end: loop 12 3/4 in, inside 12 3/4 in - pi x 10 oz
  // = 12 1/4 in, 3/4 in under the 13 in neck measured over two fingers (about 1 in of room,
  // common practice), so 1/4 in over the bare neck.
  it('when the rule-mode collar is measured over two fingers, then it opens with no tightness warning, at every size of a run', () => {
    expect(codes(collar())).not.toContain('collar-tight-at-nominal');
    for (const neck of [10, 12, 14, 16, 18]) expect(codes({ ...collar(), girthMm: neck * IN })).not.toContain('collar-tight-at-nominal');
  });

  it('when the same collar was measured snug, then collar-tight-at-nominal says it closes 3/4 in under the bare neck at hole 3', () => {
    const w = computeLayout({ ...collar(), girthMeasured: 'snug' }).warnings.find((x) => x.code === 'collar-tight-at-nominal');
    expect(w?.message).toMatch(/^at the middle hole \(hole 3\) the collar is 12 1\/4 in inside, 3\/4 in tighter than the 13 in neck measured snug/);
  });

  it('when a two-finger collar is cut 1 1/2 in short (blank = neck + 6 1/2 in), then it still warns: 1 1/4 in under the bare neck', () => {
    const s = { ...collar(), rule: { measure: 'blank' as const, allowanceMm: 6.5 * IN } };
    const w = computeLayout(s).warnings.find((x) => x.code === 'collar-tight-at-nominal');
    expect(w?.message).toMatch(/10 3\/4 in inside, 1 1\/4 in tighter than the bare neck \(about 12 in: the 13 in measured over two fingers, less 1 in for the fingers\)/);
    expect(codes({ ...s, mode: 'fit' })).not.toContain('collar-tight-at-nominal');
    expect(codes({ ...presetSpec('belt'), girthMeasured: 'snug' })).not.toContain('collar-tight-at-nominal');
  });

  it('when a stitch row cannot keep its pitch within 0 % tolerance, then stitch-pitch-off gives the pitch it became', () => {
    const s = presetSpec('bag-strap');
    s.pieces[0]!.stitchRows[0]!.tolerancePct = 0;
    s.pieces[0]!.stitchRows[0]!.pitchMm = 3.7;
    const w = computeLayout(s).warnings.find((x) => x.code === 'stitch-pitch-off')!;
    expect(w.message).toMatch(/pitch 3\.7 mm had to become \d\.\d\d mm/);
  });
});
