import { parseLength } from './parse-length.ts';

/**
 * Length and leather-thickness units. Everything inside the engine is millimetres; these are
 * the only conversions, used at the edges (parsing input, formatting labels).
 */

/** Millimetres per inch, exact (International Yard and Pound Agreement, 1959). */
export const MM_PER_IN = 25.4;

/**
 * Millimetres per ounce of leather weight. Convention used throughout Latchet:
 * 1 oz = 1/64 in = 0.396875 mm exactly (US Federal Test Method Standard No. 311). The trade
 * often rounds this to 0.4 mm; we keep the exact figure so inch and ounce values agree.
 */
export const MM_PER_OZ = MM_PER_IN / 64;

/**
 * Inches to millimetres, rounded to the nanometre so that 1 1/2 in is stored as 38.1 and not
 * 38.099999999999994: specs and layouts are read by people, and 1e-9 mm is far below any
 * tolerance of leather or paper.
 */
export function inToMm(inches: number): number {
  return Math.round(inches * MM_PER_IN * 1e9) / 1e9;
}

/** Millimetres to inches. */
export function mmToIn(mm: number): number {
  return mm / MM_PER_IN;
}

/** Leather weight in ounces to thickness in millimetres (1 oz = 1/64 in). */
export function ozToMm(oz: number): number {
  return oz * MM_PER_OZ;
}

/** Thickness in millimetres to leather weight in ounces. */
export function mmToOz(mm: number): number {
  return mm / MM_PER_OZ;
}

/** A display unit for lengths. */
export type LengthUnit = 'in' | 'mm';

/** A leather thickness as the maker typed it: ounce weight or millimetres. */
export interface Thickness {
  value: number;
  unit: 'oz' | 'mm';
}

/** Thickness in millimetres from an ounce or millimetre value. */
export function thicknessMm(t: Thickness): number {
  return t.unit === 'oz' ? ozToMm(t.value) : t.value;
}

/**
 * Parses a typed length such as "13in", "1 1/2 in", "15½", "15-1/2", "3/16in", "330mm" or
 * "33cm" into mm (see parse-length.ts). A bare number takes `defaultUnit`. Returns undefined
 * when the text is not a length.
 */
export function parseLengthMm(text: string, defaultUnit: LengthUnit = 'mm'): number | undefined {
  const r = parseLength(text, defaultUnit);
  return r.ok ? r.mm : undefined;
}

/** Parses "10oz", "10 oz" or "4mm" (bare numbers are ounces) into a {@link Thickness}. */
export function parseThickness(text: string): Thickness | undefined {
  const m = /^\s*(\d+(?:\.\d+)?)\s*(oz|mm)?\s*$/i.exec(text);
  if (!m) return undefined;
  const unit = (m[2] ?? 'oz').toLowerCase() as 'oz' | 'mm';
  return { value: Number(m[1]), unit };
}
