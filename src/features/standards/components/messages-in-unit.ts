import type { FieldErrors, FieldValues, Resolver } from 'react-hook-form';
import { formatLength } from '@shared/units/format-length.ts';
import type { LengthUnit } from '@shared/units/length.ts';

/**
 * The shared schema states length limits in mm ("Ease must be at most 300 mm"); an owner
 * working in inches reads them in inches ("Ease must be at most 11 13/16 in").
 */
export function messageInUnit(message: string, unit: LengthUnit): string {
  // Stitch pitch and punch diameters are always shown in mm (irons and punches are sold so).
  if (unit === 'mm' || /^(Stitch pitch|Punch diameter)\b/.test(message)) return message;
  return message.replace(/(-?\d+(?:\.\d+)?) mm\b/g, (_, n: string) => formatLength(Number(n), 'in'));
}

function rewrite(errors: Record<string, unknown>, unit: LengthUnit): void {
  for (const value of Object.values(errors)) {
    if (!value || typeof value !== 'object') continue;
    const e = value as { message?: unknown };
    if (typeof e.message === 'string') e.message = messageInUnit(e.message, unit);
    rewrite(value as Record<string, unknown>, unit);
  }
}

/** Wraps a resolver so every message it gives reads in the unit the form shows. */
export function resolverInUnit<T extends FieldValues, C, O>(inner: Resolver<T, C, O>, unitOf: (values: T) => LengthUnit): Resolver<T, C, O> {
  return async (values, context, options) => {
    const result = await inner(values, context, options);
    if (result.errors && Object.keys(result.errors).length > 0) rewrite(result.errors as FieldErrors as Record<string, unknown>, unitOf(values));
    return result;
  };
}
