import { useMutation } from '@tanstack/react-query';
import type { PrintJobView } from '@shared/schemas/library-views.ts';
import { api, ApiError } from '@/lib/api-client.ts';
import { downloadFile } from '@/lib/download-file.ts';

/** Print options as the server reads them (`paper=letter&orientation=auto&margin=6mm...`). */
export type PrintOptionsBody = Record<string, string | boolean>;

// Often enough for a bar that moves page by page, rare enough to leave the worker alone.
const POLL_MS = 350;

const wait = (ms: number, signal?: AbortSignal) =>
  new Promise<void>((resolve, reject) => {
    const t = setTimeout(resolve, ms);
    signal?.addEventListener('abort', () => {
      clearTimeout(t);
      reject(new DOMException('Stopped', 'AbortError'));
    });
  });

/**
 * A long print (a run of sizes) on the server's print worker: `POST <base>/print-jobs` (202
 * with the job), poll the job's `url` until done, then download its `fileUrl`. A failed job
 * rejects with an {@link ApiError} carrying the job's `fields`.
 */
export async function runPrintJob(base: string, body: PrintOptionsBody, onProgress: (job: PrintJobView) => void, signal?: AbortSignal) {
  let { job } = await api.post<{ job: PrintJobView }>(`${base}/print-jobs`, body);
  onProgress(job);
  while (job.state === 'queued' || job.state === 'running') {
    await wait(POLL_MS, signal);
    ({ job } = await api.get<{ job: PrintJobView }>(job.url, signal));
    onProgress(job);
  }
  if (job.state === 'failed') {
    throw new ApiError(422, job.error?.code ?? 'print_failed', job.error?.message ?? 'The print failed on the server.', job.error?.fields, { job });
  }
  const saved = await downloadFile(job.fileUrl, job.fileName);
  return { job, ...saved };
}

/** The job as a mutation, so the panel reads pending and error states the usual way. */
export function usePrintJob(base: string, onProgress: (job: PrintJobView) => void) {
  return useMutation({ mutationFn: (body: PrintOptionsBody) => runPrintJob(base, body, onProgress) });
}

/** A synchronous download (one size, or a short run) through fetch, so refusals name their option. */
export function useDownload() {
  return useMutation({ mutationFn: ({ path, fallbackName }: { path: string; fallbackName: string }) => downloadFile(path, fallbackName) });
}
