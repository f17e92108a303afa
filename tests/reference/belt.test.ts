// The belt preset against TRADE.md's trade rules (common practice): size = buckle bar to the
// middle hole, about waist + 2 in; five holes 1 in apart; last hole to tip about 2.5 x width;
// strap width = the buckle's inside width.
import { describe, expect, it } from 'vitest';
import { computeLayout, presetSpec } from '@shared/pattern/index.ts';

const IN = 25.4;
const spec = presetSpec('belt');
const layout = computeLayout(spec);
const strap = layout.pieces.find((p) => p.id === 'strap')!;
const holes = strap.features.filter((f) => f.kind === 'adjust-hole');

describe('belt preset against the trade rules (common practice)', () => {
  it('when laid out in rule mode, then the buckle bar to the middle hole is waist + 2 in', () => {
    const bar = strap.folds[0]!.atMm;
    expect(holes[2]!.atMm - bar).toBeCloseTo(spec.girthMm + 2 * IN, 6);
    expect(layout.fit!.holes[2]!.loopMm).toBeCloseTo(spec.girthMm + 2 * IN, 6);
  });

  it('when laid out, then there are five holes 1 in apart with the third (the middle one) as the middle hole', () => {
    expect(holes).toHaveLength(5);
    for (let i = 1; i < 5; i++) expect(holes[i]!.atMm - holes[i - 1]!.atMm).toBeCloseTo(IN, 6);
    expect(layout.fit!.nominalIndex).toBe(2);
  });

  it('when laid out, then the last hole to the tip is about 2.5 x the strap width (within 10 %)', () => {
    const tip = strap.blankLengthMm - holes[4]!.atMm;
    expect(Math.abs(tip - 2.5 * spec.widthMm) / (2.5 * spec.widthMm)).toBeLessThan(0.1);
  });

  it('when laid out, then the width equals the buckle inside width and no width warning is raised', () => {
    expect(strap.widthMm).toBeCloseTo(spec.hardware.buckle.insideWidthMm, 6);
    expect(layout.warnings.filter((w) => w.code === 'width-hardware-mismatch')).toEqual([]);
  });

  it('when the keeper is laid out, then it closes round two belt layers: 2 x (w + 2T) + ease + pi x T', () => {
    const keeper = layout.pieces.find((p) => p.id === 'keeper')!;
    const T = layout.thicknessMm;
    expect(keeper.blankLengthMm).toBeCloseTo(2 * (spec.widthMm + 2 * T) + 2 + Math.PI * T, 6);
  });

  it('when fit mode is chosen with ease = the 2 in allowance, then only the thickness correction pi x T separates fit from rule', () => {
    expect(layout.ruleVsFit.blankDeltaMm).toBeCloseTo(Math.PI * layout.thicknessMm, 6);
  });

  it('when the buckle is narrower than the strap, then a width-hardware-mismatch warning names both widths', () => {
    const s = presetSpec('belt');
    s.hardware.buckle.insideWidthMm = 1.25 * IN;
    const w = computeLayout(s).warnings.filter((x) => x.code === 'width-hardware-mismatch');
    expect(w.length).toBeGreaterThan(0);
    expect(w[0]!.message).toContain('1 1/4 in');
    expect(w[0]!.message).toContain('1 1/2 in');
  });
});
