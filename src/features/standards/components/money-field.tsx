import { useEffect, useState, type ReactNode } from 'react';
import { useController, type FieldPath } from 'react-hook-form';
import type { ShopStandardsInput } from '@shared/schemas/shop-standards.ts';
import { TextField } from '@/components/ui/field.tsx';
import type { StandardsControl } from './standard-length-field.tsx';

/** "4.50" as integer cents; not an amount gives NaN for the schema to name. */
export function moneyToCents(text: string): number {
  const t = text.trim().replace(/,/g, '');
  if (!/^\d+(\.\d{0,2})?$/.test(t)) return Number.NaN;
  return Math.round(Number(t) * 100);
}
const centsToText = (cents: number | undefined) => (cents === undefined || !Number.isFinite(cents) ? '' : (cents / 100).toFixed(2));

/** A unit cost typed as an amount ("4.50") and stored as integer cents. */
export function MoneyField({ control, name, label, disabled, hint }: { control: StandardsControl; name: FieldPath<ShopStandardsInput>; label: ReactNode; disabled?: boolean; hint?: ReactNode }) {
  const { field, fieldState } = useController({ control, name });
  const cents = field.value as number | undefined;
  const [text, setText] = useState(() => centsToText(cents));
  useEffect(() => {
    setText((current) => (moneyToCents(current) === cents ? current : centsToText(cents)));
  }, [cents]);
  return (
    <TextField
      label={label}
      hint={hint}
      error={fieldState.error?.message}
      name={field.name}
      ref={field.ref}
      value={text}
      disabled={disabled}
      inputMode="decimal"
      autoComplete="off"
      onChange={(e) => {
        setText(e.target.value);
        field.onChange(moneyToCents(e.target.value));
      }}
      onBlur={field.onBlur}
    />
  );
}
