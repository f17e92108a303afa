// The print-job table: long print runs started over HTTP, kept in memory with bounds.
//
// Why in memory and not in SQLite: a job's file is derived data (the same revision and
// options give the same bytes), so losing it on a restart costs only a re-post; the server is
// one process over one SQLite file, so nothing else needs to see the table; and keeping
// megabytes of PDF out of the write path keeps saves fast. The bounds below keep memory and
// the worker's queue finite.
import { randomBytes } from 'node:crypto';
import type { ExportFormat, PrintedFile, PrintProgress } from '../print/index.ts';

/** Bounds of the table; every one can be set per app (tests use small ones). */
export interface PrintJobLimits {
  /** Jobs queued or running at once, over every shop and share link. */
  maxPending: number;
  /** Jobs queued or running at once for one shop (or one share link). */
  maxPendingPerOwner: number;
  /** Jobs kept at all (finished ones are dropped oldest first beyond this). */
  maxKept: number;
  /** A job not finished this long after it was posted fails as timed out, ms. */
  runTimeoutMs: number;
  /** How long a finished job and its file stay downloadable, ms. */
  keepMs: number;
}

/** Defaults: a shop printing a few runs at once, files kept long enough to fetch them. */
export const DEFAULT_PRINT_JOB_LIMITS: PrintJobLimits = {
  maxPending: 8,
  maxPendingPerOwner: 4,
  maxKept: 32,
  runTimeoutMs: 5 * 60_000,
  keepMs: 15 * 60_000,
};

export type JobState = 'queued' | 'running' | 'done' | 'failed';

/** Who may see a job: members of one shop, or holders of one share link. */
export type JobOwner = { shopId: number } | { shareId: number };

/** What went wrong, in the API's error shape. */
export interface JobError {
  code: string;
  message: string;
  fields?: Record<string, string>;
}

export interface JobRecord {
  id: string;
  owner: JobOwner;
  state: JobState;
  stage: PrintProgress['stage'] | null;
  done: number;
  total: number;
  format: ExportFormat;
  fileName: string;
  createdAt: number;
  /** When the job is dropped: posted + run timeout while unfinished, finished + keep after. */
  expiresAt: number;
  file?: PrintedFile;
  error?: JobError;
}

const sameOwner = (a: JobOwner, b: JobOwner) => ('shopId' in a && 'shopId' in b ? a.shopId === b.shopId : 'shareId' in a && 'shareId' in b && a.shareId === b.shareId);
const pending = (j: JobRecord) => j.state === 'queued' || j.state === 'running';

/** Why a job could not be added: the whole queue or this owner's share of it is full. */
export class QueueFullError extends Error {
  constructor(
    readonly scope: 'server' | 'owner',
    readonly limit: number,
  ) {
    super(scope === 'server' ? `The print queue is full (${limit} jobs); try again in a minute.` : `At most ${limit} print jobs may run at once for one shop; wait for one to finish.`);
    this.name = 'QueueFullError';
  }
}

/**
 * The table. `now` (ms since the epoch) is injectable so expiry is tested by moving a clock,
 * never by waiting; the default reads Date.now() at each call, so fake timers reach it too.
 */
export function createPrintJobTable(limits: PrintJobLimits = DEFAULT_PRINT_JOB_LIMITS, now: () => number = () => Date.now()) {
  const jobs = new Map<string, JobRecord>();

  function sweep(): void {
    const t = now();
    for (const j of jobs.values()) {
      if (j.expiresAt > t) continue;
      if (pending(j)) fail(j, { code: 'print_timed_out', message: `The print job did not finish within ${Math.round(limits.runTimeoutMs / 1000)} s.` });
      else jobs.delete(j.id);
    }
  }

  function fail(j: JobRecord, error: JobError): void {
    j.state = 'failed';
    j.error = error;
    j.expiresAt = now() + limits.keepMs;
  }

  return {
    limits,
    /** Adds a queued job, or throws QueueFullError. */
    add(owner: JobOwner, format: ExportFormat, fileName: string): JobRecord {
      sweep();
      const open = [...jobs.values()].filter(pending);
      if (open.length >= limits.maxPending) throw new QueueFullError('server', limits.maxPending);
      if (open.filter((j) => sameOwner(j.owner, owner)).length >= limits.maxPendingPerOwner) throw new QueueFullError('owner', limits.maxPendingPerOwner);
      // Map order is insertion order: the first finished jobs met are the oldest.
      for (const j of jobs.values()) {
        if (jobs.size < limits.maxKept) break;
        if (!pending(j)) jobs.delete(j.id);
      }
      const t = now();
      const job: JobRecord = { id: randomBytes(16).toString('base64url'), owner, state: 'queued', stage: null, done: 0, total: 0, format, fileName, createdAt: t, expiresAt: t + limits.runTimeoutMs };
      jobs.set(job.id, job);
      return job;
    },
    /** The job if `owner` may see it and it has not expired; otherwise undefined (404). */
    get(id: string | undefined, owner: JobOwner): JobRecord | undefined {
      sweep();
      const j = id === undefined ? undefined : jobs.get(id);
      return j && sameOwner(j.owner, owner) ? j : undefined;
    },
    progress(j: JobRecord, p: PrintProgress): void {
      if (!pending(j)) return;
      j.state = 'running';
      j.stage = p.stage;
      j.done = p.done;
      j.total = p.total;
    },
    finish(j: JobRecord, file: PrintedFile): void {
      if (!pending(j)) return; // timed out meanwhile: the late file is dropped
      j.state = 'done';
      j.file = file;
      j.expiresAt = now() + limits.keepMs;
    },
    fail(j: JobRecord, error: JobError): void {
      if (pending(j)) fail(j, error);
    },
    /** Jobs queued or running (for tests and health). */
    pendingCount: () => [...jobs.values()].filter(pending).length,
  };
}

export type PrintJobTable = ReturnType<typeof createPrintJobTable>;
