// A trial print: the editor's current values printed as the tiled PDF without saving a
// revision, marked "not saved" in the title block and on every page's footer line.
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { NOT_SAVED_FOOTER, NOT_SAVED_TITLE } from '@shared/schemas/trial-print.ts';
import { downloadFileName, printErrorToHttp, printRevision, type PrintedFile } from '../print/index.ts';
import { humanPrintError } from './print-option-fields.ts';

export interface TrialPrintRequest {
  spec: StrapSpec;
  basedOn?: number | undefined;
  options: Record<string, string | number | boolean>;
}

/**
 * Prints `spec` (already checked by StrapSpecSchema) for the pattern named `patternName`.
 * `now` dates the title block: a trial has no revision date of its own.
 */
export async function printTrial(patternName: string, body: TrialPrintRequest, now: Date): Promise<PrintedFile> {
  const { spec } = body;
  try {
    const file = await printRevision(spec, body.options as Record<string, string>, {
      patternName,
      revision: NOT_SAVED_TITLE,
      ...(body.basedOn !== undefined ? { revisionNote: `from rev ${body.basedOn}` } : {}),
      footerNote: NOT_SAVED_FOOTER,
      date: now,
      sizes: spec.sizes ?? [],
    }, 'pdf');
    const size = typeof body.options.size === 'string' ? body.options.size : undefined;
    const paper = typeof body.options.paper === 'string' ? body.options.paper : 'letter';
    // "collar-for-juniper-not-saved-letter.pdf": nobody mistakes it for a revision's file.
    const fileName = downloadFileName({ patternName: `${patternName || spec.name} not saved`, ...(size ? { size } : {}), paper, format: 'pdf' });
    return { ...file, fileName };
  } catch (err) {
    // Engine refusals are of the form's values: keyed `spec.<field>` so the editor places them.
    throw humanPrintError(printErrorToHttp(err), spec.units, 'spec.');
  }
}
