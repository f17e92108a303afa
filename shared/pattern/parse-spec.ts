import type { z } from 'zod';
import { StrapSpecSchema, type StrapSpec } from '../schemas/strap-spec.ts';
import { EngineError } from './engine-error.ts';
import { describeSpecIssue } from '../schemas/spec-messages.ts';

/** Turns the first zod issue into a field path, a message a person reads and a limit ("at least 50"). */
function issueToError(issue: z.core.$ZodIssue, input: unknown): EngineError {
  const field = issue.path.map(String).join('.') || '(spec)';
  let limit: string | undefined;
  if (issue.code === 'too_small') limit = `at least ${String(issue.minimum)}`;
  else if (issue.code === 'too_big') limit = `at most ${String(issue.maximum)}`;
  else if (issue.code === 'invalid_value') limit = `one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`;
  else if (issue.code === 'invalid_union') limit = /Expected (.*)$/.exec(issue.message)?.[1]?.replace(/ \| /g, ', ') ?? 'a known option';
  else if (issue.code === 'invalid_type') limit = `${/^[aeiou]/.test(issue.expected) ? 'an' : 'a'} ${issue.expected}`;
  // The message names the field by its label, in the spec's display unit (spec-messages.ts).
  return new EngineError(field, describeSpecIssue(issue, input), limit);
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
  throw first ? issueToError(first, input) : new EngineError('(spec)', 'The pattern is not valid');
}
