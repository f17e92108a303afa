// Turns a zod error into our field map: the dotted path of each bad field -> a message a person
// reads. The path stays the key (the client places the message beside that input); the text
// names the field by its label and never by a path or a camelCase name.
import type { z } from 'zod';
import { describeIssue, describeSpecIssue, valueAt } from '@shared/schemas/spec-messages.ts';
import { badInput, type FieldErrors, type HttpError } from './http-error.ts';

/** "shopName" -> "Shop name", "tags.2" -> "Tags", "girthMm" -> "Girth": the words of the last named step. */
export function wordsOfKey(path: readonly PropertyKey[]): string {
  const leaf = [...path].reverse().find((s) => typeof s === 'string' && !/^\d+$/.test(s));
  const words = String(leaf ?? 'value')
    .replace(/(.)Mm$/, '$1') // the unit suffix of a key is not a word people see
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[_-]+/g, ' ')
    .toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/**
 * A message for an issue outside a strap spec. Older schemas start with the key ("email is
 * required": the key becomes the label); newer ones write a whole sentence that already names
 * the field by its label ("Leather colour must be at most 80 characters": kept as it is, never
 * a label in front of a label); zod's own wording is rewritten; any other fragment gets the label.
 */
function plainMessage(issue: z.core.$ZodIssue, input: unknown): string {
  const label = wordsOfKey(issue.path);
  const leaf = [...issue.path].reverse().find((s) => typeof s === 'string' && !/^\d+$/.test(s));
  if (typeof leaf === 'string' && issue.message.startsWith(`${leaf} `)) return label + issue.message.slice(leaf.length);
  if (/^(Invalid|Too (small|big)|Expected|Unrecognized|Required)/.test(issue.message)) return describeIssue(issue, { label, kind: 'text' }, { input, unit: 'mm' });
  if (/^[A-Z]/.test(issue.message)) return issue.message;
  return `${label}: ${issue.message}`;
}

/**
 * Field map of a zod error; the first message per field wins. `prefix` names the container;
 * `input` is the value that was parsed (a strap spec inside it decides the display unit).
 */
export function fieldsOf(error: z.ZodError, prefix?: string, input?: unknown): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const path = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || prefix || 'body';
    if (fields[path] !== undefined) continue;
    // A strap spec inside a body (`spec`, `revisions.N.spec`) speaks with the spec's labels and unit.
    const k = issue.path.lastIndexOf('spec');
    fields[path] =
      k >= 0 ? describeSpecIssue({ ...issue, path: issue.path.slice(k + 1) } as z.core.$ZodIssue, valueAt(input, issue.path.slice(0, k + 1))) : plainMessage(issue, input);
  }
  return fields;
}

/** Parse `value` with `schema` or throw a 400 naming every bad field by its label. */
export function parseOr400<S extends z.ZodType>(schema: S, value: unknown, prefix?: string): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw badInput(fieldsOf(result.error, prefix, value)) as HttpError;
  return result.data;
}
