import { useEffect, useState, type ReactNode } from 'react';
import { useController, type Control, type FieldPath } from 'react-hook-form';
import type { LengthUnit } from '@shared/units/length.ts';
import type { ShopStandards, ShopStandardsInput } from '@shared/schemas/shop-standards.ts';
import { TextField } from '@/components/ui/field.tsx';
import { lengthToText, textMatches, textToLengthMm } from '@/components/form/length-text.ts';

export type StandardsControl = Control<ShopStandardsInput, unknown, ShopStandards>;

/**
 * A length over a mm field of the standards form, in the Shop page's unit. `optional` fields
 * (a buckle's tongue, a rivet's post) go back to "not given" when emptied.
 */
export function StandardLengthField({ control, name, label, unit, hint, optional, disabled, wrapperClassName }: {
  control: StandardsControl;
  name: FieldPath<ShopStandardsInput>;
  label: ReactNode;
  unit: LengthUnit;
  hint?: ReactNode;
  optional?: boolean;
  disabled?: boolean;
  wrapperClassName?: string;
}) {
  const { field, fieldState } = useController({ control, name });
  const mm = field.value as number | undefined;
  const [text, setText] = useState(() => lengthToText(mm, unit));
  useEffect(() => {
    setText((current) => (textMatches(current, mm, unit) ? current : lengthToText(mm, unit)));
  }, [mm, unit]);
  return (
    <TextField
      label={label}
      unit={unit}
      hint={hint}
      error={fieldState.error?.message}
      name={field.name}
      ref={field.ref}
      value={text}
      disabled={disabled}
      inputMode="decimal"
      autoComplete="off"
      wrapperClassName={wrapperClassName}
      onChange={(e) => {
        setText(e.target.value);
        field.onChange(optional && e.target.value.trim() === '' ? undefined : textToLengthMm(e.target.value, unit));
      }}
      onBlur={() => {
        field.onBlur();
        if (mm !== undefined && Number.isFinite(mm)) setText(lengthToText(mm, unit));
      }}
    />
  );
}
