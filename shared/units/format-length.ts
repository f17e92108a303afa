import Fraction from 'fraction.js';
import { MM_PER_IN, type LengthUnit } from './length.ts';

/** Finest fraction used for inch labels: 1/32 in (about 0.8 mm), the finest rule marking in common use. */
export const INCH_DENOMINATOR = 32;

/**
 * Formats a length in mm for display: fractional inches rounded to the nearest 1/32 in
 * ("1 3/16 in", "3/4 in", "21 in") or millimetres with one decimal ("30.2 mm").
 * Set `approx` to prefix "≈" when the inch value was rounded by more than 0.01 mm.
 */
export function formatLength(mm: number, unit: LengthUnit, opts: { approx?: boolean } = {}): string {
  if (unit === 'mm') return `${formatMm(mm)} mm`;
  const inches = mm / MM_PER_IN;
  const steps = Math.round(inches * INCH_DENOMINATOR);
  const rounded = steps / INCH_DENOMINATOR;
  const text = new Fraction(steps, INCH_DENOMINATOR).toFraction(true);
  const mark = opts.approx && Math.abs(rounded - inches) * MM_PER_IN > 0.01 ? '≈' : '';
  return `${mark}${text} in`;
}

/** Millimetres with one decimal, trailing ".0" dropped ("25.4", "330", "-3.2"). */
export function formatMm(mm: number): string {
  const t = (Math.round(mm * 10) / 10).toFixed(1);
  const s = t.endsWith('.0') ? t.slice(0, -2) : t;
  return s === '-0' ? '0' : s;
}

/**
 * A length as {@link formatLength} writes it but without the unit ("1 1/2", "30.2"), for
 * drawings whose legend names the unit once.
 */
export function formatLengthBare(mm: number, unit: LengthUnit): string {
  return formatLength(mm, unit).replace(/ (in|mm)$/, '');
}
