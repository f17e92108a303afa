import { describe, expect, it } from 'vitest';
import { lengthToText, textMatches, textToLengthMm } from './length-text.ts';

// 1 in = 25.4 mm exactly (International Yard and Pound Agreement, 1959).
describe('length text in the spec form', () => {
  it('when a maker types 1 3/16 with inches shown, then the form holds 30.1625 mm (1 in = 25.4 mm, 1959)', () => {
    expect(textToLengthMm('1 3/16', 'in')).toBeCloseTo(30.1625, 6);
  });

  it('when a maker types a value with its own unit, then that unit wins over the display unit', () => {
    expect(textToLengthMm('330 mm', 'in')).toBeCloseTo(330, 6);
    expect(textToLengthMm('13in', 'mm')).toBeCloseTo(330.2, 6);
  });

  it('when a negative allowance is typed, then the sign is kept', () => {
    expect(textToLengthMm('-1/2', 'in')).toBeCloseTo(-12.7, 6);
  });

  it('when the text is not a length, then the value is NaN so the schema names the field', () => {
    expect(textToLengthMm('thirteen', 'in')).toBeNaN();
    expect(textToLengthMm('', 'mm')).toBeNaN();
  });

  it('when 13 in is shown, then the text is a rule reading without the unit, and mm keep one decimal', () => {
    expect(lengthToText(330.2, 'in')).toBe('13');
    expect(lengthToText(30.1625, 'in')).toBe('1 3/16');
    expect(lengthToText(30.1625, 'mm')).toBe('30.2');
  });

  it('when the unit changes from in to mm, then a bare 13 no longer matches 330.2 mm and is reformatted', () => {
    expect(textMatches('13', 330.2, 'in')).toBe(true);
    expect(textMatches('13', 330.2, 'mm')).toBe(false);
  });
});
