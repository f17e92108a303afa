import { useController, useWatch, type FieldPath } from 'react-hook-form';
import type { PieceSpec, StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { NumberField } from '@/components/form/number-field.tsx';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { EndFields } from './end-fields.tsx';
import { StitchRowList } from './stitch-row-list.tsx';
import { TaperList } from './taper-list.tsx';
import type { SectionProps, SpecSetValue } from './types.ts';

function NameField({ control, name, disabled }: Pick<SectionProps, 'control' | 'disabled'> & { name: FieldPath<StrapSpecInput> }) {
  const { field, fieldState } = useController({ control, name });
  return <TextField label="Piece name" name={field.name} ref={field.ref} value={(field.value as string) ?? ''} error={fieldState.error?.message} disabled={disabled} onChange={(e) => field.onChange(e.target.value)} onBlur={field.onBlur} />;
}

/** One piece's fields: name, how many, its length, its width, its ends (other than the strap's), taper and stitching. */
export function PieceFields({ control, unit, disabled, setValue, index }: SectionProps & { setValue: SpecSetValue; index: number }) {
  const piece = useWatch({ control, name: `pieces.${index}` }) as PieceSpec;
  const width = useWatch({ control, name: 'widthMm' });
  const p = `pieces.${index}` as const;
  const isStrap = piece.role === 'strap';
  const startName = isStrap ? 'buckle end' : 'first end';
  const endName = isStrap ? 'tip' : 'second end';
  return (
    <div className="grid grid-cols-2 gap-x-3 gap-y-3">
      <NameField control={control} name={`${p}.name`} disabled={disabled} />
      <NumberField control={control} name={`${p}.count`} label="Number to cut" unit="count" step={1} min={1} disabled={disabled} />
      {piece.length.kind === 'girth' && <p className="col-span-2 text-xs text-hide-600">Its length comes from the girth and the length rule under Measure.</p>}
      {piece.length.kind === 'fixed' && <LengthField control={control} name={`${p}.length.blankMm`} label="Blank length" unit={unit} disabled={disabled} />}
      {piece.length.kind === 'keeper' && (
        <>
          <NumberField control={control} name={`${p}.length.layers`} label="Layers of strap inside" unit="count" step={1} min={1} max={4} disabled={disabled} />
          <LengthField control={control} name={`${p}.length.easeMm`} label="Room round the layers" unit={unit} disabled={disabled} />
          <LengthField control={control} name={`${p}.length.overlapMm`} label="Overlap where it joins" unit={unit} disabled={disabled} hint="0 for ends butted and glued." />
        </>
      )}
      {piece.widthMm !== undefined ? (
        <>
          <LengthField control={control} name={`${p}.widthMm`} label="Piece width" unit={unit} disabled={disabled} />
          {!disabled && (
            <div className="flex items-end">
              <Button size="sm" variant="ghost" onClick={() => setValue(`${p}.widthMm`, undefined, { shouldDirty: true, shouldValidate: true })}>
                Use the strap width
              </Button>
            </div>
          )}
        </>
      ) : (
        <div className="col-span-2 flex flex-wrap items-center gap-2 text-xs text-hide-600">
          <span>As wide as the strap.</span>
          {!disabled && (
            <Button size="sm" variant="ghost" onClick={() => setValue(`${p}.widthMm`, width, { shouldDirty: true, shouldValidate: true })}>
              Give it its own width
            </Button>
          )}
        </div>
      )}
      {!isStrap && (
        <>
          <EndFields control={control} unit={unit} disabled={disabled} setValue={setValue} index={index} end="start" what="First end" />
          <EndFields control={control} unit={unit} disabled={disabled} setValue={setValue} index={index} end="end" what="Second end" />
        </>
      )}
      <TaperList control={control} unit={unit} disabled={disabled} index={index} startName={startName} endName={endName} />
      <StitchRowList control={control} unit={unit} disabled={disabled} index={index} startName={startName} endName={endName} />
    </div>
  );
}
