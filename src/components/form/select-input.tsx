import type { ReactNode } from 'react';
import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { SelectField } from '@/components/ui/field.tsx';

export interface SelectInputProps<T extends FieldValues, TOut = T> {
  control: Control<T, unknown, TOut>;
  name: FieldPath<T>;
  label: ReactNode;
  options: ReadonlyArray<{ value: string; label: string }>;
  hint?: ReactNode;
  disabled?: boolean;
  wrapperClassName?: string;
  /** Numeric choices (counts) are stored as numbers. */
  numeric?: boolean;
  /** Called after the form value changed (e.g. to convert a dependent value). */
  onChanged?: (value: string) => void;
}

/** A select bound to a form field. */
export function SelectInput<T extends FieldValues, TOut = T>({ control, name, label, options, hint, disabled, wrapperClassName, numeric, onChanged }: SelectInputProps<T, TOut>) {
  const { field, fieldState } = useController({ control, name });
  return (
    <SelectField
      label={label}
      hint={hint}
      error={fieldState.error?.message}
      name={field.name}
      ref={field.ref}
      disabled={disabled}
      wrapperClassName={wrapperClassName}
      value={String(field.value ?? '')}
      onChange={(e) => {
        field.onChange(numeric ? Number(e.target.value) : e.target.value);
        onChanged?.(e.target.value);
      }}
      onBlur={field.onBlur}
    >
      {options.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
    </SelectField>
  );
}
