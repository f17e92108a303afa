// Print-job helpers for API tests: post a job, poll it until it settles, read a binary body.
import request from 'supertest';
import type { Express } from 'express';
import type { PrintJobView } from '@shared/schemas/library-views.ts';
import type { PrintRunner } from '../../server/modules/downloads/print-jobs.service.ts';
import type { PrintProgress } from '../../server/modules/print/index.ts';
import { runPrintJob } from '../../server/modules/print/index.ts';

/** The job shape the API answers: the one definition the server and client share. */
export type JobBody = PrintJobView;

/** A supertest request whose body is collected as a Buffer (PDFs, SVGs). */
export const binary = (req: request.Test) =>
  req.buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  });

/** Posts a job to `path` (a .../print-jobs URL) and returns the 202's job. */
export async function postJob(app: Express, path: string, body: object = {}, cookie?: string): Promise<JobBody> {
  let req = request(app).post(path);
  if (cookie) req = req.set('Cookie', cookie);
  const res = await req.send(body);
  if (res.status !== 202) throw new Error(`POST ${path}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.job as JobBody;
}

/**
 * Polls the job at `url` every `everyMs` until it is done or failed (at most `timeoutMs`);
 * returns every answer seen, the last one settled.
 */
export async function pollJob(app: Express, url: string, cookie?: string, everyMs = 5, timeoutMs = 60_000, afterEachPoll?: () => void): Promise<JobBody[]> {
  const seen: JobBody[] = [];
  const until = Date.now() + timeoutMs;
  for (;;) {
    let req = request(app).get(url);
    if (cookie) req = req.set('Cookie', cookie);
    const res = await req;
    if (res.status !== 200) throw new Error(`GET ${url}: ${res.status} ${JSON.stringify(res.body)}`);
    const job = res.body.job as JobBody;
    seen.push(job);
    if (job.state === 'done' || job.state === 'failed') return seen;
    if (Date.now() > until) throw new Error(`job ${url} still ${job.state} after ${timeoutMs} ms`);
    afterEachPoll?.();
    await new Promise((r) => setTimeout(r, everyMs));
  }
}

/**
 * A print runner (the app's `printRunner`) that holds every job queued until `release()`, then
 * renders it on the real worker. A queue-full test needs its first job still open when the next
 * one is posted; on a fast machine a five-size run had finished before that (a few ms).
 */
export function heldPrints(): { run: PrintRunner; release: () => void } {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => (release = resolve));
  return { run: (job, onProgress) => gate.then(() => runPrintJob(job, onProgress)), release };
}

/**
 * A print runner that renders on the real worker but hands the job table one progress message,
 * and at the end the file, per `step()`: a test that polls and steps in turn sees every state
 * in between, however fast the machine prints (pollJob's afterEachPoll is the place to step).
 */
export function steppedPrints(): { run: PrintRunner; step: () => void } {
  // A step with nothing waiting is dropped, not saved up: the polls made while the worker
  // renders would otherwise release every message at once.
  let wake: (() => void) | undefined;
  const turn = () => new Promise<void>((resolve) => (wake = resolve));
  const step = () => {
    const w = wake;
    wake = undefined;
    w?.();
  };
  const run: PrintRunner = async (job, onProgress) => {
    const messages: PrintProgress[] = [];
    const file = await runPrintJob(job, (p) => messages.push(p));
    for (const p of messages) {
      await turn();
      onProgress?.(p);
    }
    await turn();
    return file;
  };
  return { run, step };
}
