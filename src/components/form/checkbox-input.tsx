import type { ReactNode } from 'react';
import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { CheckboxField } from '@/components/ui/checkbox-field.tsx';

export interface CheckboxInputProps<T extends FieldValues, TOut = T> {
  control: Control<T, unknown, TOut>;
  name: FieldPath<T>;
  label: ReactNode;
  hint?: ReactNode;
  disabled?: boolean;
}

/** A checkbox bound to a boolean form field. */
export function CheckboxInput<T extends FieldValues, TOut = T>({ control, name, label, hint, disabled }: CheckboxInputProps<T, TOut>) {
  const { field } = useController({ control, name });
  return (
    <CheckboxField
      label={label}
      hint={hint}
      name={field.name}
      ref={field.ref}
      disabled={disabled}
      checked={Boolean(field.value)}
      onChange={(e) => field.onChange(e.target.checked)}
      onBlur={field.onBlur}
    />
  );
}
