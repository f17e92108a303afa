import type { LengthUnit } from '@shared/units/length.ts';
import { textToLengthMm } from '@/components/form/length-text.ts';
import type { PrintOptionsBody } from '../../api/print-jobs.ts';
import type { PrintChoice } from './print-options.tsx';

// A length as typed becomes mm with its unit ("6mm"); what is not a length goes as typed, so
// the server names it beside the option.
export function lengthOption(text: string, unit: LengthUnit): string | undefined {
  if (text.trim() === '') return undefined;
  const mm = textToLengthMm(text, unit);
  return Number.isFinite(mm) ? `${Math.round(mm * 1000) / 1000}mm` : text.trim();
}

/**
 * The options the server reads, from what the panel holds: the size only when there is a run,
 * and a customer girth instead of the size when one is typed (the saved pattern fitted to it).
 */
export function optionsBody(c: PrintChoice, unit: LengthUnit, hasSizes: boolean): PrintOptionsBody {
  const margin = lengthOption(c.margin, unit);
  const overlap = lengthOption(c.overlap, unit);
  const girth = lengthOption(c.girth ?? '', unit);
  return {
    paper: c.paper,
    orientation: c.orientation,
    ...(margin !== undefined ? { margin } : {}),
    ...(overlap !== undefined ? { overlap } : {}),
    jobSheet: c.jobSheet,
    ...(girth !== undefined ? { girth } : hasSizes && c.size ? { size: c.size } : {}),
  };
}

/** The same options for a trial print of the form's values: its own girth and run, no customer girth. */
export function trialOptionsBody(c: PrintChoice, unit: LengthUnit, formSizes: readonly string[]): PrintOptionsBody {
  const size = formSizes.includes(c.size) ? c.size : formSizes.length > 0 ? 'all' : '';
  return optionsBody({ ...c, girth: '', size }, unit, formSizes.length > 0);
}

/** The same options as a query string for the synchronous download. */
export const toQuery = (body: PrintOptionsBody) => new URLSearchParams(Object.entries(body).map(([k, v]) => [k, String(v)])).toString();
