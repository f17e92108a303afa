/**
 * Turns zod issues into messages a person reads: the field's label (spec-labels.ts) and its
 * limit in the unit the form shows ("Girth must be at least 2 in"), never a schema path or a
 * camelCase name. The API, the editor's resolver and the CLI use the same words.
 */
import type { z } from 'zod';
import { formatLength } from '../units/format-length.ts';
import type { LengthUnit } from '../units/length.ts';
import { specFieldLabel, type FieldLabel } from './spec-labels.ts';

type Issue = z.core.$ZodIssue;
type Seg = PropertyKey;

/** The value at `path` inside `input`, or undefined when any step is missing. */
export function valueAt(input: unknown, path: readonly Seg[]): unknown {
  let v: unknown = input;
  for (const k of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[k];
  }
  return v;
}

/** The display unit a spec (or a form's values) asks for; millimetres when it does not say. */
export function displayUnitOf(spec: unknown): LengthUnit {
  return (spec as { units?: unknown } | undefined)?.units === 'in' ? 'in' : 'mm';
}

const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/** "a, b or c" */
export function orList(items: readonly string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} or ${items.at(-1)}`;
}

/** Stored choice values in a maker's words; others read as themselves with spaces for dashes. */
const CHOICE_WORDS: Record<string, string> = {
  in: 'inches',
  mm: 'millimetres',
  oz: 'ounces',
  'nominal-hole': 'to the hole it is fitted at',
  blank: 'the whole blank',
  'fold-over': 'folded round a bar',
  'fold-back': 'folded back into a loop',
  adjustable: 'adjustment holes',
  snug: 'snug on the body',
  'swivel-snap': 'swivel snap',
  'trigger-snap': 'trigger snap',
  'two-fingers': 'loose over two fingers',
};

/** A choice value as words: "fold-over" -> "folded round a bar", "in" -> "inches". */
export function choiceWords(v: unknown): string {
  return CHOICE_WORDS[String(v)] ?? String(v).replace(/-/g, ' ');
}

/**
 * A limit written for a person. Inch limits round inward to 1/32 in (a minimum up, a maximum
 * down) so the value shown is itself accepted.
 */
function bound(value: number, field: FieldLabel, unit: LengthUnit, side: 'min' | 'max', thicknessUnit: string): string {
  if (field.kind === 'length') {
    if (unit === 'mm') return formatLength(side === 'min' ? Math.ceil(value * 10 - 1e-6) / 10 : Math.floor(value * 10 + 1e-6) / 10, 'mm');
    const steps = (side === 'min' ? Math.ceil : Math.floor)((value / 25.4) * 32 + (side === 'min' ? -1e-6 : 1e-6));
    return formatLength((steps * 25.4) / 32, 'in');
  }
  if (field.kind === 'thickness') return `${value} ${thicknessUnit}`;
  if (field.kind === 'percent') return `${value} %`;
  return String(value);
}

/** What a field of this kind must be, for wrong-type messages. */
function expectedWords(field: FieldLabel, unit: LengthUnit, thicknessUnit: string): string {
  switch (field.kind) {
    case 'length':
      return `a length in ${unit === 'in' ? 'inches' : 'millimetres'}`;
    case 'count':
      return 'a whole number';
    case 'thickness':
      return `a number of ${thicknessUnit === 'oz' ? 'ounces' : 'millimetres'}`;
    case 'percent':
    case 'ratio':
      return 'a number';
    case 'yes-no':
      return 'yes or no';
    case 'list':
      return 'a list';
    default:
      return 'filled in';
  }
}

/** Context for describing one issue: the whole input (for missing values) and the display unit. */
export interface IssueContext {
  /** The value that was parsed (for "is required" and the thickness unit). */
  input: unknown;
  unit: LengthUnit;
}

/** A message for one zod issue on a field with this label, in `ctx.unit`. */
export function describeIssue(issue: Issue, field: FieldLabel, ctx: IssueContext, thicknessUnit = 'oz'): string {
  const label = cap(field.label || 'This value');
  const value = valueAt(ctx.input, issue.path);
  switch (issue.code) {
    case 'too_small':
      if (issue.origin === 'string') return Number(issue.minimum) <= 1 ? `${label} must not be empty` : `${label} must be at least ${String(issue.minimum)} characters`;
      if (issue.origin === 'array' || issue.origin === 'set') return `${label}: ${issue.message.replace(/^[a-z]/, (c) => c.toUpperCase())}`;
      return `${label} must be at least ${bound(Number(issue.minimum), field, ctx.unit, 'min', thicknessUnit)}`;
    case 'too_big':
      if (issue.origin === 'string') return `${label} must be at most ${String(issue.maximum)} characters`;
      if (issue.origin === 'array' || issue.origin === 'set') return `${label}: ${issue.message.replace(/^[a-z]/, (c) => c.toUpperCase())}`;
      return `${label} must be at most ${bound(Number(issue.maximum), field, ctx.unit, 'max', thicknessUnit)}`;
    case 'invalid_type':
      if (value === undefined || value === null || value === '') return `${label} is required`;
      if (issue.expected === 'int') return `${label} must be a whole number`;
      if (issue.expected === 'number' && field.kind !== 'length') return `${label} must be a number`;
      if (issue.expected === 'string') return `${label} must be text`;
      if (issue.expected === 'boolean') return `${label} must be yes or no`;
      return `${label} must be ${expectedWords(field, ctx.unit, thicknessUnit)}`;
    case 'invalid_value':
      if (issue.path.at(-1) === 'specVersion') return 'This pattern was saved in a format this version of Latchet does not read';
      return `${label} must be ${orList(issue.values.map(choiceWords))}`;
    case 'invalid_union': {
      const options = (issue as { options?: unknown[] }).options;
      if (options?.length) return `${label} must be ${orList(options.map(choiceWords))}`;
      return `${label} is not one of the choices`;
    }
    case 'invalid_format':
      return `${label} ${/must/.test(issue.message) ? issue.message.replace(/^.*?(must)/, '$1') : 'is not in the expected form'}`;
    case 'not_multiple_of':
      return `${label} must be a multiple of ${String(issue.divisor)}`;
    case 'unrecognized_keys':
      return `${label} has fields this version does not know: ${issue.keys.length}`;
    default:
      return /^[A-Z]/.test(issue.message) ? issue.message : cap(issue.message);
  }
}

/** A message for one issue of StrapSpecSchema; `spec` is the value that was parsed (or the form's values). */
export function describeSpecIssue(issue: Issue, spec: unknown): string {
  const field = specFieldLabel(issue.path as (string | number)[], spec);
  const thicknessUnit = (valueAt(spec, ['thickness', 'unit']) as string | undefined) === 'mm' ? 'mm' : 'oz';
  // A custom refinement already says what is wrong; it gets the label in front only when it lacks one.
  if (issue.code === 'custom') return cap(issue.message);
  return describeIssue(issue, field, { input: spec, unit: displayUnitOf(spec) }, thicknessUnit);
}

/** Every issue of a failed spec parse as `{ path, message }`, first message per field. */
export function specIssueMessages(error: z.ZodError, spec: unknown): { path: string; message: string }[] {
  const seen = new Set<string>();
  const out: { path: string; message: string }[] = [];
  for (const issue of error.issues) {
    const path = issue.path.map(String).join('.');
    if (seen.has(path)) continue;
    seen.add(path);
    out.push({ path, message: describeSpecIssue(issue, spec) });
  }
  return out;
}
