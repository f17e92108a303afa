import { MM_PER_IN } from './units.ts';

/** Paper names a template can print on. "custom" is a sheet or roll of given width and length. */
export const PAPER_IDS = ['letter', 'legal', 'tabloid', 'a4', 'a3', 'custom'] as const;
export type PaperId = (typeof PAPER_IDS)[number];

/** A sheet's size in mm, short side first (portrait), with the default margin for its family. */
export interface PaperSize {
  id: PaperId;
  label: string;
  widthMm: number;
  heightMm: number;
  /** North American sizes default to 0.25 in, ISO sizes to 6 mm (common practice). */
  defaultMarginMm: number;
}

const QUARTER_IN = 0.25 * MM_PER_IN;

// Letter and Tabloid per ASME Y14.1 (ANSI A, B); Legal is the North American de facto size;
// A4 and A3 per ISO 216.
const SIZES: Record<Exclude<PaperId, 'custom'>, PaperSize> = {
  letter: { id: 'letter', label: 'Letter', widthMm: 8.5 * MM_PER_IN, heightMm: 11 * MM_PER_IN, defaultMarginMm: QUARTER_IN },
  legal: { id: 'legal', label: 'Legal', widthMm: 8.5 * MM_PER_IN, heightMm: 14 * MM_PER_IN, defaultMarginMm: QUARTER_IN },
  tabloid: { id: 'tabloid', label: 'Tabloid', widthMm: 11 * MM_PER_IN, heightMm: 17 * MM_PER_IN, defaultMarginMm: QUARTER_IN },
  a4: { id: 'a4', label: 'A4', widthMm: 210, heightMm: 297, defaultMarginMm: 6 },
  a3: { id: 'a3', label: 'A3', widthMm: 297, heightMm: 420, defaultMarginMm: 6 },
};

/** Smallest custom sheet side we lay out: the page furniture (squares, title, map) needs it. */
export const CUSTOM_MIN_SIDE_MM = 200;
/** Largest custom sheet side: a long wide-format roll (about 15 m). */
export const CUSTOM_MAX_SIDE_MM = 15_000;

/** The size of a named paper, or of a custom sheet (width, length in mm). */
export function paperSize(id: PaperId, custom?: { widthMm: number; lengthMm: number }): PaperSize {
  if (id !== 'custom') return SIZES[id];
  if (!custom) throw new Error('paper: custom needs width and length');
  const a = Math.min(custom.widthMm, custom.lengthMm);
  const b = Math.max(custom.widthMm, custom.lengthMm);
  return { id, label: `custom ${a.toFixed(0)} x ${b.toFixed(0)} mm`, widthMm: a, heightMm: b, defaultMarginMm: QUARTER_IN };
}
