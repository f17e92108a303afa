/**
 * The one error the engine throws for impossible input. `field` is the spec path
 * ("girthMm", "pieces.0.end.holes.count"); `limit` states the bound that was broken
 * ("at least 50 mm"), so the CLI, forms and routes can point at the field.
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
