// Print-option refusals in the words of the print panel: the option's label and the
// pattern's display unit ("Margin must be at most 1 in"), never the query key.
import type { LengthUnit } from '@shared/units/length.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { HttpError, type FieldErrors } from '../../http/http-error.ts';

/** The label each option has in the print panel. */
export const OPTION_LABELS: Record<string, string> = {
  paper: 'Paper',
  width: 'Paper width',
  length: 'Paper length',
  orientation: 'Orientation',
  margin: 'Margin',
  overlap: 'Tile overlap',
  jobSheet: 'Add the job sheet',
  size: 'Size',
  girth: 'Customer girth',
};

// The print module words a length outside its limits as "margin: 30.00 mm is outside 0-25.4 mm".
const RANGE_RE = /^\w+: (-?[\d.]+) mm is outside (-?[\d.]+)-(-?[\d.]+) mm$/;

/** One option's refusal reworded with its label and lengths in `unit`. */
export function optionMessage(field: string, message: string, unit: LengthUnit): string {
  const label = OPTION_LABELS[field] ?? 'Print option';
  if (message.startsWith(label)) return message;
  const range = RANGE_RE.exec(message);
  if (range) {
    const [, value, min, max] = range.map(Number) as [number, number, number, number];
    return value < min ? `${label} must be at least ${formatLength(min, unit)}` : `${label} must be at most ${formatLength(max, unit)}`;
  }
  const rest = message.startsWith(`${field}:`) ? message.slice(field.length + 1).trim() : message;
  return `${label}: ${rest.replace(/paper=custom/g, 'custom paper').replace(/e\.g\. \w+=/g, 'e.g. ')}`;
}

/**
 * Rewords a 400 from the print module: each print option by its label in `unit`. Spec fields
 * (from the engine) keep their message; anything else passes through unchanged.
 */
export function humanPrintError(err: unknown, unit: LengthUnit, specPrefix = ''): unknown {
  if (!(err instanceof HttpError) || err.status !== 400 || !err.fields) return err;
  const fields: FieldErrors = {};
  for (const [field, message] of Object.entries(err.fields)) {
    if (field in OPTION_LABELS) fields[field] = optionMessage(field, message, unit);
    else fields[`${specPrefix}${field}`] = message.startsWith(`${field}: `) ? message.slice(field.length + 2) : message;
  }
  return new HttpError(400, err.code, Object.values(fields).join('; '), fields);
}
