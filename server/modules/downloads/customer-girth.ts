// `girth=` on a saved revision's downloads: the pattern fitted to one customer's girth for a
// single print, without a new revision (an apprentice prints proven patterns for orders).
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import { specAtGirth } from '@shared/pattern/spec-at-girth.ts';
import { GIRTH_MAX_MM, GIRTH_MIN_MM } from '@shared/schemas/strap-spec-limits.ts';
import { StrapSpecSchema, type StrapSpec } from '@shared/schemas/strap-spec.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { parseLength } from '@shared/units/parse-length.ts';
import { HttpError } from '../../http/http-error.ts';

const refuse = (message: string) => new HttpError(400, 'invalid_input', message, { girth: message });

/** A girth as typed: "14in", "355.6mm", "13 1/2in", "15½", "15-1/2"; a bare number is in the pattern's unit. */
export function girthMmOf(text: string, unit: StrapSpec['units']): number | undefined {
  const r = parseLength(text, unit);
  return r.ok ? r.mm : undefined;
}

/**
 * The saved spec at the customer's girth, and the note for the title block's revision row
 * ("at 14 in girth"). Refusals name "Customer girth" in the pattern's display unit.
 */
export function atCustomerGirth(saved: StrapSpec, text: string, size: string | undefined): { spec: StrapSpec; note: string } {
  if (size !== undefined && size !== '') throw refuse('Customer girth: print either one size of the run or a customer girth, not both');
  const girthMm = girthMmOf(text, saved.units);
  if (girthMm === undefined) throw refuse(`Customer girth: "${text}" is not a length; e.g. ${saved.units === 'in' ? '14 1/2 in' : '368 mm'}`);
  if (girthMm < GIRTH_MIN_MM) throw refuse(`Customer girth must be at least ${formatLength(GIRTH_MIN_MM, saved.units)}`);
  if (girthMm > GIRTH_MAX_MM) throw refuse(`Customer girth must be at most ${formatLength(GIRTH_MAX_MM, saved.units)}`);
  const spec = StrapSpecSchema.parse(specAtGirth(saved, { girthMm }));
  try {
    // Checked here so a girth the engine cannot draw (too short for the tip's holes) is named
    // as the customer girth, not as a field of the pattern.
    computeLayout(spec);
  } catch (err) {
    if (err instanceof EngineError) throw refuse(`Customer girth of ${formatLength(girthMm, saved.units)}: ${err.message}`);
    throw err;
  }
  return { spec, note: `at ${formatLength(girthMm, saved.units)} girth` };
}
