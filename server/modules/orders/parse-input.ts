// Parses a request body or query with one of the orders schemas and answers 400 with the
// schema's own messages: they already name each field by its label (and lengths in the
// unit the person typed), so nothing is prefixed with a key. `fields` stays keyed by path.
import type { z } from 'zod';
import { badInput, type FieldErrors } from '../../http/http-error.ts';

/** zod's own wording ("Invalid input: expected string") is replaced by a sentence naming the label. */
const ZOD_OWN = /^(Invalid|Too (small|big)|Expected|Unrecognized|Required)/;

/** "leatherColour" -> "Leather colour" (used only when a schema gave no message of its own). */
function labelOf(path: readonly PropertyKey[]): string {
  const leaf = [...path].reverse().find((s) => typeof s === 'string' && !/^\d+$/.test(s));
  const words = String(leaf ?? 'value')
    .replace(/Mm$/, '')
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

export function parseInput<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const fields: FieldErrors = {};
  for (const issue of result.error.issues) {
    const path = issue.path.map(String).join('.') || 'body';
    if (fields[path] !== undefined) continue;
    fields[path] = ZOD_OWN.test(issue.message) ? `${labelOf(issue.path)} is missing or not valid` : issue.message;
  }
  throw badInput(fields);
}

/** Route middleware form of {@link parseInput} for JSON bodies. */
export const body =
  <S extends z.ZodType>(schema: S) =>
  (req: { body: unknown }, _res: unknown, next: () => void) => {
    req.body = parseInput(schema, req.body);
    next();
  };
