import { describe, expect, it } from 'vitest';
import { computeLayout, drawLayout, presetSpec, PRESET_NAMES } from './index.ts';

const IN = 25.4;

function deepFreeze<T>(o: T): T {
  if (o && typeof o === 'object') {
    Object.values(o).forEach(deepFreeze);
    Object.freeze(o);
  }
  return o;
}

describe('multi-piece patterns, loops and plain data', () => {
  it('when the watch strap is laid out, then the loop at each hole is short piece bar-to-bar + case + long hole - lug fold', () => {
    const spec = presetSpec('watch-strap');
    const layout = computeLayout(spec);
    const long = layout.pieces.find((p) => p.id === 'long')!;
    const short = layout.pieces.find((p) => p.id === 'short')!;
    const shortBars = short.folds[1]!.atMm - short.folds[0]!.atMm;
    expect(shortBars).toBeCloseTo(102 - 12 - 15, 8);
    for (const h of layout.fit!.holes) {
      expect(h.loopMm).toBeCloseTo(shortBars + spec.hardware.loopExtraMm + h.atMm - long.folds[0]!.atMm, 8);
      expect(h.innerMm).toBeCloseTo(h.loopMm - Math.PI * 2.8, 8);
    }
  });

  it('when the watch strap is laid out, then it runs 20 mm at the lugs and 18 mm at the buckle and tip (common practice lug and buckle widths)', () => {
    const layout = computeLayout(presetSpec('watch-strap'));
    const long = layout.pieces.find((p) => p.id === 'long')!;
    const short = layout.pieces.find((p) => p.id === 'short')!;
    expect(long.widthStations[0]!.widthMm).toBe(20);
    expect(long.widthStations[long.widthStations.length - 1]!.widthMm).toBe(18);
    expect(short.widthStations[0]!.widthMm).toBe(18);
    expect(short.widthStations[short.widthStations.length - 1]!.widthMm).toBe(20);
    // Visible lengths from the spring bar: about 120 / 75 mm regular (common practice).
    expect(long.blankLengthMm - long.folds[0]!.atMm).toBe(120);
    expect(short.folds[1]!.atMm - short.folds[0]!.atMm).toBe(75);
  });

  it('when the leash folds back into loops, then each flap rivet has its partner mirrored in the loop apex', () => {
    const layout = computeLayout(presetSpec('leash'));
    const strap = layout.pieces[0]!;
    const T = layout.thicknessMm;
    const [hook, hand] = strap.folds;
    expect(hook!.atMm).toBeCloseTo(1.75 * IN + (1.25 * IN + Math.PI * T) / 2, 8);
    expect(strap.blankLengthMm - hand!.atMm).toBeCloseTo(2 * IN + (9 * IN + Math.PI * T) / 2, 8);
    for (const f of strap.features.filter((x) => x.onFlap)) {
      const F = f.atMm < strap.blankLengthMm / 2 ? hook!.atMm : hand!.atMm;
      expect(f.partnerAtMm).toBeCloseTo(2 * F - f.atMm, 8);
    }
    // Working length between the loop apexes is the 6 ft in fit mode.
    const fit = computeLayout({ ...presetSpec('leash'), mode: 'fit' }).pieces[0]!;
    expect(fit.folds[1]!.atMm - fit.folds[0]!.atMm).toBeCloseTo(72 * IN, 8);
  });

  it('when the snap bracelet closes, then the loop is the distance between its two snaps and fit mode makes the inside wrist + ease', () => {
    const layout = computeLayout({ ...presetSpec('bracelet'), mode: 'fit' });
    const strap = layout.pieces[0]!;
    const snaps = strap.features.filter((f) => f.kind === 'snap');
    expect(snaps).toHaveLength(2);
    expect(layout.fit!.holes[0]!.loopMm).toBeCloseTo(snaps[1]!.atMm - snaps[0]!.atMm, 8);
    expect(layout.fit!.holes[0]!.innerMm).toBeCloseTo(6.75 * IN, 8);
  });

  it('when the collar is cut, then the cut list gives rivet posts of stack + 2.5 mm (2-3 mm, common practice) and punches by size', () => {
    const layout = computeLayout(presetSpec('collar'));
    const T = layout.thicknessMm;
    expect(layout.cutList.fasteners).toEqual([{ kind: 'rivet', count: 2, layers: 2, stackMm: 2 * T, postLengthMm: 2 * T + 2.5 }]);
    expect(layout.cutList.punches.map((p) => [p.size, p.holes])).toEqual([['#3', 5], ['#7', 5]]);
    expect(layout.cutList.hardware.map((h) => [h.item, h.count])).toEqual([['centre-bar buckle', 1], ['D-ring', 2]]);
  });

  it('when any preset is laid out and drawn from a frozen spec, then nothing is mutated and both results survive a JSON round trip', () => {
    for (const n of PRESET_NAMES) {
      const spec = deepFreeze(presetSpec(n));
      const layout = computeLayout(spec);
      const drawing = drawLayout(layout, spec);
      expect(JSON.parse(JSON.stringify(layout))).toEqual(layout);
      expect(JSON.parse(JSON.stringify(drawing))).toEqual(drawing);
      expect(drawing.pieces).toHaveLength(layout.pieces.length);
    }
  });

  it('when a pattern is shown in mm, then distances are bare mm under a legend saying mm; in inches, fractional inches under one saying inches', () => {
    const mm = drawLayout(computeLayout(presetSpec('watch-strap')), presetSpec('watch-strap'));
    const texts = mm.pieces[0]!.items.flatMap((i) => (i.type === 'text' ? [i.text] : []));
    expect(texts).toContain('12');
    expect(texts.some((t) => t.startsWith('Distances in mm from 0 at the buckle end'))).toBe(true);
    expect(texts.some((t) => /Ø2\.4 mm/.test(t))).toBe(true);
    const inch = drawLayout(computeLayout(presetSpec('collar')), presetSpec('collar'));
    const t2 = inch.pieces[0]!.items.flatMap((i) => (i.type === 'text' ? [i.text] : []));
    expect(t2).toContain('1 1/2');
    expect(t2).toContain('3 3/4');
    expect(t2.some((t) => t.startsWith('Distances in inches from 0 at the buckle end'))).toBe(true);
    expect(t2).toContain('2 x Ø1/8 in #3 rivet, 2 layers');
  });
});
