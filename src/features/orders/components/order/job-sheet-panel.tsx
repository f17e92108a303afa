import { useState } from 'react';
import type { PrintLogEntry } from '@shared/schemas/order-views.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import { usePrintJobSheet } from '../../api/mutations.ts';

const PAPERS = [
  ['letter', 'Letter'],
  ['a4', 'A4'],
  ['legal', 'Legal'],
  ['tabloid', 'Tabloid'],
  ['a3', 'A3'],
] as const;

const paperLabel = (paper: string) => PAPERS.find(([v]) => v === paper)?.[1] ?? paper;

/** Prints the job sheet at the order's girth; every print is logged on the order and listed here. */
export function JobSheetPanel({ orderId, prints, ready }: { orderId: number; prints: PrintLogEntry[]; ready: boolean }) {
  const [paper, setPaper] = useState<string>('letter');
  const print = usePrintJobSheet(orderId);
  return (
    <div className="grid gap-3">
      {!ready && <p className="text-sm text-hide-700">The job sheet needs the order’s girth: a size, a measurement, or the customer’s answer.</p>}
      <div className="flex flex-wrap items-end gap-2">
        <SelectField label="Paper" value={paper} onChange={(e) => setPaper(e.target.value)} wrapperClassName="min-w-32">
          {PAPERS.map(([v, l]) => (
            <option key={v} value={v}>
              {l}
            </option>
          ))}
        </SelectField>
        <Button disabled={!ready} busy={print.isPending} onClick={() => print.mutate(paper)}>
          Print job sheet
        </Button>
      </div>
      <p className="text-xs text-hide-600">Template tiles at the order’s girth, cut list, hardware, punches, steps to tick and the cautions. Print at 100 %.</p>
      {print.isSuccess && (
        <p role="status" className="text-sm text-moss-700">
          Saved {print.data.fileName}.
        </p>
      )}
      {print.isError && (
        <Notice tone="danger" role="alert" title="The job sheet was not printed">
          {print.error.message}
        </Notice>
      )}
      {prints.length > 0 && (
        <ul className="grid gap-1 text-xs text-hide-700" data-testid="print-log">
          {prints.map((p) => (
            <li key={p.id}>
              Printed on {paperLabel(p.paper)} by {p.by?.name ?? 'someone'},{' '}
              <time dateTime={p.at}>{formatWhen(p.at)}</time>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
