import { useFieldArray, type FieldPath } from 'react-hook-form';
import type { StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { Button } from '@/components/ui/button.tsx';
import type { SectionProps } from './types.ts';

const FASTENERS = [
  { value: 'rivet', label: 'Rivet' },
  { value: 'screw', label: 'Chicago screw' },
  { value: 'snap', label: 'Snap' },
  { value: 'stitch', label: 'Stitched' },
  { value: 'hole', label: 'Plain hole' },
];

type ArrayPath = `pieces.${number}.${'start' | 'end'}.${'flapHoles' | 'bodyHoles' | 'holes'}`;

/**
 * Holes placed from their own end of a piece (rivets, screws, snaps), each with its position,
 * its offset across the strap and its punch size. Numbered from 1 as printed.
 */
export function HoleList({ control, unit, disabled, name, title, hint, defaultDiameterMm }: SectionProps & { name: ArrayPath; title: string; hint?: string; defaultDiameterMm: number }) {
  const { fields, append, remove } = useFieldArray({ control, name: name as 'pieces.0.start.flapHoles', keyName: 'key' });
  const path = (i: number, key: string) => `${name}.${i}.${key}` as FieldPath<StrapSpecInput>;
  return (
    <div className="col-span-2 grid gap-2">
      <p className="text-sm font-medium text-hide-900">{title}</p>
      {hint && <p className="-mt-1 text-xs text-hide-600">{hint}</p>}
      {fields.length === 0 && <p className="text-xs text-hide-600">None.</p>}
      <ol className="grid gap-2">
        {fields.map((f, i) => (
          <li key={f.key} className="grid grid-cols-2 items-end gap-2 rounded-md border border-hide-200 p-2">
            <LengthField control={control} name={path(i, 'fromEndMm')} label={`Hole ${i + 1}: from the end`} unit={unit} disabled={disabled} />
            <LengthField control={control} name={path(i, 'yMm')} label="Off centre" unit={unit} disabled={disabled} hint="0 on the centreline." />
            <LengthField control={control} name={path(i, 'diameterMm')} label="Hole size" unit={unit} disabled={disabled} />
            <SelectInput control={control} name={path(i, 'fastener')} label="What goes through" options={FASTENERS} disabled={disabled} />
            {!disabled && (
              <div className="col-span-2">
                <Button size="sm" variant="ghost" onClick={() => remove(i)} aria-label={`Remove hole ${i + 1} (${title.toLowerCase()})`}>
                  Remove hole {i + 1}
                </Button>
              </div>
            )}
          </li>
        ))}
      </ol>
      {!disabled && (
        <div>
          <Button size="sm" variant="secondary" onClick={() => append({ fromEndMm: 12.7 * (fields.length + 1), yMm: 0, diameterMm: defaultDiameterMm, fastener: 'rivet' })}>
            Add a hole
          </Button>
        </div>
      )}
    </div>
  );
}
