import { useFieldArray, useWatch, type FieldPath } from 'react-hook-form';
import type { StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { Button } from '@/components/ui/button.tsx';
import { newTaperStation } from './new-piece.ts';
import type { SectionProps } from './types.ts';

/**
 * Width points along a piece: it is this wide at this distance from an end, straight between
 * points (a watch strap narrowing from lug to buckle, a belt's narrower billet).
 */
export function TaperList({ control, unit, disabled, index, startName, endName }: SectionProps & { index: number; startName: string; endName: string }) {
  const { fields, append, remove } = useFieldArray({ control, name: `pieces.${index}.taper`, keyName: 'key' });
  const pieceWidth = useWatch({ control, name: `pieces.${index}.widthMm` });
  const width = useWatch({ control, name: 'widthMm' });
  const from = [
    { value: 'start', label: startName },
    { value: 'end', label: endName },
  ];
  const path = (i: number, key: string) => `pieces.${index}.taper.${i}.${key}` as FieldPath<StrapSpecInput>;
  return (
    <div className="col-span-2 grid gap-2">
      <p className="text-sm font-medium text-hide-900">Taper</p>
      <p className="-mt-1 text-xs text-hide-600">The piece is this wide at this point; straight between points. Without points it keeps one width.</p>
      <ol className="grid gap-2">
        {fields.map((f, i) => (
          <li key={f.key} className="grid grid-cols-2 items-end gap-2 rounded-md border border-hide-200 p-2" data-testid="taper-row">
            <LengthField control={control} name={path(i, 'atMm')} label={`Point ${i + 1} at`} unit={unit} disabled={disabled} />
            <SelectInput control={control} name={path(i, 'from')} label="Measured from" options={from} disabled={disabled} />
            <LengthField control={control} name={path(i, 'widthMm')} label="Width there" unit={unit} disabled={disabled} />
            {!disabled && (
              <Button size="sm" variant="ghost" onClick={() => remove(i)} aria-label={`Remove taper point ${i + 1}`}>
                Remove
              </Button>
            )}
          </li>
        ))}
      </ol>
      {!disabled && fields.length < 8 && (
        <div>
          <Button
            size="sm"
            variant="secondary"
            onClick={() => {
              const w = pieceWidth ?? width;
              // The first time, two points: full width 4 in from the start narrowing to 3/4 of it
              // 4 in from the other end (one point alone would only make the piece narrower).
              if (fields.length === 0) append([newTaperStation(w, 101.6), { ...newTaperStation(Math.round(w * 0.75 * 1000) / 1000, 101.6), from: 'end' }]);
              else append(newTaperStation(Math.round(w * 0.75 * 1000) / 1000, 101.6 + 25.4 * fields.length));
            }}
          >
            Add a taper point
          </Button>
        </div>
      )}
    </div>
  );
}
