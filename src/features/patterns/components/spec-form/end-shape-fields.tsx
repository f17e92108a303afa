import { useWatch, type FieldPath } from 'react-hook-form';
import type { EndShape, StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { SelectInput } from '@/components/form/select-input.tsx';
import { reshapeEnd } from './reshape-end.ts';
import type { SectionProps, SpecSetValue } from './types.ts';

const SHAPES = [
  { value: 'square', label: 'Square' },
  { value: 'round', label: 'Round' },
  { value: 'clipped', label: 'Clipped corners' },
  { value: 'english-point', label: 'English point' },
  { value: 'spear', label: 'Spear' },
];

/** Each shape's one parameter: the spec key and the label a maker reads. */
const PARAMETER: Record<EndShape['kind'], { key: 'radiusMm' | 'chamferMm' | 'depthMm'; label: string; hint?: string } | null> = {
  square: null,
  round: { key: 'radiusMm', label: 'Corner radius', hint: 'Half the width is a semicircle.' },
  clipped: { key: 'chamferMm', label: 'Chamfer', hint: 'Cut along both edges at each corner.' },
  'english-point': { key: 'depthMm', label: 'Point depth', hint: 'At least half the width.' },
  spear: { key: 'depthMm', label: 'Point depth' },
};

/** Shape select and its parameter for one end of the strap piece (`end` is "start" or "end"). */
export function EndShapeFields({ control, unit, disabled, setValue, index, end, what }: SectionProps & { setValue: SpecSetValue; index: number; end: 'start' | 'end'; what: string }) {
  const shape = useWatch({ control, name: `pieces.${index}.${end}.shape` }) as EndShape | undefined;
  const pieceWidth = useWatch({ control, name: `pieces.${index}.widthMm` });
  const width = useWatch({ control, name: 'widthMm' });
  const kind = shape?.kind ?? 'square';
  const parameter = PARAMETER[kind];
  const widthOf = () => (pieceWidth !== undefined && Number.isFinite(pieceWidth) ? pieceWidth : width);
  const onChanged = (next: string) => {
    setValue(`pieces.${index}.${end}.shape`, reshapeEnd(shape, next as EndShape['kind'], widthOf()), { shouldDirty: true, shouldValidate: true });
  };
  return (
    <>
      <SelectInput control={control} name={`pieces.${index}.${end}.shape.kind`} label={`${what} shape`} options={SHAPES} disabled={disabled} onChanged={onChanged} />
      {parameter && shape && !(parameter.key in shape) ? (
        // A round end without a radius is a semicircle; binding the field would add the key
        // and leave a just-opened pattern with changes.
        <div className="flex flex-col gap-1 self-end pb-1 text-xs text-hide-600">
          <span>Semicircle (half the width).</span>
          <button
            type="button"
            className="self-start font-medium text-hide-800 underline underline-offset-2 disabled:no-underline"
            disabled={disabled}
            onClick={() => setValue(`pieces.${index}.${end}.shape`, reshapeEnd(shape, kind, widthOf()), { shouldDirty: true, shouldValidate: true })}
          >
            Set a corner radius
          </button>
        </div>
      ) : parameter ? (
        <LengthField
          key={kind}
          control={control}
          name={`pieces.${index}.${end}.shape.${parameter.key}` as FieldPath<StrapSpecInput>}
          label={parameter.label}
          unit={unit}
          disabled={disabled}
          {...(parameter.hint ? { hint: parameter.hint } : {})}
        />
      ) : (
        <p className="self-end pb-2 text-xs text-hide-600">A square end has no parameter.</p>
      )}
    </>
  );
}
