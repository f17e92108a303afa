import { describe, expect, it } from 'vitest';
import { parsePrintOptions, PrintOptionsError, type PrintOptions } from '../../server/modules/print/print-options.ts';
import { downloadFileName } from '../../server/modules/print/file-name.ts';

function fieldsOf(input: unknown): string[] {
  try {
    parsePrintOptions(input);
  } catch (e) {
    if (e instanceof PrintOptionsError) return e.fields.map((f) => f.field);
    throw e;
  }
  return [];
}

describe('print options from a query string', () => {
  it('when the issue example query is parsed, then lengths come out in mm (1 in = 25.4 mm, 1959 agreement)', () => {
    const o: PrintOptions = parsePrintOptions({ paper: 'letter', orientation: 'auto', margin: '6mm', overlap: '12mm', size: 'M' });
    expect(o).toMatchObject({ paper: 'letter', orientation: 'auto', marginMm: 6, overlapMm: 12, size: 'M', jobSheet: false });
    expect(parsePrintOptions({ margin: '1/4in' }).marginMm).toBeCloseTo(6.35, 9);
    expect(parsePrintOptions({ margin: '0.25 in' }).marginMm).toBeCloseTo(6.35, 9);
    const roll = parsePrintOptions({ paper: 'custom', width: '24in', length: '3ft' }).sheet;
    expect(roll.widthMm).toBeCloseTo(609.6, 9);
    expect(roll.heightMm).toBeCloseTo(914.4, 9);
  });

  it('when no margin is given, then Letter takes 0.25 in and A4 6 mm (common practice)', () => {
    expect(parsePrintOptions({ paper: 'letter' }).marginMm).toBeCloseTo(6.35, 9);
    expect(parsePrintOptions({ paper: 'a4' }).marginMm).toBe(6);
  });

  it('when options are bad, then the error names each field and its limit', () => {
    expect(fieldsOf({ paper: 'b5' })).toEqual(['paper']);
    expect(fieldsOf({ margin: '6' })).toEqual(['margin']);
    expect(fieldsOf({ overlap: '100mm' })).toEqual(['overlap']);
    expect(fieldsOf({ orientation: 'sideways' })).toEqual(['orientation']);
    expect(fieldsOf({ paper: 'custom', width: '24in' })).toEqual(['length']);
    expect(fieldsOf({ paper: 'a4', width: '24in' })).toEqual(['width']);
    expect(fieldsOf({ jobSheet: 'maybe' })).toEqual(['jobSheet']);
    expect(() => parsePrintOptions({ overlap: '100mm' })).toThrow(/overlap: 100\.00 mm is outside 0-60 mm/);
  });

  it('when a download name is made, then it is safe ASCII and says pattern, revision, size, paper', () => {
    expect(downloadFileName({ patternName: 'Collar for Juniper (café)', revision: 3, size: 'M', paper: 'letter', format: 'pdf' })).toBe('collar-for-juniper-cafe-r3-size-m-letter.pdf');
    expect(downloadFileName({ patternName: '../../etc', format: 'cutter.svg' })).toBe('etc.cutter.svg');
  });
});
