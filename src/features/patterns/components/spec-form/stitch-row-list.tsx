import { useFieldArray, useWatch, type FieldPath } from 'react-hook-form';
import { useQuery } from '@tanstack/react-query';
import type { StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { NumberField } from '@/components/form/number-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { Button } from '@/components/ui/button.tsx';
import { shopListsQueryOptions } from '../../api/start-spec.ts';
import { newStitchRow } from './new-piece.ts';
import type { SectionProps } from './types.ts';

/** Pitch of a common pricking iron when the shop has not set its own. */
const IRON_PITCH_MM = 3.85;

/** Rows of stitching on a piece: which edges, where they start and stop, the iron and the edge guide. */
export function StitchRowList({ control, unit, disabled, index, startName, endName }: SectionProps & { index: number; startName: string; endName: string }) {
  const { fields, append, remove } = useFieldArray({ control, name: `pieces.${index}.stitchRows`, keyName: 'key' });
  const kind = useWatch({ control, name: 'kind' });
  const edgeGuide = useWatch({ control, name: 'edgeGuideMm' });
  const lists = useQuery(shopListsQueryOptions());
  const pitch = lists.data?.kinds[kind]?.stitchPitchMm ?? IRON_PITCH_MM;
  const paths = [
    { value: 'both-edges', label: 'Both edges' },
    { value: 'top-edge', label: 'Top edge only' },
    { value: 'bottom-edge', label: 'Bottom edge only' },
    { value: 'around-start', label: `Round the ${startName}` },
    { value: 'around-end', label: `Round the ${endName}` },
  ];
  const refs = [
    { value: 'start', label: startName },
    { value: 'end', label: endName },
  ];
  const path = (i: number, key: string) => `pieces.${index}.stitchRows.${i}.${key}` as FieldPath<StrapSpecInput>;
  return (
    <div className="col-span-2 grid gap-2">
      <p className="text-sm font-medium text-hide-900">Stitch rows</p>
      <ol className="grid gap-2">
        {fields.map((f, i) => (
          <li key={f.key} className="grid grid-cols-2 items-end gap-2 rounded-md border border-hide-200 p-2" data-testid="stitch-row">
            <SelectInput control={control} name={path(i, 'path')} label={`Row ${i + 1} runs along`} options={paths} disabled={disabled} wrapperClassName="col-span-2" />
            <LengthField control={control} name={path(i, 'fromMm')} label="Starts" unit={unit} disabled={disabled} />
            <SelectInput control={control} name={path(i, 'fromRef')} label="Measured from" options={refs} disabled={disabled} />
            <LengthField control={control} name={path(i, 'toMm')} label="Stops" unit={unit} disabled={disabled} />
            <SelectInput control={control} name={path(i, 'toRef')} label="Measured from" options={refs} disabled={disabled} />
            <LengthField control={control} name={path(i, 'offsetMm')} label="In from the edge" unit={unit} disabled={disabled} hint="The edge guide line." />
            <LengthField control={control} name={path(i, 'pitchMm')} label="Stitch pitch" unit="mm" disabled={disabled} hint="The iron's prong spacing, in mm as irons are sold." />
            <NumberField control={control} name={path(i, 'tolerancePct')} label="Pitch may stretch" unit="%" step={1} min={0} max={25} disabled={disabled} />
            {!disabled && (
              <div className="flex items-end">
                <Button size="sm" variant="ghost" onClick={() => remove(i)} aria-label={`Remove stitch row ${i + 1}`}>
                  Remove
                </Button>
              </div>
            )}
          </li>
        ))}
      </ol>
      {!disabled && fields.length < 8 && (
        <div>
          <Button size="sm" variant="secondary" onClick={() => append(newStitchRow(pitch, edgeGuide))}>
            Add a stitch row
          </Button>
        </div>
      )}
    </div>
  );
}
