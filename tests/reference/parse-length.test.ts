// Lengths typed the way makers write them, checked against fraction.js (the fraction's value)
// and convert-units (the unit conversion), and the editor's field text built on the parser.
import convert from 'convert-units';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { parseLength } from '@shared/units/parse-length.ts';
import { lengthProblem, textToLengthMm } from '@/components/form/length-text.ts';
import { girthMmOf } from '../../server/modules/downloads/customer-girth.ts';

const mmOf = (text: string, unit: 'in' | 'mm' = 'in') => {
  const r = parseLength(text, unit);
  if (!r.ok) throw new Error(`"${text}" ${r.reason}`);
  return r.mm;
};
// convert-units 2.x gives 25.3999992 mm for 1 in: compare within 1e-3 mm.
const inchesRef = (fraction: string) => convert(new Fraction(fraction).valueOf()).from('in').to('mm');

describe('typed lengths (fraction.js and convert-units as reference)', () => {
  it('when fifteen and a half inches is typed five ways in an inch field, then each is 15 1/2 in in mm', () => {
    const ref = inchesRef('15 1/2');
    for (const text of ['15½', '15 ½', '15 1/2', '15-1/2', '15.5', '15,5', '15 1/2 in', '15½"', '15 1⁄2']) expect(mmOf(text), text).toBeCloseTo(ref, 3);
  });

  it('when a length carries its own unit, then that unit wins over the field unit (convert-units)', () => {
    expect(mmOf('381mm')).toBe(381);
    expect(mmOf('38.1 cm')).toBeCloseTo(convert(38.1).from('cm').to('mm'), 9);
    expect(mmOf('15 1/2 in', 'mm')).toBeCloseTo(inchesRef('15 1/2'), 3);
    expect(mmOf('3 centimetres', 'in')).toBeCloseTo(30, 9);
  });

  it('when every vulgar fraction from 1/10 to 7/8 follows a whole number, then its value is the fraction.js value', () => {
    const glyphs: [string, string][] = [['¼', '1/4'], ['¾', '3/4'], ['⅛', '1/8'], ['⅜', '3/8'], ['⅝', '5/8'], ['⅞', '7/8'], ['⅓', '1/3'], ['⅒', '1/10']];
    for (const [glyph, frac] of glyphs) expect(mmOf(`2${glyph}`), glyph).toBeCloseTo(inchesRef(`2 ${frac}`), 3);
    expect(mmOf('¾')).toBeCloseTo(inchesRef('3/4'), 3);
  });

  it('when a bare number is typed in a mm field, then it is millimetres', () => {
    expect(mmOf('394', 'mm')).toBe(394);
    expect(mmOf('39.4', 'mm')).toBeCloseTo(39.4, 9);
  });

  it('when the text is not a length, then the parser says why in words', () => {
    expect(parseLength('fifteen', 'in')).toEqual({ ok: false, reason: 'is not a length' });
    expect(parseLength('15 feet', 'in')).toMatchObject({ ok: false, reason: 'is not a length (units: in, mm, cm)' });
    expect(parseLength('1/0', 'in')).toMatchObject({ ok: false });
    expect(parseLength('1.5 1/2', 'in')).toMatchObject({ ok: false });
    expect(parseLength('-2', 'in')).toMatchObject({ ok: false, reason: 'cannot be less than zero' });
    expect(parseLength('-2', 'in', { allowNegative: true })).toEqual({ ok: true, mm: -50.8 });
  });

  it('when a maker types 15½ in the editor with inches shown, then the field holds 393.7 mm and a typo gets a message naming the label', () => {
    expect(textToLengthMm('15½', 'in')).toBeCloseTo(393.7, 9);
    expect(textToLengthMm('-1/2', 'in')).toBeCloseTo(-12.7, 9);
    expect(lengthProblem('Girth', '15x', 'in')).toBe('Girth: "15x" is not a length (units: in, mm, cm); type e.g. 15 1/2, 15½ or 394 mm');
    expect(lengthProblem('Girth', 'about 15', 'in')).toBe('Girth: "about 15" is not a length; type e.g. 15 1/2, 15½ or 394 mm');
    expect(lengthProblem('Girth', '15-1/2', 'in')).toBeNull();
  });

  it('when an apprentice types a customer girth of 15½ or 15-1/2 for a print, then it is 15 1/2 in (the same parser)', () => {
    expect(girthMmOf('15½', 'in')).toBeCloseTo(inchesRef('15 1/2'), 3);
    expect(girthMmOf('15-1/2', 'in')).toBeCloseTo(inchesRef('15 1/2'), 3);
    expect(girthMmOf('394', 'mm')).toBe(394);
    expect(girthMmOf('wide', 'in')).toBeUndefined();
  });
});
