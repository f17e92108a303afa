import { describe, expect, it } from 'vitest';
import { cardSizePx, CSS_PX_PER_MM, ID1_CARD_MM, isPlausibleRatio, loadPxPerMm, pxPerMmFromCard, savePxPerMm, SCREEN_SCALE_KEY } from './screen-scale.ts';

function memoryStore() {
  const m = new Map<string, string>();
  return { getItem: (k: string) => m.get(k) ?? null, setItem: (k: string, v: string) => void m.set(k, v), removeItem: (k: string) => void m.delete(k), m };
}

describe('screen calibration ratio', () => {
  it('when the card is 85.60 x 53.98 mm, then it is the ID-1 size of ISO/IEC 7810', () => {
    expect(ID1_CARD_MM).toEqual({ width: 85.6, height: 53.98 });
  });

  it('when a card matches at 323.5 CSS px wide, then the screen has 323.5 / 85.6 px per mm (ISO/IEC 7810 ID-1 width)', () => {
    expect(pxPerMmFromCard(323.5)).toBeCloseTo(3.7792, 4);
  });

  it('when the ratio is the CSS nominal 96 px per inch, then the card draws 323.53 x 204.02 px (W3C CSS Values: 1 in = 96 px; 25.4 mm per inch)', () => {
    const { width, height } = cardSizePx(CSS_PX_PER_MM);
    expect(width).toBeCloseTo(323.5276, 3);
    expect(height).toBeCloseTo(204.0189, 3);
  });

  it('when the card width is turned into a ratio and back, then the same width comes out', () => {
    for (const px of [180, 250.25, 400, 612]) expect(cardSizePx(pxPerMmFromCard(px)).width).toBeCloseTo(px, 9);
  });

  it('when a 1 in square is drawn at a stored ratio, then it is 25.4 x ratio px wide', () => {
    const ratio = pxPerMmFromCard(300);
    expect(25.4 * ratio).toBeCloseTo((25.4 * 300) / 85.6, 9);
  });

  it('when a ratio is saved, then this browser reads it back; junk and out-of-range values are refused', () => {
    const s = memoryStore();
    expect(loadPxPerMm(s)).toBeNull();
    expect(savePxPerMm(4.2, s)).toBe(true);
    expect(loadPxPerMm(s)).toBe(4.2);
    expect(savePxPerMm(0.2, s)).toBe(false);
    expect(isPlausibleRatio(Number.NaN)).toBe(false);
    s.m.set(SCREEN_SCALE_KEY, 'wide');
    expect(loadPxPerMm(s)).toBeNull();
  });
});
