// Print downloads of a saved revision (PDF template, full-size SVG, cutter SVG) through the
// printing module's one entry, printRevision.
import type { Request } from 'express';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { printErrorToHttp, printRevision, type ExportFormat, type PrintedFile } from '../print/index.ts';
import type { RevisionRow } from '../revisions/revisions.repository.ts';
import { atCustomerGirth } from './customer-girth.ts';
import { humanPrintError } from './print-option-fields.ts';

/**
 * Renders `revision` of the pattern named `patternName` as `format`, options from the query
 * string. `girth=14in` prints the pattern fitted to a customer's girth (the title block says
 * so); the revision itself is not changed.
 */
export async function printSaved(patternName: string, revision: RevisionRow, format: ExportFormat, query: Request['query']): Promise<PrintedFile> {
  const saved = JSON.parse(revision.spec) as StrapSpec;
  const { girth, ...options } = query as Record<string, string>;
  try {
    const fitted = girth === undefined ? undefined : atCustomerGirth(saved, girth, options.size);
    const spec = fitted?.spec ?? saved;
    return await printRevision(spec, options, {
      patternName,
      revision: revision.number,
      date: new Date(Number(revision.created_at)),
      sizes: spec.sizes ?? [],
      ...(fitted ? { revisionNote: fitted.note } : {}),
    }, format);
  } catch (err) {
    throw humanPrintError(printErrorToHttp(err), saved.units);
  }
}

/** Content-Disposition for a download name (RFC 6266; the name is ASCII-safe already). */
export const attachment = (fileName: string) => `attachment; filename="${fileName}"`;
