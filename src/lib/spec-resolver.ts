// The editor's resolver: StrapSpecSchema through zodResolver, with every message rewritten to
// name the field by its label in the form's display unit ("Girth must be at least 1 31/32 in"),
// the same words the API answers with (shared/schemas/spec-messages.ts).
import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldError, FieldErrors, Resolver } from 'react-hook-form';
import { StrapSpecSchema, type StrapSpec, type StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { specLabel } from '@shared/schemas/spec-labels.ts';
import { specIssueMessages } from '@shared/schemas/spec-messages.ts';

const base = zodResolver(StrapSpecSchema);

const isLeaf = (v: unknown): v is FieldError => typeof v === 'object' && v !== null && 'type' in v && ('message' in v || 'ref' in v);

/** Replaces the message of every leaf error under `node` with the human one for its path. */
function rewrite(node: unknown, path: string[], messages: Map<string, string>, values: unknown): void {
  if (typeof node !== 'object' || node === null) return;
  if (isLeaf(node)) {
    const key = path.join('.');
    node.message = messages.get(key) ?? `${specLabel(path, values)} is not valid`;
    return;
  }
  for (const [k, child] of Object.entries(node)) if (k !== 'ref' && k !== 'root') rewrite(child, [...path, k], messages, values);
}

/** zodResolver(StrapSpecSchema) whose messages read with labels and the display unit. */
export const specResolver: Resolver<StrapSpecInput, unknown, StrapSpec> = async (values, context, options) => {
  const result = await base(values, context, options);
  if (Object.keys(result.errors).length === 0) return result;
  const parsed = StrapSpecSchema.safeParse(values);
  const messages = new Map(parsed.success ? [] : specIssueMessages(parsed.error, values).map((m) => [m.path, m.message] as const));
  rewrite(result.errors as FieldErrors, [], messages, values);
  return result;
};
