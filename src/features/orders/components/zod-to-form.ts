import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { z } from 'zod';

/**
 * Runs one of the shared schemas over part of a form and puts each message beside its input
 * (`prefix` maps the schema's paths into the form's, e.g. "newCustomer."). Returns the parsed
 * value, or null when something was refused.
 */
export function parseInto<S extends z.ZodType, T extends FieldValues>(schema: S, value: unknown, setError: UseFormSetError<T>, prefix = '', rename: Record<string, string> = {}): z.output<S> | null {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  for (const issue of parsed.error.issues) {
    const key = issue.path.join('.');
    setError(`${prefix}${rename[key] ?? key}` as Path<T>, { type: 'schema', message: issue.message });
  }
  return null;
}
