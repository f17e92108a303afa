import { Worker } from 'node:worker_threads';
import { EngineError, type StrapSpec } from '@shared/pattern/index.ts';
import type { ExportFormat } from './file-name.ts';
import { PagePlanError } from './page-plan.ts';
import { PrintOptionsError, type PrintOptions, type PrintOptionsInput } from './print-options.ts';
import type { PrintedFile, PrintProgress } from './print-revision.ts';
import type { RevisionMeta } from './revision-drawing.ts';

/** One print job as it crosses into the worker (structured-clone data only). */
export interface PrintJob {
  spec: StrapSpec;
  options: PrintOptions | PrintOptionsInput;
  meta: RevisionMeta;
  format: ExportFormat;
}

/** A job as posted to the worker. */
export interface JobRequest {
  id: number;
  job: PrintJob;
}

/** Messages the print worker sends, tagged with the job id. */
export type WorkerMessage =
  | { id: number; type: 'progress'; progress: PrintProgress }
  | { id: number; type: 'done'; body: Uint8Array; fileName: string; contentType: string }
  | { id: number; type: 'error'; name: string; message: string; field?: string; limit?: string; fields?: { field: string; message: string }[] };

interface Pending {
  resolve: (f: PrintedFile) => void;
  reject: (e: Error) => void;
  onProgress?: (p: PrintProgress) => void;
}

// One long-lived worker (starting one costs over a second under tsx); it takes jobs in
// order, and is unref'd so an idle worker never keeps the process alive.
let worker: Worker | undefined;
let nextId = 1;
const pending = new Map<number, Pending>();

function rebuild(m: Extract<WorkerMessage, { type: 'error' }>): Error {
  if (m.name === 'PrintOptionsError') return new PrintOptionsError(m.message, m.fields ?? []);
  if (m.name === 'PagePlanError') return new PagePlanError(m.field ?? 'paper', m.message);
  if (m.name === 'EngineError') return new EngineError(m.field ?? 'spec', m.message, m.limit);
  return new Error(m.message);
}

function failAll(e: Error): void {
  for (const p of pending.values()) p.reject(e);
  pending.clear();
  worker = undefined;
}

function getWorker(): Worker {
  if (worker) return worker;
  // The worker is TypeScript: a small JS bootstrap registers tsx inside the thread.
  const w = new Worker(new URL('./print-worker-boot.js', import.meta.url));
  w.unref();
  w.on('message', (m: WorkerMessage) => {
    const p = pending.get(m.id);
    if (!p) return;
    if (m.type === 'progress') return p.onProgress?.(m.progress);
    pending.delete(m.id);
    if (pending.size === 0) w.unref();
    if (m.type === 'done') p.resolve({ body: Buffer.from(m.body.buffer, m.body.byteOffset, m.body.byteLength), fileName: m.fileName, contentType: m.contentType });
    else p.reject(rebuild(m));
  });
  w.on('error', (e) => failAll(e));
  w.on('exit', (code) => failAll(new Error(`print worker stopped (exit ${code}) before it finished`)));
  worker = w;
  return w;
}

/** Jobs waiting in or running on the worker. */
export function printQueueDepth(): number {
  return pending.size;
}

/** Stops the worker (server shutdown, tests); queued jobs are rejected. */
export async function stopPrintWorker(): Promise<void> {
  const w = worker;
  worker = undefined;
  if (w) await w.terminate();
}

/**
 * Runs a print job on the worker thread (jobs queue there, one at a time) and relays its
 * progress. Resolves with the file; rejects with the same error types the inline path
 * throws (PrintOptionsError, PagePlanError, EngineError).
 */
export function runPrintJob(job: PrintJob, onProgress?: (p: PrintProgress) => void): Promise<PrintedFile> {
  const w = getWorker();
  const id = nextId++;
  return new Promise<PrintedFile>((resolve, reject) => {
    pending.set(id, { resolve, reject, ...(onProgress ? { onProgress } : {}) });
    // Keep the process alive while a job is out, as any pending I/O would.
    w.ref();
    w.postMessage({ id, job } satisfies JobRequest);
  });
}
