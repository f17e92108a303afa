import { z } from 'zod';
import { StrapSpecSchema } from './strap-spec.ts';

/**
 * Print options as the client sends them (`paper`, `orientation`, `margin`, `overlap`,
 * `jobSheet`, `size`): the print module parses and limits them, so this only keeps the shape.
 */
export const PrintOptionsBodySchema = z.record(z.string(), z.union([z.string(), z.number(), z.boolean()]));

/**
 * A trial print: the form's current values printed without saving a revision. `basedOn` is
 * the revision the form started from, named in the title block ("not saved · from rev 3").
 */
export const TrialPrintSchema = z.object({
  spec: StrapSpecSchema,
  basedOn: z.number().int().positive().optional(),
  options: PrintOptionsBodySchema.default({}),
});

export type TrialPrintInput = z.input<typeof TrialPrintSchema>;

/** Printed in the title block of a trial print and first on every page's footer line. */
export const NOT_SAVED_TITLE = 'not saved';
export const NOT_SAVED_FOOTER = 'NOT SAVED: a trial print of values that are not a saved revision';
