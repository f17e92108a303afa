import { describe, expect, it } from 'vitest';
import { girthTextToMm } from './girth-text.ts';

// 1 in = 25.4 mm exactly (International Yard and Pound Agreement, 1959); 1 cm = 10 mm (SI).
describe('girthTextToMm', () => {
  it('when a girth is typed in inches with a fraction, then it is 25.4 mm an inch', () => {
    expect(girthTextToMm('14 1/2', 'in')).toBeCloseTo(368.3, 6);
    expect(girthTextToMm('14.5', 'in')).toBeCloseTo(368.3, 6);
  });

  it('when a girth is typed in centimetres with a decimal comma, then it is 10 mm a centimetre', () => {
    expect(girthTextToMm('36,5', 'cm')).toBe(365);
    expect(girthTextToMm('36.5 cm', 'cm')).toBe(365);
  });

  it('when the text is not a number, then it is NaN for the schema to name', () => {
    expect(girthTextToMm('about fourteen', 'in')).toBeNaN();
    expect(girthTextToMm('', 'cm')).toBeNaN();
  });
});
