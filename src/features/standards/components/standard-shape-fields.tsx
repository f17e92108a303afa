import { useController, useWatch, type FieldPath } from 'react-hook-form';
import type { EndShape } from '@shared/schemas/strap-spec.ts';
import type { ShopStandardsInput } from '@shared/schemas/shop-standards.ts';
import type { LengthUnit } from '@shared/units/length.ts';
import { SelectField } from '@/components/ui/field.tsx';
import { StandardLengthField, type StandardsControl } from './standard-length-field.tsx';

const SHAPES: Array<{ value: EndShape['kind']; label: string }> = [
  { value: 'square', label: 'Square' },
  { value: 'round', label: 'Round' },
  { value: 'clipped', label: 'Clipped corners' },
  { value: 'english-point', label: 'English point' },
  { value: 'spear', label: 'Spear' },
];

/** A new shape starts from a value the engine draws for this width (a point keeps its depth). */
function reshape(current: EndShape | undefined, next: EndShape['kind'], widthMm: number): EndShape {
  const r = (x: number) => Math.round(x * 1000) / 1000;
  const depth = current && 'depthMm' in current ? Math.max(current.depthMm, r(widthMm / 2)) : r(widthMm * 0.75);
  if (next === 'round') return { kind: 'round' };
  if (next === 'clipped') return { kind: 'clipped', chamferMm: r(widthMm / 4) };
  if (next === 'english-point' || next === 'spear') return { kind: next, depthMm: depth };
  return { kind: 'square' };
}

/** Shape select and its one measure for a kind's buckle end or tip. */
export function StandardShapeFields({ control, path, widthMm, label, unit, disabled }: {
  control: StandardsControl;
  path: `kinds.${string}.buckleEndShape` | `kinds.${string}.tipShape`;
  widthMm: number;
  label: string;
  unit: LengthUnit;
  disabled: boolean;
}) {
  const { field } = useController({ control, name: path as FieldPath<ShopStandardsInput> });
  const shape = useWatch({ control, name: path as FieldPath<ShopStandardsInput> }) as EndShape | undefined;
  const kind = shape?.kind ?? 'square';
  const param =
    kind === 'round'
      ? shape && 'radiusMm' in shape && shape.radiusMm !== undefined
        ? { key: 'radiusMm', label: 'Corner radius' }
        : null
      : kind === 'clipped'
        ? { key: 'chamferMm', label: 'Chamfer' }
        : kind === 'english-point' || kind === 'spear'
          ? { key: 'depthMm', label: 'Point depth' }
          : null;
  return (
    <>
      <SelectField label={label} value={kind} disabled={disabled} onChange={(e) => field.onChange(reshape(shape, e.target.value as EndShape['kind'], widthMm))}>
        {SHAPES.map((s) => (
          <option key={s.value} value={s.value}>
            {s.label}
          </option>
        ))}
      </SelectField>
      {param ? (
        <StandardLengthField key={`${path}.${kind}`} control={control} name={`${path}.${param.key}` as FieldPath<ShopStandardsInput>} label={param.label} unit={unit} disabled={disabled} />
      ) : (
        <p className="self-end pb-2 text-xs text-hide-600">{kind === 'round' ? 'A semicircle: half the width.' : 'A square end has no measure.'}</p>
      )}
    </>
  );
}
