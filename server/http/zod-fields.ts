// Turns a zod error into our field map: the dotted path of each bad field -> its message.
import type { z } from 'zod';
import { badInput, type FieldErrors, type HttpError } from './http-error.ts';

/** Field map of a zod error; the first message per field wins. `prefix` names the container. */
export function fieldsOf(error: z.ZodError, prefix?: string): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const path = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || prefix || 'body';
    if (fields[path] !== undefined) continue;
    // Messages of our schemas already start with the field name; zod's own ones do not.
    const leaf = String(issue.path.at(-1) ?? path);
    fields[path] = issue.message.startsWith(leaf) ? issue.message : `${path}: ${issue.message}`;
  }
  return fields;
}

/** Parse `value` with `schema` or throw a 400 naming every bad field. */
export function parseOr400<S extends z.ZodType>(schema: S, value: unknown, prefix?: string): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw badInput(fieldsOf(result.error, prefix)) as HttpError;
  return result.data;
}
