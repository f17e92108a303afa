import { useEffect, useState, type ReactNode } from 'react';
import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import type { LengthUnit } from '@shared/units/length.ts';
import { TextField } from '@/components/ui/field.tsx';
import { lengthProblem, lengthToText, textMatches, textToLengthMm } from './length-text.ts';

export interface LengthFieldProps<T extends FieldValues, TOut = T> {
  control: Control<T, unknown, TOut>;
  /** Path of a number field holding millimetres. */
  name: FieldPath<T>;
  label: ReactNode;
  /** The unit the maker reads and types in; the stored value is always mm. */
  unit: LengthUnit;
  hint?: ReactNode;
  disabled?: boolean;
  wrapperClassName?: string;
  /** An optional field: left empty, the value is undefined (e.g. a size that keeps the pattern's width). */
  optional?: boolean;
}

/**
 * A length input over a mm field: shows and accepts the spec's display unit (fractions such
 * as "1 3/16", "15½" or "15-1/2" for inches, or a length with its own unit such as "381mm"),
 * writes mm into the form, and shows why typed text is not a length, or the schema's message.
 */
export function LengthField<T extends FieldValues, TOut = T>({ control, name, label, unit, hint, disabled, wrapperClassName, optional }: LengthFieldProps<T, TOut>) {
  const { field, fieldState } = useController({ control, name });
  const mm = field.value as number | undefined;
  const [text, setText] = useState(() => lengthToText(mm, unit));

  // A preset, a reload or a unit change rewrites the value from outside: follow it, but never
  // rewrite the text while it still means the same length in the current unit (the maker may
  // be mid-fraction). A bare "13" read in the new unit no longer matches, so it reformats.
  useEffect(() => {
    setText((current) => (textMatches(current, mm, unit) ? current : lengthToText(mm, unit)));
  }, [mm, unit]);
  // Text that is not a length says why in words ("15x" is not a length; type e.g. 15 1/2 ...).
  const problem = lengthProblem(typeof label === 'string' ? label : 'This length', text, unit);

  return (
    <TextField
      label={label}
      unit={unit}
      hint={hint}
      error={problem ?? fieldState.error?.message}
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
        if (Number.isFinite(mm)) setText(lengthToText(mm, unit));
      }}
    />
  );
}
