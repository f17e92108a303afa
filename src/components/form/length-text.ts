import { formatLength, formatMm } from '@shared/units/format-length.ts';
import { parseLengthMm, type LengthUnit } from '@shared/units/length.ts';

/**
 * The text a length input shows for a value in mm: fractional inches to 1/32 in as a maker
 * reads a rule ("13", "1 3/16"), or mm with one decimal. The unit stays in the label.
 */
export function lengthToText(mm: number | undefined, unit: LengthUnit): string {
  if (mm === undefined || !Number.isFinite(mm)) return '';
  if (unit === 'mm') return formatMm(mm);
  return formatLength(mm, 'in').replace(/\s*in$/, '');
}

/**
 * Parses what a maker typed ("13", "13.5", "1 3/16", "330 mm", "33cm") into mm; a bare
 * number takes the display unit. Not a length gives NaN, which the spec schema names.
 */
export function textToLengthMm(text: string, unit: LengthUnit): number {
  if (text.trim() === '') return Number.NaN;
  // A leading minus is allowed for ease and allowances that shorten.
  const negative = /^\s*-/.test(text);
  const mm = parseLengthMm(text.replace(/^\s*-/, ''), unit);
  if (mm === undefined) return Number.NaN;
  return negative ? -mm : mm;
}

/** True when `text` still means `mm` (so re-rendering must not rewrite what is being typed). */
export function textMatches(text: string, mm: number | undefined, unit: LengthUnit): boolean {
  if (mm === undefined || !Number.isFinite(mm)) return text.trim() === '' || Number.isNaN(textToLengthMm(text, unit));
  const parsed = textToLengthMm(text, unit);
  // 1/64 in or 0.05 mm: the display precision of the two units.
  const tolerance = unit === 'in' ? 25.4 / 64 : 0.05;
  return Number.isFinite(parsed) && Math.abs(parsed - mm) < tolerance;
}
