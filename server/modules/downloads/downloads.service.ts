// Print downloads of a saved revision (PDF template, full-size SVG, cutter SVG) through the
// printing module's one entry, printRevision.
import type { Request } from 'express';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { printErrorToHttp, printRevision, type ExportFormat, type PrintedFile } from '../print/index.ts';
import type { RevisionRow } from '../revisions/revisions.repository.ts';

/** Renders `revision` of the pattern named `patternName` as `format`, options from the query string. */
export async function printSaved(patternName: string, revision: RevisionRow, format: ExportFormat, query: Request['query']): Promise<PrintedFile> {
  const spec = JSON.parse(revision.spec) as StrapSpec;
  try {
    return await printRevision(spec, query as Record<string, string>, { patternName, revision: revision.number, date: new Date(Number(revision.created_at)), sizes: spec.sizes ?? [] }, format);
  } catch (err) {
    throw printErrorToHttp(err);
  }
}

/** Content-Disposition for a download name (RFC 6266; the name is ASCII-safe already). */
export const attachment = (fileName: string) => `attachment; filename="${fileName}"`;
