import { specLabel } from '../schemas/spec-labels.ts';
import { formatLength } from '../units/format-length.ts';
import type { LengthUnit } from '../units/length.ts';

/**
 * The one error the engine throws for impossible input. `field` is the spec path
 * ("girthMm", "pieces.0.end.holes.count") for placing the message beside its input; the
 * message names the field by its label in the display unit (see fieldError); `limit` states
 * the bound that was broken ("at least 2 in").
 */
export class EngineError extends Error {
  readonly field: string;
  readonly limit: string | undefined;

  constructor(field: string, message: string, limit?: string) {
    super(message);
    this.name = 'EngineError';
    this.field = field;
    this.limit = limit;
  }

  /** One line: "field: message". */
  toLine(): string {
    return `${this.field}: ${this.message}`;
  }
}

/** What an engine message needs to speak to a person: the display unit and the pieces' names. */
export interface Wording {
  units: LengthUnit;
  pieces?: readonly { name?: unknown; role?: unknown }[];
}

/** Millimetres and no piece names: for callers that have no spec at hand. */
export const MM_WORDING: Wording = { units: 'mm' };

/** A length in the wording's unit ("3 3/4 in", "95.3 mm"). */
export const lengthIn = (w: Wording) => (mm: number) => formatLength(mm, w.units);

/**
 * An EngineError a person can read: the field's label ("Tip number of holes"), then the
 * problem in the display unit. `field` stays the path so forms place it beside the input.
 */
export function fieldError(w: Wording, field: string, problem: string, limit?: string): EngineError {
  return new EngineError(field, `${specLabel(field, w)}: ${problem}`, limit);
}
