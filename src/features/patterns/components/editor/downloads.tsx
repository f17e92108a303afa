import { useState } from 'react';
import type { PrintJobView } from '@shared/schemas/library-views.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { Cautions } from '@/components/pattern/cautions.tsx';
import type { TrialPrintInput } from '@shared/schemas/trial-print.ts';
import { Button, buttonClass } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { isApiError, type FieldErrors } from '@/lib/api-client.ts';
import { useDownload, usePrintJob } from '../../api/print-jobs.ts';
import { useTrialPrint } from '../../api/trial-print.ts';
import { PrintOptions, type PrintChoice } from './print-options.tsx';
import { PrintProgress } from './print-progress.tsx';
import { lengthOption, optionsBody, toQuery, trialOptionsBody } from './print-query.ts';

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
  /** Makers and owners may print the form's values unsaved (a trial print). */
  trial?: TrialSource;
}

/** Where a trial print takes its values from: the editor's form, as it is now. */
export interface TrialSource {
  patternId: number;
  /** The form's values (checked by the server with the spec schema). */
  values: () => unknown;
  /** The form's size names: a trial prints the form's run, not the saved one. */
  sizes: readonly string[];
  /** A value the schema refuses: the drawing above names it; nothing to print yet. */
  blocked: boolean;
  /** The server's refusals of spec fields (`spec.girthMm` -> message), to put beside the fields. */
  onSpecErrors?: (fields: Record<string, string>) => void;
}


/**
 * Print and download a saved revision: the print options, the template PDF (a run of three or
 * more sizes as a print job with a progress bar), the SVGs, and the shop-floor cautions.
 */
export function Downloads({ base, kind, revisionNumber, unit, sizes, dirty, trial }: DownloadsProps) {
  const [choice, setChoice] = useState<PrintChoice>({ paper: 'letter', orientation: 'auto', margin: '', overlap: '', jobSheet: false, size: 'all' });
  const [job, setJob] = useState<PrintJobView | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const download = useDownload();
  const printJob = usePrintJob(base, setJob);
  const trialPrint = useTrialPrint(trial?.patternId ?? 0);
  const size = sizes.includes(choice.size) ? choice.size : 'all';
  const girth = Boolean(choice.girth?.trim());
  const asJob = size === 'all' && sizes.length >= JOB_MIN_SIZES && !girth;
  const busy = download.isPending || printJob.isPending || trialPrint.isPending;

  const error = download.error ?? printJob.error ?? trialPrint.error;
  const fields: FieldErrors = isApiError(error) ? (error.fields ?? {}) : {};
  const known = ['paper', 'orientation', 'margin', 'overlap', 'jobSheet', 'size', 'girth'];
  const elsewhere = error && Object.keys(fields).every((f) => !known.includes(f));

  const reset = () => {
    setSaved(null);
    download.reset();
    printJob.reset();
    trialPrint.reset();
    setJob(null);
  };
  const onTrial = async () => {
    if (!trial) return;
    reset();
    try {
      const r = await trialPrint.mutateAsync({ spec: trial.values() as TrialPrintInput['spec'], basedOn: revisionNumber, options: trialOptionsBody(choice, unit, trial.sizes) });
      setSaved(`${r.fileName} (not saved)`);
    } catch (err) {
      // The mutation holds the error for the notice below; spec fields also go beside their input.
      if (isApiError(err, 400) && err.fields) trial.onSpecErrors?.(err.fields);
    }
  };
  const onPdf = async () => {
    reset();
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
  const girthOption = lengthOption(choice.girth ?? '', unit);
  const sizeQuery = girthOption ? `?girth=${encodeURIComponent(girthOption)}` : sizes.length > 0 && size !== 'all' ? `?size=${encodeURIComponent(size)}` : '';
  return (
    <div className="grid gap-3" data-testid="print-panel">
      <PrintOptions value={{ ...choice, size }} onChange={setChoice} unit={unit} sizes={sizes} errors={fields} disabled={busy} customerGirth />
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
          {asJob ? `Template PDF, all ${sizes.length} sizes` : girth ? 'Template PDF at this girth' : 'Template PDF'}
        </a>
        {trial && (
          <Button size="sm" variant="secondary" busy={trialPrint.isPending} disabled={busy || trial.blocked} onClick={() => void onTrial()} data-testid="trial-print">
            Print the form as it is (not saved)
          </Button>
        )}
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
          {isApiError(error) && error.fields ? (
            <ul className="list-disc pl-5">
              {Object.entries(error.fields).map(([f, m]) => (
                <li key={f}>{m}</li>
              ))}
            </ul>
          ) : (
            error.message
          )}
        </Notice>
      )}
      {saved && !error && (
        <p className="text-sm text-moss-700" role="status" data-testid="print-saved">
          Downloaded {saved}.
        </p>
      )}
      <p className="text-xs text-hide-600">
        Files are of revision {revisionNumber} as saved{dirty ? (trial ? '; “Print the form as it is” prints your changes, marked not saved' : '; save first to print your changes') : ''}. Print at 100 %
        (actual size).
      </p>
      <Cautions kind={kind} />
    </div>
  );
}
