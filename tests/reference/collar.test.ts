// The collar preset against the construction the trade describes (common practice check
// values): 1 in wide, about 10 oz, centre-bar buckle and two D-rings, loose neck 13 in,
// blank = neck + 8 in; buckle end holes, tongue slot and fold; five tip holes 3/4 in apart.
import { describe, expect, it } from 'vitest';
import { computeLayout, presetSpec, type Feature } from '@shared/pattern/index.ts';

const IN = 25.4; // mm per inch, exact (1959 agreement)
const spec = presetSpec('collar');
const layout = computeLayout(spec);
const strap = layout.pieces[0]!;
const near = (a: number, b: number) => expect(a).toBeCloseTo(b, 6);
const at = (kind: Feature['kind']) => strap.features.filter((f) => f.kind === kind);

describe('collar preset (common practice)', () => {
  it('when the preset is read, then it is 1 in wide, 10 oz, centre-bar buckle with two D-rings, neck 13 in, rule mode', () => {
    near(spec.widthMm, IN);
    expect(spec.thickness).toEqual({ unit: 'oz', value: 10 });
    expect(spec.hardware.buckle.style).toBe('centre-bar');
    expect(spec.hardware.dRings.count).toBe(2);
    near(spec.girthMm, 13 * IN);
    expect(spec.mode).toBe('rule');
  });

  it('when laid out in rule mode, then the blank is neck + 8 in = 21 in', () => {
    near(strap.blankLengthMm, 21 * IN);
    near(strap.widthMm, IN);
  });

  it('when laid out, then 1/8 in rivet holes sit at 1 1/2 and 2 1/2 in and 1/8 in holes at 5, 6 and 7 in from the buckle end', () => {
    const small = strap.features.filter((f) => f.diameterMm !== undefined && Math.abs(f.diameterMm - IN / 8) < 1e-9);
    expect(small.map((f) => f.atMm / IN)).toEqual([1.5, 2.5, 5, 6, 7].map((v) => expect.closeTo(v, 6)));
    for (const f of small) expect(f.punch?.size).toBe('#3');
  });

  it('when laid out, then the tongue slot is 1 in long from 3 1/4 to 4 1/4 in and the fold sits at its middle, 3 3/4 in', () => {
    const [slot] = at('slot');
    near(slot!.atMm - slot!.lengthMm! / 2, 3.25 * IN);
    near(slot!.atMm + slot!.lengthMm! / 2, 4.25 * IN);
    expect(strap.folds).toHaveLength(1);
    near(strap.folds[0]!.atMm, 3.75 * IN);
  });

  it('when folded at the fold line, then 1 1/2 in meets 6 in and 2 1/2 in meets 5 in (mirror x -> 2F - x) and each pair goes through 2 layers', () => {
    const F = strap.folds[0]!.atMm;
    const flap = strap.features.filter((f) => f.onFlap);
    expect(flap.map((f) => f.atMm / IN)).toEqual([expect.closeTo(1.5, 6), expect.closeTo(2.5, 6)]);
    for (const f of flap) {
      const partner = strap.features.find((g) => g !== f && Math.abs(g.atMm - (2 * F - f.atMm)) < 1e-6);
      expect(partner, `partner of ${f.atMm / IN} in`).toBeDefined();
      expect(partner!.partnerAtMm).toBeCloseTo(f.atMm, 6);
      expect(f.layers).toBe(2);
      expect(partner!.layers).toBe(2);
    }
  });

  it('when folded, then the 7 in hole has no partner and is reported as going through one layer', () => {
    const seven = strap.features.find((f) => Math.abs(f.atMm - 7 * IN) < 1e-6)!;
    expect(seven.partnerAtMm).toBeUndefined();
    expect(seven.layers).toBe(1);
  });

  it('when laid out, then five 3/16 in adjustment holes run 3/4 in apart, the first 3 in from the tip, hole 3 of 5 (counted from the buckle) the middle hole', () => {
    const holes = at('adjust-hole');
    expect(holes).toHaveLength(5);
    for (const h of holes) near(h.diameterMm!, (3 * IN) / 16);
    near(strap.blankLengthMm - holes[4]!.atMm, 3 * IN);
    for (let i = 1; i < 5; i++) near(holes[i]!.atMm - holes[i - 1]!.atMm, 0.75 * IN);
    expect(layout.fit!.nominalIndex).toBe(2);
    expect(holes[2]!.label).toBe('hole 3 (middle)');
  });

  it('when laid out, then every hole and the slot lie on the centreline', () => {
    for (const f of strap.features) expect(f.yMm).toBe(0);
  });

  it('when the buckle sits in each hole, then the loop is hole - fold and the inside is that minus pi x T (10 oz = 10/64 in)', () => {
    const T = (10 / 64) * IN;
    const F = 3.75 * IN;
    layout.fit!.holes.forEach((h) => {
      near(h.loopMm, h.atMm - F);
      near(h.innerMm, h.atMm - F - Math.PI * T);
    });
    // Middle hole at 16 1/2 in: loop 12 3/4 in, inside about 12.26 in, 0.74 in short of the 13 in neck.
    near(layout.fit!.holes[2]!.loopMm, 12.75 * IN);
    expect(layout.fit!.deviationMm / IN).toBeCloseTo(12.75 - Math.PI * (10 / 64) - 13, 6);
  });

  it('when compared with fit mode, then fit lengthens the blank by (13 + pi x T) - 12 3/4 in and moves the holes toward the tip by the same', () => {
    const T = (10 / 64) * IN;
    const shift = 13 * IN + Math.PI * T - 12.75 * IN;
    near(layout.ruleVsFit.rule.blankLengthMm, 21 * IN);
    near(layout.ruleVsFit.blankDeltaMm, shift);
    near(layout.ruleVsFit.holeShiftMm, shift);
    const fit = computeLayout({ ...spec, mode: 'fit' });
    near(fit.pieces[0]!.blankLengthMm, 21 * IN + shift);
    near(fit.fit!.holes[2]!.innerMm, 13 * IN);
    expect(layout.ruleVsFit.summary).toMatch(/holes move .* toward the tip/);
  });
});
