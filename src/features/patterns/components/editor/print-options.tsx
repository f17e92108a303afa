import type { LengthUnit } from '@shared/units/length.ts';
import { lengthToText } from '@/components/form/length-text.ts';
import { CheckboxField } from '@/components/ui/checkbox-field.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import type { FieldErrors } from '@/lib/api-client.ts';

const PAPERS = [
  { value: 'letter', label: 'Letter (8.5 × 11 in)' },
  { value: 'a4', label: 'A4 (210 × 297 mm)' },
  { value: 'legal', label: 'Legal (8.5 × 14 in)' },
  { value: 'tabloid', label: 'Tabloid (11 × 17 in)' },
  { value: 'a3', label: 'A3 (297 × 420 mm)' },
];
const ORIENTATIONS = [
  { value: 'auto', label: 'Fewest pages' },
  { value: 'portrait', label: 'Portrait' },
  { value: 'landscape', label: 'Landscape' },
];

/** The print options as the panel holds them; lengths as typed, in the display unit. */
export interface PrintChoice {
  paper: string;
  orientation: string;
  margin: string;
  overlap: string;
  jobSheet: boolean;
  /** A size name, "all", or "" for the pattern's own girth (no run). */
  size: string;
  /** A customer's girth as typed (display unit); when set it replaces the size. */
  girth?: string;
}

export interface PrintOptionsProps {
  value: PrintChoice;
  onChange: (next: PrintChoice) => void;
  unit: LengthUnit;
  sizes: readonly string[];
  /** The server's refusals, keyed by option. */
  errors: FieldErrors;
  disabled?: boolean;
  /** Offer "Customer girth": the saved pattern fitted to one girth for this print. */
  customerGirth?: boolean;
}

/** Paper, orientation, margin, tile overlap, job sheet and (for a run) which size to print. */
export function PrintOptions({ value, onChange, unit, sizes, errors, disabled, customerGirth }: PrintOptionsProps) {
  const set = <K extends keyof PrintChoice>(key: K, v: PrintChoice[K]) => onChange({ ...value, [key]: v });
  return (
    <div className="grid grid-cols-2 gap-x-3 gap-y-3">
      <SelectField label="Paper" value={value.paper} error={errors.paper} disabled={disabled} onChange={(e) => set('paper', e.target.value)} wrapperClassName="col-span-2">
        {PAPERS.map((p) => (
          <option key={p.value} value={p.value}>
            {p.label}
          </option>
        ))}
      </SelectField>
      <SelectField label="Orientation" value={value.orientation} error={errors.orientation} disabled={disabled} onChange={(e) => set('orientation', e.target.value)}>
        {ORIENTATIONS.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </SelectField>
      {customerGirth && value.girth === undefined && (
        <div className="col-span-2">
          <button type="button" className="text-sm font-medium text-hide-800 underline underline-offset-2" disabled={disabled} onClick={() => set('girth', '')}>
            Print at a customer&rsquo;s girth…
          </button>
        </div>
      )}
      {customerGirth && value.girth !== undefined && (
        <TextField
          label="Customer girth"
          unit={unit}
          value={value.girth ?? ''}
          error={errors.girth}
          placeholder={sizes.length > 0 ? 'a size of the run' : 'the pattern’s own'}
          hint="Prints the saved pattern fitted to this girth; the pattern is not changed."
          inputMode="decimal"
          autoComplete="off"
          disabled={disabled}
          onChange={(e) => set('girth', e.target.value)}
          wrapperClassName="col-span-2"
        />
      )}
      {sizes.length > 0 && (
        <SelectField label="Size" value={value.size} error={errors.size} disabled={disabled || Boolean(value.girth?.trim())} onChange={(e) => set('size', e.target.value)}>
          <option value="all">All {sizes.length} sizes</option>
          {sizes.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
        </SelectField>
      )}
      <TextField
        label="Margin"
        unit={unit}
        value={value.margin}
        error={errors.margin}
        placeholder={lengthToText(value.paper === 'a4' || value.paper === 'a3' ? 6 : 6.35, unit)}
        hint="Empty: the paper's own."
        inputMode="decimal"
        autoComplete="off"
        disabled={disabled}
        onChange={(e) => set('margin', e.target.value)}
      />
      <TextField
        label="Tile overlap"
        unit={unit}
        value={value.overlap}
        error={errors.overlap}
        placeholder={lengthToText(12, unit)}
        hint="Shared by pages that join; empty: 12 mm."
        inputMode="decimal"
        autoComplete="off"
        disabled={disabled}
        onChange={(e) => set('overlap', e.target.value)}
      />
      <div className="col-span-2">
        <CheckboxField
          label="Add the job sheet"
          hint="Cut list, hardware, punches and the steps, after the template."
          checked={value.jobSheet}
          disabled={disabled}
          onChange={(e) => set('jobSheet', e.target.checked)}
        />
        {errors.jobSheet && <p role="alert" className="mt-1 text-sm font-medium text-thread-700">{errors.jobSheet}</p>}
      </div>
    </div>
  );
}
