import type { z } from 'zod';
import { StrapSpecSchema, type StrapSpec } from '../schemas/strap-spec.ts';
import { EngineError } from './engine-error.ts';

/** The value at `path` inside `input`, or undefined when any step is missing. */
function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = input;
  for (const k of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[k];
  }
  return v;
}

/** Turns the first zod issue into a field path and a limit ("at least 50 mm"). */
function issueToError(issue: z.core.$ZodIssue, input: unknown): EngineError {
  const field = issue.path.map(String).join('.') || '(spec)';
  let limit: string | undefined;
  if (issue.code === 'too_small') limit = `at least ${String(issue.minimum)}`;
  else if (issue.code === 'too_big') limit = `at most ${String(issue.maximum)}`;
  else if (issue.code === 'invalid_value') limit = `one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`;
  else if (issue.code === 'invalid_union') limit = /Expected (.*)$/.exec(issue.message)?.[1]?.replace(/ \| /g, ', ') ?? 'a known option';
  else if (issue.code === 'invalid_type') limit = `${/^[aeiou]/.test(issue.expected) ? 'an' : 'a'} ${issue.expected}`;
  const missing = issue.code === 'invalid_type' && valueAt(input, issue.path) === undefined;
  const message = missing ? `${field} is required` : issue.message;
  return new EngineError(field, message, limit);
}

/**
 * Validates anything (parsed JSON, a form's values) against {@link StrapSpecSchema} and
 * returns the spec with defaults filled in. Throws {@link EngineError} naming the first bad
 * field and its limit.
 */
export function parseSpec(input: unknown): StrapSpec {
  const r = StrapSpecSchema.safeParse(input);
  if (r.success) return r.data;
  const first = r.error.issues[0];
  throw first ? issueToError(first, input) : new EngineError('(spec)', 'spec is not valid');
}
