// Print jobs: a long print (a size run, a long belt on small paper) posted once, rendered on
// the print worker thread, its progress polled, its file fetched when done.
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { badInput, HttpError } from '../../http/http-error.ts';
import { downloadFileName, EXPORT_FORMATS, parsePrintOptions, printErrorToHttp, runPrintJob, specsForSize, type ExportFormat, type PrintedFile } from '../print/index.ts';
import type { RevisionRow } from '../revisions/revisions.repository.ts';
import { createPrintJobTable, DEFAULT_PRINT_JOB_LIMITS, QueueFullError, type JobError, type JobOwner, type JobRecord, type PrintJobLimits } from './print-job-table.ts';
import type { PrintJobView } from '@shared/schemas/library-views.ts';

/** The body keys a job accepts: the pdf query's options plus the format. */
const OPTION_KEYS = ['format', 'paper', 'width', 'length', 'orientation', 'margin', 'overlap', 'size', 'jobSheet'] as const;

/** A job as the API answers it (`progress` is 0..1 over both stages, for a progress bar). */
// The answer's shape is shared with the client (one definition).
export type { PrintJobView };

// Laying out is quick next to drawing pages, so the bar gives it the first tenth.
const LAYOUT_SHARE = 0.1;
function progressOf(j: JobRecord): number {
  if (j.state === 'done') return 1;
  if (j.stage === null || j.total === 0) return 0;
  const f = j.done / j.total;
  return Math.round((j.stage === 'layout' ? LAYOUT_SHARE * f : LAYOUT_SHARE + (1 - LAYOUT_SHARE) * f) * 1000) / 1000;
}

/** The API's view of a job; `base` is the job's own URL. */
export function jobView(j: JobRecord, base: string): PrintJobView {
  return {
    id: j.id,
    state: j.state,
    stage: j.stage,
    done: j.done,
    total: j.total,
    progress: progressOf(j),
    format: j.format,
    fileName: j.fileName,
    createdAt: new Date(j.createdAt).toISOString(),
    expiresAt: new Date(j.expiresAt).toISOString(),
    url: base,
    fileUrl: `${base}/file`,
    ...(j.error ? { error: j.error } : {}),
  };
}

function parseBody(body: unknown): { format: ExportFormat; options: Record<string, unknown> } {
  const b = body ?? {};
  if (typeof b !== 'object' || Array.isArray(b)) throw badInput({ body: 'body: must be a JSON object of print options' });
  const unknown = Object.keys(b).filter((k) => !(OPTION_KEYS as readonly string[]).includes(k));
  if (unknown.length > 0) throw badInput(Object.fromEntries(unknown.map((k) => [k, `${k}: not a print option (use ${OPTION_KEYS.join(', ')})`])));
  const { format = 'pdf', ...options } = b as Record<string, unknown>;
  if (typeof format !== 'string' || !(EXPORT_FORMATS as readonly string[]).includes(format)) throw badInput({ format: `format: must be one of ${EXPORT_FORMATS.join(', ')}` });
  return { format: format as ExportFormat, options };
}

function jobError(e: unknown, log: (e: unknown) => void): JobError {
  const h = printErrorToHttp(e);
  if (h instanceof HttpError) return { code: h.code, message: h.message, ...(h.fields ? { fields: h.fields } : {}) };
  log(e);
  return { code: 'print_failed', message: 'The print failed on the server; try again, and tell us if it fails again.' };
}

/** Renders a job and relays its progress: the print worker, or a stand-in a test controls. */
export type PrintRunner = typeof runPrintJob;

export function createPrintJobsService(limits: Partial<PrintJobLimits> = {}, log: (e: unknown) => void = () => undefined, run: PrintRunner = runPrintJob) {
  const table = createPrintJobTable({ ...DEFAULT_PRINT_JOB_LIMITS, ...limits });

  return {
    table,
    /**
     * Checks the options now (bad ones answer 400 naming the option, before anything is
     * queued), adds the job (429 when the queue is full) and starts it on the print worker.
     */
    start(owner: JobOwner, patternName: string, revision: RevisionRow, body: unknown): JobRecord {
      const spec = JSON.parse(revision.spec) as StrapSpec;
      const { format, options: raw } = parseBody(body);
      const meta = { patternName, revision: revision.number, date: new Date(Number(revision.created_at)), sizes: spec.sizes ?? [] };
      let options;
      try {
        options = parsePrintOptions(raw);
        specsForSize(spec, options.size, meta.sizes);
      } catch (e) {
        throw printErrorToHttp(e);
      }
      const fileName = downloadFileName({ patternName: patternName || spec.name || spec.kind, revision: revision.number, ...(options.size ? { size: options.size } : {}), paper: options.paper, format });
      let job: JobRecord;
      try {
        job = table.add(owner, format, fileName);
      } catch (e) {
        if (e instanceof QueueFullError) throw new HttpError(429, 'print_queue_full', e.message, undefined, { limit: e.limit, scope: e.scope }, { 'Retry-After': '30' });
        throw e;
      }
      // Always the worker, even for one size: the request thread only relays messages.
      run({ spec, options, meta, format }, (p) => table.progress(job, p)).then(
        (f: PrintedFile) => table.finish(job, f),
        (e: unknown) => table.fail(job, jobError(e, log)),
      );
      return job;
    },
    /** The job for `owner`, or 404 (another shop's job, unknown or expired). */
    jobOr404(id: string | undefined, owner: JobOwner): JobRecord {
      const j = table.get(id, owner);
      if (!j) throw new HttpError(404, 'not_found', 'No such print job (it may have expired; post it again).');
      return j;
    },
    /** The finished file; 409 while it is not done, 422 naming the problem when it failed. */
    fileOf(j: JobRecord, base: string): PrintedFile {
      if (j.state === 'failed') throw new HttpError(422, j.error?.code ?? 'print_failed', j.error?.message ?? 'The print failed.', j.error?.fields, { job: jobView(j, base) });
      if (j.state !== 'done' || !j.file) throw new HttpError(409, 'print_job_not_done', `The print job is ${j.state} (${j.done} of ${j.total}); poll ${base} until its state is done.`, undefined, { job: jobView(j, base) });
      return j.file;
    },
  };
}

export type PrintJobsService = ReturnType<typeof createPrintJobsService>;
