// Unit edges of the print module. Everything inside is millimetres; points appear only where
// pdfkit is called, and strings with units only where options are parsed.

/** 1 in = 25.4 mm exactly (International Yard and Pound Agreement, 1959). */
export const MM_PER_IN = 25.4;
/** PDF user-space unit: 1/72 in (ISO 32000-1, 8.3.2.1). */
export const PT_PER_IN = 72;
/** Points per millimetre. */
export const PT_PER_MM = PT_PER_IN / MM_PER_IN;

/** Millimetres to PDF points. */
export function mmToPt(mm: number): number {
  return (mm * PT_PER_IN) / MM_PER_IN;
}

/** Inches to millimetres. */
export function inToMm(inches: number): number {
  return inches * MM_PER_IN;
}

const LENGTH_RE = /^\s*(\d+(?:\.\d+)?|\d*\.\d+)(?:\s+(\d+)\/(\d+)|\/(\d+))?\s*(mm|cm|m|in|inch|inches|"|ft)\s*$/i;

const MM_PER_UNIT: Record<string, number> = {
  mm: 1,
  cm: 10,
  m: 1000,
  in: MM_PER_IN,
  inch: MM_PER_IN,
  inches: MM_PER_IN,
  '"': MM_PER_IN,
  ft: 12 * MM_PER_IN,
};

/**
 * Parses a length with its unit ("6mm", "0.25in", "1/4 in", "1 1/2in", "36in", "3ft") to mm.
 * A JS number is taken as mm; text must carry its unit. Returns undefined when the text is not a length, so the
 * caller can name its own field in the error.
 */
export function parseLengthMm(value: string | number): number | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? value : undefined;
  const m = LENGTH_RE.exec(value);
  // A bare number in text is refused: "0.25" could be inches or millimetres.
  if (!m) return undefined;
  const [, whole, num, den, slashDen, unit] = m;
  let n = Number(whole);
  if (num && den) n += Number(num) / Number(den);
  else if (slashDen) n = n / Number(slashDen);
  const per = MM_PER_UNIT[(unit ?? '').toLowerCase()];
  if (per === undefined || !Number.isFinite(n)) return undefined;
  return n * per;
}

/** A length for messages: "6.35 mm". */
export function fmtMm(mm: number, digits = 1): string {
  return `${mm.toFixed(digits)} mm`;
}
