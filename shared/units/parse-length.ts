/**
 * Reads a length as a maker types it into a field: "15½", "15 1/2", "15-1/2", "15.5",
 * "15,5", "381mm", "38.1 cm", "15 1/2 in", "15½″". A bare number is in the field's unit.
 * One parser for the editor's length fields, the customer-girth box and the CLI.
 */
import type { LengthUnit } from './length.ts';

// 1 in = 25.4 mm exactly; rounded to the nanometre like inToMm (length.ts imports this file).
const inToMm = (inches: number) => Math.round(inches * 25.4 * 1e9) / 1e9;

/** Unicode vulgar fractions a phone keyboard or a pasted note may hold. */
const VULGAR: Record<string, [number, number]> = {
  '½': [1, 2], '⅓': [1, 3], '⅔': [2, 3], '¼': [1, 4], '¾': [3, 4], '⅕': [1, 5], '⅖': [2, 5], '⅗': [3, 5], '⅘': [4, 5],
  '⅙': [1, 6], '⅚': [5, 6], '⅐': [1, 7], '⅛': [1, 8], '⅜': [3, 8], '⅝': [5, 8], '⅞': [7, 8], '⅑': [1, 9], '⅒': [1, 10],
};

/** Unit words and marks, to the unit they mean. */
const UNITS: Record<string, 'in' | 'mm' | 'cm'> = {
  in: 'in', inch: 'in', inches: 'in', '"': 'in', '″': 'in', '”': 'in', "''": 'in',
  mm: 'mm', millimetre: 'mm', millimetres: 'mm', millimeter: 'mm', millimeters: 'mm',
  cm: 'cm', centimetre: 'cm', centimetres: 'cm', centimeter: 'cm', centimeters: 'cm',
};

/** The result of reading a typed length: millimetres, or why it is not a length. */
export type ParsedLength = { ok: true; mm: number } | { ok: false; reason: string };

// whole, then optional fraction (after a space or a dash), or a fraction alone; then a unit.
const NUMBER_RE = /^(\d+(?:\.\d+)?)?(?:(?:\s+|-)?(\d+)\/(\d+))?$/;

/** Splits off the unit at the end ("15 1/2 in" -> ["15 1/2", "in"]). */
function splitUnit(text: string): [string, string | undefined] {
  const m = /^(.*?)\s*([a-z]+|"|″|”|'')$/i.exec(text);
  if (!m || !/[\d½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅐⅛⅜⅝⅞⅑⅒]$/.test(m[1]!)) return [text, undefined];
  return [m[1]!, m[2]!.toLowerCase()];
}

/**
 * Parses `text` into mm. `unit` is the field's unit, used when the text names none. A
 * leading minus is kept when `allowNegative` (ease and allowances that shorten).
 */
export function parseLength(text: string, unit: LengthUnit, opts: { allowNegative?: boolean } = {}): ParsedLength {
  let t = text.trim().replace(/\u2044/g, '/').replace(/\s+/g, ' ');
  if (t === '') return { ok: false, reason: 'is empty' };
  const negative = t.startsWith('-') || t.startsWith('−');
  if (negative) {
    if (!opts.allowNegative) return { ok: false, reason: 'cannot be less than zero' };
    t = t.slice(1).trim();
  }
  const [numberText, unitWord] = splitUnit(t);
  const u = unitWord === undefined ? unit : UNITS[unitWord];
  if (!u) return { ok: false, reason: 'is not a length (units: in, mm, cm)' };
  // A vulgar fraction becomes " n/d" so "15½" reads as "15 1/2".
  let n = numberText.replace(/[½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅐⅛⅜⅝⅞⅑⅒]/g, (c) => ` ${VULGAR[c]![0]}/${VULGAR[c]![1]}`).trim();
  // A decimal comma ("38,1") reads as a point.
  n = n.replace(/^(\d+),(\d+)$/, '$1.$2');
  const m = NUMBER_RE.exec(n);
  if (!m || (m[1] === undefined && m[2] === undefined)) return { ok: false, reason: 'is not a length' };
  const [, whole, num, den] = m;
  if (den !== undefined && Number(den) === 0) return { ok: false, reason: 'has a fraction over zero' };
  if (whole?.includes('.') && num !== undefined) return { ok: false, reason: 'mixes a decimal point and a fraction' };
  const value = (whole ? Number(whole) : 0) + (num !== undefined ? Number(num) / Number(den) : 0);
  const mm = u === 'in' ? inToMm(value) : u === 'cm' ? Math.round(value * 10 * 1e9) / 1e9 : value;
  return { ok: true, mm: negative ? -mm : mm };
}

/** What to type, for a message beside a field ("e.g. 15 1/2, 15½ or 394 mm"). */
export function lengthExample(unit: LengthUnit): string {
  return unit === 'in' ? 'e.g. 15 1/2, 15½ or 394 mm' : 'e.g. 394, 39.4 cm or 15 1/2 in';
}
