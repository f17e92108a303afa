import type { PrintJobView } from '@shared/schemas/library-views.ts';

/** What the print worker is doing, in the words a maker reads on the bar. */
export function jobStep(job: PrintJobView): string {
  if (job.state === 'done') return `Done: ${job.total} ${job.total === 1 ? 'page' : 'pages'}`;
  if (job.state === 'failed') return 'The print failed';
  if (job.stage === 'layout') return `Laying out size ${job.done} of ${job.total}`;
  if (job.stage === 'pages') return `Drawing page ${job.done} of ${job.total}`;
  return 'Waiting for the print worker';
}

/** The job's progress bar with its step ("Drawing page 3 of 13"). */
export function PrintProgress({ job }: { job: PrintJobView }) {
  const pct = Math.round(job.progress * 100);
  const step = jobStep(job);
  return (
    <div className="grid gap-1" data-testid="print-progress">
      <div
        role="progressbar"
        aria-label="Print job"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        aria-valuetext={step}
        className="h-2.5 overflow-hidden rounded-full bg-hide-100 ring-1 ring-hide-200"
      >
        <div className={job.state === 'failed' ? 'h-full bg-thread-500' : 'h-full bg-brass-500 transition-[width] duration-300'} style={{ width: `${pct}%` }} />
      </div>
      <p className="flex justify-between text-xs tabular-nums text-hide-700" aria-live="polite">
        <span data-testid="print-step">{step}</span>
        <span>{pct} %</span>
      </p>
    </div>
  );
}
