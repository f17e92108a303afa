import { useState } from 'react';
import type { PrintJobView } from '@shared/schemas/library-views.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { Cautions } from '@/components/pattern/cautions.tsx';
import { buttonClass } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { isApiError, type FieldErrors } from '@/lib/api-client.ts';
import { useDownload, usePrintJob } from '../../api/print-jobs.ts';
import { PrintOptions, type PrintChoice } from './print-options.tsx';
import { PrintProgress } from './print-progress.tsx';
import { optionsBody, toQuery } from './print-query.ts';

/** A run this long renders on the server's print worker, with progress, instead of in the request. */
export const JOB_MIN_SIZES = 3;

export interface DownloadsProps {
  /** e.g. `/api/patterns/7/revisions/3`; the server adds /pdf, /svg, /cutter.svg, /print-jobs. */
  base: string;
  kind: string;
  revisionNumber: number;
  /** The saved revision's display unit and size names (the files are of the saved revision). */
  unit: LengthUnit;
  sizes: readonly string[];
  /** Unsaved changes are not in the files: say so. */
  dirty?: boolean;
}


/**
 * Print and download a saved revision: the print options, the template PDF (a run of three or
 * more sizes as a print job with a progress bar), the SVGs, and the shop-floor cautions.
 */
export function Downloads({ base, kind, revisionNumber, unit, sizes, dirty }: DownloadsProps) {
  const [choice, setChoice] = useState<PrintChoice>({ paper: 'letter', orientation: 'auto', margin: '', overlap: '', jobSheet: false, size: 'all' });
  const [job, setJob] = useState<PrintJobView | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const download = useDownload();
  const printJob = usePrintJob(base, setJob);
  const size = sizes.includes(choice.size) ? choice.size : 'all';
  const asJob = size === 'all' && sizes.length >= JOB_MIN_SIZES;
  const busy = download.isPending || printJob.isPending;

  const error = download.error ?? printJob.error;
  const fields: FieldErrors = isApiError(error) ? (error.fields ?? {}) : {};
  const known = ['paper', 'orientation', 'margin', 'overlap', 'jobSheet', 'size'];
  const elsewhere = error && Object.keys(fields).every((f) => !known.includes(f));

  const onPdf = async () => {
    setSaved(null);
    download.reset();
    printJob.reset();
    setJob(null);
    const body = optionsBody({ ...choice, size }, unit, sizes.length > 0);
    try {
      if (asJob) {
        const r = await printJob.mutateAsync(body);
        setSaved(`${r.fileName}: ${r.job.total} pages`);
      } else {
        const r = await download.mutateAsync({ path: `${base}/pdf?${toQuery(body)}`, fallbackName: 'template.pdf' });
        setSaved(r.fileName);
      }
    } catch {
      // The mutation holds the error; the options and the notice below show it.
    }
  };

  const pdfQuery = toQuery(optionsBody({ ...choice, size }, unit, sizes.length > 0));
  const sizeQuery = sizes.length > 0 && size !== 'all' ? `?size=${encodeURIComponent(size)}` : '';
  return (
    <div className="grid gap-3" data-testid="print-panel">
      <PrintOptions value={{ ...choice, size }} onChange={setChoice} unit={unit} sizes={sizes} errors={fields} disabled={busy} />
      <div className="flex flex-wrap gap-2">
        {/* A link, so it still downloads without script; with script it fetches, to show refusals beside the options. */}
        <a
          className={buttonClass('primary', 'sm', busy ? 'pointer-events-none opacity-60' : undefined)}
          href={`${base}/pdf?${pdfQuery}`}
          download
          aria-disabled={busy || undefined}
          onClick={(e) => {
            e.preventDefault();
            if (!busy) void onPdf();
          }}
        >
          {asJob ? `Template PDF, all ${sizes.length} sizes` : 'Template PDF'}
        </a>
        <a className={buttonClass('secondary', 'sm')} href={`${base}/svg${sizeQuery}`} download>
          Full-size SVG
        </a>
        <a className={buttonClass('secondary', 'sm')} href={`${base}/cutter.svg${sizeQuery}`} download>
          Cutter SVG
        </a>
      </div>
      {job && <PrintProgress job={job} />}
      {error && (elsewhere || !isApiError(error)) && (
        <Notice tone="danger" role="alert" title="The server did not print it">
          {error.message}
        </Notice>
      )}
      {saved && !error && (
        <p className="text-sm text-moss-700" role="status" data-testid="print-saved">
          Downloaded {saved}.
        </p>
      )}
      <p className="text-xs text-hide-600">
        Files are of revision {revisionNumber} as saved{dirty ? '; save first to print your changes' : ''}. Print at 100 % (actual size).
      </p>
      <Cautions kind={kind} />
    </div>
  );
}
