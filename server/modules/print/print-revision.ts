import type { StrapSpec } from '@shared/pattern/index.ts';
import { buildCutterSvg } from './cutter-svg.ts';
import { CONTENT_TYPES, downloadFileName, type ExportFormat } from './file-name.ts';
import { buildFullSizeSvg } from './full-size-svg.ts';
import { jobSheetFromRun } from './job-sheet-from-layout.ts';
import { parsePrintOptions, type PrintOptions, type PrintOptionsInput } from './print-options.ts';
import { revisionDate, revisionDrawing, type RevisionMeta } from './revision-drawing.ts';
import { buildTemplatePdf } from './template-pdf.ts';

/** A file ready to stream: bytes, a useful download name and its MIME type. */
export interface PrintedFile {
  body: Buffer;
  fileName: string;
  contentType: string;
}

/** Progress of a print job: stage and how far it is (done of total). */
export interface PrintProgress {
  stage: 'layout' | 'pages';
  done: number;
  total: number;
}

/**
 * Everything from a spec to a downloadable file, in this thread: sizes -> computeLayout ->
 * drawLayout -> PDF pages, full-size SVG or cutter SVG. Bad options throw PrintOptionsError
 * (field + limit); impossible geometry throws the engine's EngineError or PagePlanError.
 */
export async function printRevisionInline(
  spec: StrapSpec,
  options: PrintOptions | PrintOptionsInput,
  meta: RevisionMeta,
  format: ExportFormat = 'pdf',
  onProgress?: (p: PrintProgress) => void,
): Promise<PrintedFile> {
  const opts = isParsed(options) ? options : parsePrintOptions(options);
  const { drawing, layouts } = revisionDrawing(spec, opts, meta, (done, total) => onProgress?.({ stage: 'layout', done, total }));
  const fileName = downloadFileName({ patternName: meta.patternName || spec.name || spec.kind, revision: meta.revision, ...(opts.size ? { size: opts.size } : {}), paper: opts.paper, format });
  const contentType = CONTENT_TYPES[format];
  if (format === 'svg') return { body: Buffer.from(buildFullSizeSvg(drawing), 'utf8'), fileName, contentType };
  if (format === 'cutter.svg') return { body: Buffer.from(buildCutterSvg(drawing), 'utf8'), fileName, contentType };
  const body = await buildTemplatePdf({
    drawing,
    options: opts,
    date: revisionDate(meta.date).date,
    kind: spec.kind,
    ...(meta.footerNote ? { footerNote: meta.footerNote } : {}),
    ...(opts.jobSheet ? { jobSheet: { ...jobSheetFromRun(layouts), ...(meta.jobSheetOrder ? { order: meta.jobSheetOrder } : {}) } } : {}),
    onProgress: (done, total) => onProgress?.({ stage: 'pages', done, total }),
  });
  return { body, fileName, contentType };
}

/** Whether options are already parsed (they carry the resolved sheet). */
export function isParsed(o: PrintOptions | PrintOptionsInput): o is PrintOptions {
  return typeof o === 'object' && o !== null && 'sheet' in o && 'marginMm' in o;
}
