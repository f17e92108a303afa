// The print-job table's bounds and lifetimes, driven by an injected clock (no waiting).
import { describe, expect, it } from 'vitest';
import { createPrintJobTable, DEFAULT_PRINT_JOB_LIMITS, QueueFullError, type PrintJobLimits } from './print-job-table.ts';

const file = { body: Buffer.from('%PDF-'), fileName: 'collar.pdf', contentType: 'application/pdf' };
const shop = { shopId: 1 };

function table(limits: Partial<PrintJobLimits> = {}) {
  let t = Date.UTC(2026, 11, 3, 9);
  const jobs = createPrintJobTable({ ...DEFAULT_PRINT_JOB_LIMITS, ...limits }, () => t);
  return { jobs, advance: (ms: number) => (t += ms), now: () => t };
}

describe('print-job table', () => {
  it('when a job is not finished within the run timeout, then it fails as timed out and a late file is dropped', () => {
    const { jobs, advance } = table({ runTimeoutMs: 60_000 });
    const job = jobs.add(shop, 'pdf', 'collar.pdf');
    advance(59_999);
    expect(jobs.get(job.id, shop)?.state).toBe('queued');
    advance(1);
    const late = jobs.get(job.id, shop)!;
    expect(late.state).toBe('failed');
    expect(late.error).toMatchObject({ code: 'print_timed_out', message: 'The print job did not finish within 60 s.' });
    jobs.finish(late, file);
    expect(late.file).toBeUndefined();
    expect(jobs.pendingCount()).toBe(0);
  });

  it('when a finished job passes its keep time, then it is gone, counted from when it finished', () => {
    const { jobs, advance, now } = table({ keepMs: 900_000 });
    const job = jobs.add(shop, 'pdf', 'collar.pdf');
    advance(30_000);
    jobs.finish(job, file);
    expect(job.expiresAt).toBe(now() + 900_000);
    advance(899_999);
    expect(jobs.get(job.id, shop)?.state).toBe('done');
    advance(1);
    expect(jobs.get(job.id, shop)).toBeUndefined();
  });

  it('when a timed-out job frees its place, then the owner may queue again', () => {
    const { jobs, advance } = table({ maxPendingPerOwner: 1, runTimeoutMs: 1000 });
    jobs.add(shop, 'pdf', 'a.pdf');
    expect(() => jobs.add(shop, 'pdf', 'b.pdf')).toThrow(QueueFullError);
    advance(1000);
    expect(jobs.add(shop, 'pdf', 'b.pdf').state).toBe('queued');
  });
});
