/**
 * What the customer's measuring page says and accepts for each kind of piece: how to measure
 * (our own words), the sane range of a girth, and how closely the two readings must agree.
 * Ranges are wide on purpose (a toy breed to a giant breed; a child's wrist to a large man's):
 * they catch a reading in the wrong unit or a slipped digit, not an unusual body.
 */
import { MM_PER_IN } from '../units/length.ts';
import type { PresetName } from './strap-spec.ts';

/** How a girth is shown to a person: inches (to 1/8 in), centimetres (0.1) or mm. */
export type GirthUnit = 'in' | 'cm' | 'mm';

export interface MeasureKind {
  /** Smallest and largest girth the page accepts, mm. */
  minMm: number;
  maxMm: number;
  /** Largest difference between the two readings, mm. */
  agreeMm: number;
  /** What is measured, as the page's heading says it ("neck", "waist"). */
  where: string;
  /** Steps, in order. */
  howTo: string[];
}

const TAPE = 'Use a soft tape measure. No tape? Wrap a piece of string or a paper strip, mark where it meets, and lay it along a ruler.';
const NO_EXTRA = 'Give us the body measurement only: do not add room for comfort. We add the allowance for the buckle and the fit.';

/** Per pattern kind. Wrists agree within 5 mm; everything else within 10 mm (about 3/8 in). */
export const MEASURE_KINDS: Record<PresetName, MeasureKind> = {
  collar: {
    minMm: 150,
    maxMm: 900,
    agreeMm: 10,
    where: 'neck',
    howTo: [
      TAPE,
      'Measure round the middle of the neck, where the collar will sit, with the animal standing and its head up.',
      'Keep the tape snug but flat against the fur, not pulled tight.',
      NO_EXTRA,
      'Measure a second time, letting go of the tape in between, and enter both readings.',
    ],
  },
  belt: {
    minMm: 500,
    maxMm: 1600,
    agreeMm: 10,
    where: 'waist',
    howTo: [
      TAPE,
      'Measure round the waist where the belt will be worn, over the clothes you will wear with it.',
      'Keep the tape level all the way round and breathe out normally.',
      NO_EXTRA,
      'Measure a second time and enter both readings.',
    ],
  },
  'watch-strap': {
    minMm: 110,
    maxMm: 250,
    agreeMm: 5,
    where: 'wrist',
    howTo: [TAPE, 'Measure round the wrist just above the wrist bone, where the watch will sit.', 'Keep the tape snug, not tight.', NO_EXTRA, 'Measure a second time and enter both readings.'],
  },
  bracelet: {
    minMm: 110,
    maxMm: 250,
    agreeMm: 5,
    where: 'wrist',
    howTo: [TAPE, 'Measure round the wrist where the bracelet will sit.', 'Keep the tape snug, not tight.', NO_EXTRA, 'Measure a second time and enter both readings.'],
  },
  'bag-strap': {
    minMm: 400,
    maxMm: 1800,
    agreeMm: 10,
    where: 'strap length',
    howTo: [
      TAPE,
      'Hang the bag where you like it, then measure from one strap fixing, over the shoulder (or across the body), to the other.',
      'Measure a second time and enter both readings.',
    ],
  },
  leash: {
    minMm: 600,
    maxMm: 3000,
    agreeMm: 10,
    where: 'lead length',
    howTo: [TAPE, 'Measure from your hand to the collar ring with the dog walking comfortably beside you, or measure a lead you like.', 'Measure a second time and enter both readings.'],
  },
  keeper: {
    minMm: 30,
    maxMm: 400,
    agreeMm: 5,
    where: 'round the strap',
    howTo: [TAPE, 'Measure round the strap or straps the keeper will hold, snug.', 'Measure a second time and enter both readings.'],
  },
};

/** A girth as a person reads it: "14 3/8 in", "36.5 cm", "365 mm". Inches to 1/8 in. */
export function formatGirth(mm: number, unit: GirthUnit): string {
  if (unit === 'cm') return `${trimZero((Math.round(mm) / 10).toFixed(1))} cm`;
  if (unit === 'mm') return `${trimZero((Math.round(mm * 10) / 10).toFixed(1))} mm`;
  const eighths = Math.round((mm / MM_PER_IN) * 8);
  const whole = Math.floor(eighths / 8);
  let num = eighths % 8;
  let den = 8;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  if (num === 0) return `${whole} in`;
  return whole === 0 ? `${num}/${den} in` : `${whole} ${num}/${den} in`;
}

const trimZero = (s: string) => (s.endsWith('.0') ? s.slice(0, -2) : s);

/** What each kind of piece is called in sentences to customers ("a collar"). */
export const PIECE_WORDS: Record<PresetName, string> = {
  collar: 'a collar',
  belt: 'a belt',
  'watch-strap': 'a watch strap',
  'bag-strap': 'a bag strap',
  leash: 'a lead',
  bracelet: 'a bracelet',
  keeper: 'a keeper',
};
