// The customer's measuring page: girths shown as people read them, and ranges that take
// real bodies but catch a reading in the wrong unit.
import { describe, expect, it } from 'vitest';
import { MEASURE_KINDS, formatGirth } from './measure-kinds.ts';
import { measureAnswerSchema } from './orders.ts';

describe('formatGirth', () => {
  it('when a girth is shown in inches, then it is rounded to the nearest 1/8 in and reduced (1 in = 25.4 mm, 1959 agreement)', () => {
    expect(formatGirth(355.6, 'in')).toBe('14 in');
    expect(formatGirth(358.775, 'in')).toBe('14 1/8 in');
    expect(formatGirth(368.3, 'in')).toBe('14 1/2 in');
    expect(formatGirth(150, 'in')).toBe('5 7/8 in'); // 5.906 in
    expect(formatGirth(10, 'in')).toBe('3/8 in');
  });
  it('when a girth is shown in cm or mm, then it has at most one decimal', () => {
    expect(formatGirth(365, 'cm')).toBe('36.5 cm');
    expect(formatGirth(900, 'cm')).toBe('90 cm');
    expect(formatGirth(357.25, 'mm')).toBe('357.3 mm');
  });
});

describe('measuring ranges', () => {
  it("when typical necks, waists and wrists are entered, then they are accepted (from memory: a toy breed's neck about 8 in, a giant breed's about 30 in; waists 24-50 in; wrists 5-8 in)", () => {
    const ok = (kind: keyof typeof MEASURE_KINDS, mm: number) => measureAnswerSchema(kind).safeParse({ unit: 'in', girthMm: mm, confirmGirthMm: mm }).success;
    expect([8, 30].map((i) => ok('collar', i * 25.4))).toEqual([true, true]);
    expect([24, 50].map((i) => ok('belt', i * 25.4))).toEqual([true, true]);
    expect([5, 8].map((i) => ok('watch-strap', i * 25.4))).toEqual([true, true]);
  });
  it('when a neck is typed in cm but read as inches (36 cm sent as 36 in), then it is refused', () => {
    const r = measureAnswerSchema('collar').safeParse({ unit: 'in', girthMm: 36 * 25.4, confirmGirthMm: 36 * 25.4 });
    expect(r.success).toBe(false);
  });
  it('when two wrist readings differ by 6 mm, then they are refused; by 5 mm, accepted', () => {
    const s = measureAnswerSchema('watch-strap');
    expect(s.safeParse({ unit: 'cm', girthMm: 160, confirmGirthMm: 166 }).success).toBe(false);
    expect(s.safeParse({ unit: 'cm', girthMm: 160, confirmGirthMm: 165 }).success).toBe(true);
  });
});
