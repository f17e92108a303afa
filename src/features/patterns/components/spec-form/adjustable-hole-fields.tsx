import { useController, useWatch, type FieldPath } from 'react-hook-form';
import type { StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { LengthField } from '@/components/form/length-field.tsx';
import { NumberField } from '@/components/form/number-field.tsx';
import { TextField } from '@/components/ui/field.tsx';
import type { SectionProps } from './types.ts';

/**
 * The middle hole (the one the strap fits the girth at), counted from 1 at the buckle as the
 * drawings and PDFs number holes. Empty means the middle of the row.
 */
function MiddleHoleField({ control, index, disabled }: Pick<SectionProps, 'control' | 'disabled'> & { index: number }) {
  const name = `pieces.${index}.end.holes.middleHole` as FieldPath<StrapSpecInput>;
  const { field, fieldState } = useController({ control, name });
  const value = field.value as number | undefined;
  return (
    <TextField
      label="Middle hole"
      unit="1 = nearest the buckle"
      hint="The hole the buckle closes on at the girth; empty for the middle of the row."
      type="number"
      inputMode="numeric"
      step={1}
      min={1}
      error={fieldState.error?.message}
      name={field.name}
      ref={field.ref}
      disabled={disabled}
      value={value === undefined || Number.isNaN(value) ? '' : value}
      onChange={(e) => field.onChange(e.target.value === '' ? undefined : e.target.valueAsNumber)}
      onBlur={field.onBlur}
    />
  );
}

/** A tip's adjustment holes: how many, which is the middle one, spacing, size and distance to the tip. */
export function AdjustableHoleFields({ control, unit, disabled, index }: SectionProps & { index: number }) {
  const p = `pieces.${index}.end.holes` as const;
  const count = useWatch({ control, name: `${p}.count` as FieldPath<StrapSpecInput> }) as number | undefined;
  return (
    <>
      <NumberField control={control} name={`${p}.count` as FieldPath<StrapSpecInput>} label="Holes" unit="count" step={1} min={1} disabled={disabled} />
      <MiddleHoleField control={control} index={index} disabled={disabled} />
      <LengthField control={control} name={`${p}.spacingMm` as FieldPath<StrapSpecInput>} label="Hole spacing" unit={unit} disabled={disabled} />
      <LengthField control={control} name={`${p}.diameterMm` as FieldPath<StrapSpecInput>} label="Hole size" unit={unit} disabled={disabled} />
      <LengthField
        control={control}
        name={`${p}.firstFromTipMm` as FieldPath<StrapSpecInput>}
        label="Last hole to tip"
        unit={unit}
        disabled={disabled}
        wrapperClassName="col-span-2"
        hint={`About 2.5 × the width is the saddler's rule.${count ? ` Hole ${count} is the one nearest the tip.` : ''}`}
      />
    </>
  );
}
