import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { BODY_PART_LABELS, PART_FOR_KIND, formatGirth } from '@shared/schemas/orders.ts';
import type { MeasurementView } from '@shared/schemas/order-views.ts';
import type { PatternView } from '@shared/schemas/library.ts';
import type { PresetName } from '@shared/schemas/strap-spec.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { SelectField } from '@/components/ui/field.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import type { NewOrderValues } from './new-order-values.ts';

/** The wearer's latest girth of the body part this kind of piece fits (any part for the rest). */
export function latestFor(kind: PresetName, measurements: MeasurementView[]): MeasurementView | null {
  const part = PART_FOR_KIND[kind];
  const fitting = measurements.filter((m) => part === 'other' || m.part === part);
  return fitting.at(-1) ?? null;
}

export interface RunSize {
  name: string;
  girthMm: number;
}

/** Which saved pattern, and where its girth comes from: a size of its run, a measurement, or later. */
export function FitPicker({
  register,
  errors,
  patterns,
  pattern,
  headNumber,
  sizes,
  unit,
  latest,
  fitFrom,
}: {
  register: UseFormRegister<NewOrderValues>;
  errors: FieldErrors<NewOrderValues>;
  patterns: PatternView[];
  pattern: PatternView | undefined;
  headNumber: number | undefined;
  sizes: RunSize[];
  unit: LengthUnit;
  latest: MeasurementView | null;
  fitFrom: NewOrderValues['fitFrom'];
}) {
  const girthUnit = unit === 'mm' ? 'mm' : 'in';
  return (
    <div className="grid gap-3">
      <SelectField
        label="Pattern"
        {...register('patternId')}
        error={errors.patternId?.message}
        hint={pattern && headNumber ? `Made from its saved revision ${headNumber}; the order never changes the pattern.` : undefined}
      >
        <option value="">Choose a saved pattern…</option>
        {patterns.map((p) => (
          <option key={p.id} value={p.id}>
            {p.name}
          </option>
        ))}
      </SelectField>
      {pattern && (
        <fieldset className="grid gap-2">
          <legend className="text-sm font-medium text-hide-900">Girth from</legend>
          <label className="flex items-start gap-2 text-sm">
            <input type="radio" value="size" {...register('fitFrom')} disabled={sizes.length === 0} className="mt-1 accent-hide-700" />
            <span>
              A size of its run
              {sizes.length === 0 && <span className="block text-xs text-hide-600">This pattern has no size run.</span>}
            </span>
          </label>
          {fitFrom === 'size' && sizes.length > 0 && (
            <SelectField label="Size" {...register('sizeName')} error={errors.sizeName?.message} wrapperClassName="ml-6 max-w-xs">
              <option value="">Choose a size…</option>
              {sizes.map((s) => (
                <option key={s.name} value={s.name}>
                  {s.name} ({formatGirth(s.girthMm, girthUnit)})
                </option>
              ))}
            </SelectField>
          )}
          <label className="flex items-start gap-2 text-sm">
            <input type="radio" value="measurement" {...register('fitFrom')} disabled={!latest} className="mt-1 accent-hide-700" />
            <span>
              The wearer’s latest {BODY_PART_LABELS[PART_FOR_KIND[pattern.kind]].toLowerCase()} measurement
              <span className="block text-xs text-hide-600">
                {latest ? `${formatGirth(latest.girthMm, latest.unit)}, ${formatWhen(latest.takenAt)}` : 'None on record yet.'}
              </span>
            </span>
          </label>
          <label className="flex items-start gap-2 text-sm">
            <input type="radio" value="later" {...register('fitFrom')} className="mt-1 accent-hide-700" />
            <span>
              Later: the order waits for a measurement
              <span className="block text-xs text-hide-600">Send the customer a measuring link from the order page.</span>
            </span>
          </label>
          {errors.fitFrom?.message && (
            <p role="alert" className="text-sm font-medium text-thread-700">
              {errors.fitFrom.message}
            </p>
          )}
        </fieldset>
      )}
    </div>
  );
}
