import { formatLength, formatMm } from '@shared/units/format-length.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { lengthExample, parseLength } from '@shared/units/parse-length.ts';

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
 * Parses what a maker typed ("13", "13.5", "15½", "15 1/2", "15-1/2", "330 mm", "33cm") into
 * mm; a bare number takes the display unit. Not a length gives NaN, which the spec schema
 * names; lengthProblem says why in words.
 */
export function textToLengthMm(text: string, unit: LengthUnit): number {
  // A leading minus is allowed for ease and allowances that shorten.
  const r = parseLength(text, unit, { allowNegative: true });
  return r.ok ? r.mm : Number.NaN;
}

/** Why `text` is not a length, as a message beside the field ("Girth: "15x" is not a length; e.g. ..."), or null. */
export function lengthProblem(label: string, text: string, unit: LengthUnit): string | null {
  if (text.trim() === '') return null;
  const r = parseLength(text, unit, { allowNegative: true });
  return r.ok ? null : `${label}: "${text.trim()}" ${r.reason}; type ${lengthExample(unit)}`;
}

/** True when `text` still means `mm` (so re-rendering must not rewrite what is being typed). */
export function textMatches(text: string, mm: number | undefined, unit: LengthUnit): boolean {
  if (mm === undefined || !Number.isFinite(mm)) return text.trim() === '' || Number.isNaN(textToLengthMm(text, unit));
  const parsed = textToLengthMm(text, unit);
  // 1/64 in or 0.05 mm: the display precision of the two units.
  const tolerance = unit === 'in' ? 25.4 / 64 : 0.05;
  return Number.isFinite(parsed) && Math.abs(parsed - mm) < tolerance;
}
