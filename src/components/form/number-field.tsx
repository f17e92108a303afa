import type { ReactNode } from 'react';
import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { TextField } from '@/components/ui/field.tsx';

export interface NumberFieldProps<T extends FieldValues, TOut = T> {
  control: Control<T, unknown, TOut>;
  name: FieldPath<T>;
  label: ReactNode;
  /** Shown in the label: "oz", "holes", "%". */
  unit?: string;
  hint?: ReactNode;
  step?: number | 'any';
  min?: number;
  max?: number;
  disabled?: boolean;
  wrapperClassName?: string;
  /** An optional field: left empty, the value is undefined instead of NaN. */
  optional?: boolean;
}

/** A plain number over a form field (counts, ounces, factors); empty or junk becomes NaN for the schema to name. */
export function NumberField<T extends FieldValues, TOut = T>({ control, name, label, unit, hint, step = 'any', min, max, disabled, wrapperClassName, optional }: NumberFieldProps<T, TOut>) {
  const { field, fieldState } = useController({ control, name });
  const value = field.value as number | undefined;
  return (
    <TextField
      label={label}
      unit={unit}
      hint={hint}
      error={fieldState.error?.message}
      type="number"
      inputMode="decimal"
      step={step}
      min={min}
      max={max}
      name={field.name}
      ref={field.ref}
      disabled={disabled}
      wrapperClassName={wrapperClassName}
      value={value === undefined || Number.isNaN(value) ? '' : value}
      onChange={(e) => field.onChange(e.target.value === '' ? (optional ? undefined : Number.NaN) : e.target.valueAsNumber)}
      onBlur={field.onBlur}
    />
  );
}
