import convert from 'convert-units';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { formatLength } from '@shared/units/format-length.ts';
import { MM_PER_IN, MM_PER_OZ, inToMm, ozToMm, parseLengthMm, parseThickness } from '@shared/units/length.ts';
import { nearestPunch, punchDiameterMm } from '@shared/pattern/index.ts';

describe('units against outside sources', () => {
  it('when converting inches, then 25.4 mm per inch (1959 agreement) agrees with convert-units within 1e-6 mm', () => {
    // convert-units 2.x gives 25.3999992 mm for 1 in (STACK.md): compare with a tolerance.
    for (const v of [1, 13, 0.125, 72]) expect(Math.abs(inToMm(v) - convert(v).from('in').to('mm'))).toBeLessThan(1e-6 * Math.max(1, v));
    expect(MM_PER_IN).toBe(25.4);
  });

  it('when converting ounces, then 1 oz = 1/64 in = 0.396875 mm (US Federal Test Method Standard 311)', () => {
    expect(MM_PER_OZ).toBeCloseTo(0.396875, 12);
    expect(ozToMm(10)).toBeCloseTo(3.96875, 12);
    // The trade's 0.4 mm rounding stays within 1 % of the exact figure.
    expect(Math.abs(MM_PER_OZ - 0.4) / MM_PER_OZ).toBeLessThan(0.01);
  });

  it('when formatting 1/8, 3/16 and 1 3/16 in, then the labels match fraction.js mixed fractions', () => {
    for (const v of [0.125, 0.1875, 1.1875, 21, 0.75]) {
      expect(formatLength(inToMm(v), 'in')).toBe(`${new Fraction(v).toFraction(true)} in`);
    }
    expect(formatLength(inToMm(1.1875), 'in')).toBe('1 3/16 in');
  });

  it('when a length is not on a 1/32 in step, then it rounds to the nearest 1/32 and can say so', () => {
    expect(formatLength(100, 'in')).toBe(`${new Fraction(Math.round((100 / 25.4) * 32), 32).toFraction(true)} in`);
    expect(formatLength(100, 'in', { approx: true }).startsWith('≈')).toBe(true);
    expect(formatLength(330.2, 'mm')).toBe('330.2 mm');
  });

  it('when typed lengths are parsed, then inches, fractions, mm and cm come out in mm', () => {
    expect(parseLengthMm('13in')).toBeCloseTo(330.2, 9);
    expect(parseLengthMm('1 1/2 in')).toBeCloseTo(38.1, 9);
    expect(parseLengthMm('3/16"')).toBeCloseTo(4.7625, 9);
    expect(parseLengthMm('330mm')).toBe(330);
    expect(parseLengthMm('33 cm')).toBe(330);
    expect(parseLengthMm('13', 'in')).toBeCloseTo(330.2, 9);
    expect(parseLengthMm('13 feet')).toBeUndefined();
    expect(parseLengthMm('1/0in')).toBeUndefined();
    expect(parseThickness('10oz')).toEqual({ value: 10, unit: 'oz' });
    expect(parseThickness('4 mm')).toEqual({ value: 4, unit: 'mm' });
  });

  it('when choosing punches, then #0 is 5/64 in (leathercraft handbook) and each number adds 1/64 in (from memory)', () => {
    expect(punchDiameterMm(0)).toBeCloseTo((5 / 64) * 25.4, 9);
    expect(nearestPunch(25.4 / 8)).toEqual({ size: '#3', diameterMm: 3.175 });
    expect(nearestPunch((3 / 16) * 25.4).size).toBe('#7');
    expect(nearestPunch(0.1).size).toBe('#0');
    expect(nearestPunch(100).size).toBe('#15');
  });
});
