import { z } from 'zod';
import { CUSTOM_MAX_SIDE_MM, CUSTOM_MIN_SIDE_MM, PAPER_IDS, paperSize, type PaperId, type PaperSize } from './paper.ts';
import { parseLengthMm } from './units.ts';

/** Limits of the print options, in mm. */
export const MARGIN_MAX_MM = 25.4;
export const OVERLAP_MAX_MM = 60;
/** Tile overlap when none is given: more than the 0.25 in most printers cannot reach (common practice). */
export const DEFAULT_OVERLAP_MM = 12;

export const ORIENTATIONS = ['auto', 'portrait', 'landscape'] as const;
export type Orientation = (typeof ORIENTATIONS)[number];

function lengthField(field: string, minMm: number, maxMm: number) {
  return z.union([z.number(), z.string()]).transform((v, ctx) => {
    const mm = parseLengthMm(v);
    if (mm === undefined) {
      ctx.addIssue({ code: 'custom', message: `${field}: "${String(v)}" is not a length; give a unit, e.g. 6mm or 0.25in` });
      return z.NEVER;
    }
    if (mm < minMm || mm > maxMm) {
      ctx.addIssue({ code: 'custom', message: `${field}: ${mm.toFixed(2)} mm is outside ${minMm}-${maxMm} mm` });
      return z.NEVER;
    }
    return mm;
  });
}

const booleanField = z
  .union([z.boolean(), z.enum(['true', 'false', '1', '0', 'yes', 'no', 'on', 'off', ''])], {
    message: 'jobSheet: must be true or false',
  })
  .transform((v) => v === true || v === 'true' || v === '1' || v === 'yes' || v === 'on' || v === '');

/**
 * Print options as they arrive from a query string, CLI flags or JSON:
 * `paper=letter&orientation=auto&margin=6mm&overlap=12mm&size=M&jobSheet=true`.
 * Lengths in text carry a unit (mm, cm, in, ft); numbers are mm. `size` picks one graded
 * size by name, or `all` for the whole run.
 */
export const PrintOptionsSchema = z
  .object({
    paper: z.enum(PAPER_IDS, { message: `paper: must be one of ${PAPER_IDS.join(', ')}` }).default('letter'),
    width: lengthField('width', CUSTOM_MIN_SIDE_MM, CUSTOM_MAX_SIDE_MM).optional(),
    length: lengthField('length', CUSTOM_MIN_SIDE_MM, CUSTOM_MAX_SIDE_MM).optional(),
    orientation: z.enum(ORIENTATIONS, { message: `orientation: must be one of ${ORIENTATIONS.join(', ')}` }).default('auto'),
    margin: lengthField('margin', 0, MARGIN_MAX_MM).optional(),
    overlap: lengthField('overlap', 0, OVERLAP_MAX_MM).optional(),
    jobSheet: booleanField.default(false),
    size: z
      .string()
      .trim()
      .min(1, { message: 'size: must not be empty' })
      .max(40, { message: 'size: at most 40 characters' })
      .optional(),
  })
  .superRefine((o, ctx) => {
    if (o.paper === 'custom') {
      if (o.width === undefined) ctx.addIssue({ code: 'custom', path: ['width'], message: 'width: paper=custom needs the sheet or roll width, e.g. width=24in' });
      if (o.length === undefined) ctx.addIssue({ code: 'custom', path: ['length'], message: 'length: paper=custom needs the sheet or roll length, e.g. length=1200mm' });
    } else {
      if (o.width !== undefined) ctx.addIssue({ code: 'custom', path: ['width'], message: `width: only for paper=custom (paper is ${o.paper})` });
      if (o.length !== undefined) ctx.addIssue({ code: 'custom', path: ['length'], message: `length: only for paper=custom (paper is ${o.paper})` });
    }
  })
  .transform((o): PrintOptions => {
    const sheet = paperSize(o.paper, o.width !== undefined && o.length !== undefined ? { widthMm: o.width, lengthMm: o.length } : undefined);
    return {
      paper: o.paper,
      sheet,
      orientation: o.orientation,
      marginMm: o.margin ?? sheet.defaultMarginMm,
      overlapMm: o.overlap ?? DEFAULT_OVERLAP_MM,
      jobSheet: o.jobSheet,
      ...(o.size !== undefined ? { size: o.size } : {}),
    };
  });

/** Parsed print options; every length in mm. */
export interface PrintOptions {
  paper: PaperId;
  /** Portrait size of the sheet (short side first). */
  sheet: PaperSize;
  orientation: Orientation;
  marginMm: number;
  overlapMm: number;
  jobSheet: boolean;
  /** A graded size name, or "all" for the run; absent = the spec as given. */
  size?: string;
}

/** What callers may pass in (query string values, CLI flags or JSON). */
export type PrintOptionsInput = z.input<typeof PrintOptionsSchema>;

/** Bad print options: `field` names the option, `message` says the limit. */
export class PrintOptionsError extends Error {
  constructor(
    message: string,
    readonly fields: { field: string; message: string }[],
  ) {
    super(message);
    this.name = 'PrintOptionsError';
  }
}

/** Parses print options, throwing {@link PrintOptionsError} naming each bad field. */
export function parsePrintOptions(input: unknown): PrintOptions {
  const r = PrintOptionsSchema.safeParse(input ?? {});
  if (r.success) return r.data;
  const fields = r.error.issues.map((i) => {
    const field = String(i.path[0] ?? i.message.split(':')[0] ?? 'options');
    const message = i.message.startsWith(`${field}:`) ? i.message : `${field}: ${i.message}`;
    return { field, message };
  });
  throw new PrintOptionsError(fields.map((f) => f.message).join('; '), fields);
}
