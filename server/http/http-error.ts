// The one error type routes and services throw; the error handler turns it into
// `{ error: { code, message, fields? } }` with its status.

/** Field name (dotted path for nested fields) -> what is wrong with it. */
export type FieldErrors = Record<string, string>;

/** An error with an HTTP status, a stable machine-readable code and a human message. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldErrors,
    /** Extra members of the error body, e.g. the current head on a 412. */
    readonly details?: Record<string, unknown>,
    /** Response headers to send with the error, e.g. the current ETag on a 412. */
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

/**
 * 400 with each bad field: `fields` is keyed by path (to place each message beside its input);
 * the messages name the field by its label, so the summary is just those messages.
 */
export const badInput = (fields: FieldErrors, message?: string) => new HttpError(400, 'invalid_input', message ?? Object.values(fields).join('; '), fields);

/** 404 in our format; also what another shop's objects answer, so their existence never leaks. */
export const notFound = (what = 'resource') => new HttpError(404, 'not_found', `No such ${what}.`);
