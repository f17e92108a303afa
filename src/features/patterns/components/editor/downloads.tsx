import { useState } from 'react';
import { Cautions } from '@/components/pattern/cautions.tsx';
import { buttonClass } from '@/components/ui/button.tsx';
import { SelectField } from '@/components/ui/field.tsx';

const PAPERS = [
  { value: 'letter', label: 'Letter (8.5 × 11 in)' },
  { value: 'a4', label: 'A4 (210 × 297 mm)' },
  { value: 'legal', label: 'Legal (8.5 × 14 in)' },
  { value: 'tabloid', label: 'Tabloid (11 × 17 in)' },
  { value: 'a3', label: 'A3 (297 × 420 mm)' },
];

export interface DownloadsProps {
  /** e.g. `/api/patterns/7/revisions/3` or `/api/s/<token>`; the server adds /pdf, /svg, /cutter.svg. */
  base: string;
  kind: string;
  revisionNumber: number;
  /** Unsaved changes are not in the files: say so. */
  dirty?: boolean;
}

/** Print and download a saved revision, with the shop-floor cautions beside the buttons. */
export function Downloads({ base, kind, revisionNumber, dirty }: DownloadsProps) {
  const [paper, setPaper] = useState('letter');
  return (
    <div className="grid gap-3">
      <SelectField label="Paper" value={paper} onChange={(e) => setPaper(e.target.value)}>
        {PAPERS.map((p) => (
          <option key={p.value} value={p.value}>
            {p.label}
          </option>
        ))}
      </SelectField>
      <div className="flex flex-wrap gap-2">
        <a className={buttonClass('primary', 'sm')} href={`${base}/pdf?paper=${paper}`} download>
          Template PDF
        </a>
        <a className={buttonClass('secondary', 'sm')} href={`${base}/svg`} download>
          Full-size SVG
        </a>
        <a className={buttonClass('secondary', 'sm')} href={`${base}/cutter.svg`} download>
          Cutter SVG
        </a>
      </div>
      <p className="text-xs text-hide-600">
        Files are of revision {revisionNumber} as saved{dirty ? '; save first to print your changes' : ''}. Print at 100 % (actual size).
      </p>
      <Cautions kind={kind} />
    </div>
  );
}
