// The print module's public face: the routes and the CLI import from here only.
import type { StrapSpec } from '@shared/pattern/index.ts';
import type { ExportFormat } from './file-name.ts';
import { runPrintJob } from './print-job.ts';
import { parsePrintOptions, type PrintOptions, type PrintOptionsInput } from './print-options.ts';
import { isParsed, printRevisionInline, type PrintedFile, type PrintProgress } from './print-revision.ts';
import type { RevisionMeta } from './revision-drawing.ts';
import { ALL_SIZES } from './size-run.ts';

export { PrintOptionsSchema, parsePrintOptions, PrintOptionsError, type PrintOptions, type PrintOptionsInput } from './print-options.ts';
export { PAPER_IDS, paperSize, type PaperId, type PaperSize } from './paper.ts';
export { buildTemplatePdf, planTemplate, type TemplateInput } from './template-pdf.ts';
export { buildCutterSvg } from './cutter-svg.ts';
export { buildFullSizeSvg } from './full-size-svg.ts';
export { downloadFileName, EXPORT_FORMATS, CONTENT_TYPES, type ExportFormat } from './file-name.ts';
export { PagePlanError, type PagePlan } from './page-plan.ts';
export { jobSheetFromLayout } from './job-sheet-from-layout.ts';
export { printRevisionInline, type PrintedFile, type PrintProgress } from './print-revision.ts';
export { runPrintJob, printQueueDepth, stopPrintWorker } from './print-job.ts';
export { ALL_SIZES, specsForSize, type SizeDef } from './size-run.ts';
export type { RevisionMeta } from './revision-drawing.ts';
export { printErrorToHttp } from './print-http-error.ts';

/** Size runs at least this long go to the worker thread. */
export const WORKER_MIN_SIZES = 3;

/**
 * One call for the routes: spec + options (parsed or raw query) + revision meta -> a file to
 * stream. Small jobs render inline; a size run of {@link WORKER_MIN_SIZES} or more sizes renders
 * in a worker thread (queued) so the request thread never blocks, with progress reported.
 */
export async function printRevision(
  spec: StrapSpec,
  options: PrintOptions | PrintOptionsInput,
  meta: RevisionMeta,
  format: ExportFormat = 'pdf',
  onProgress?: (p: PrintProgress) => void,
): Promise<PrintedFile> {
  const opts = isParsed(options) ? options : parsePrintOptions(options);
  const sizes = opts.size === undefined ? 1 : opts.size.toLowerCase() === ALL_SIZES ? (meta.sizes?.length ?? 0) : 1;
  if (sizes >= WORKER_MIN_SIZES) return runPrintJob({ spec, options: opts, meta, format }, onProgress);
  return printRevisionInline(spec, opts, meta, format, onProgress);
}
