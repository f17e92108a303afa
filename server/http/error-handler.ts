// The one error middleware. Known errors keep their status and code; anything else is a
// 500 whose details go to the log only, never to the client.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError } from './http-error.ts';
import { storageFullError } from './storage-full.ts';

interface BodyParserError {
  type?: string;
  status?: number;
  expose?: boolean;
}

function toHttpError(err: unknown): HttpError | null {
  if (err instanceof HttpError) return err;
  const bp = err as BodyParserError;
  if (bp && typeof bp === 'object' && typeof bp.type === 'string') {
    if (bp.type === 'entity.too.large') return new HttpError(413, 'payload_too_large', 'The request body is larger than the server accepts.');
    if (bp.type === 'entity.parse.failed') return new HttpError(400, 'malformed_json', 'The request body is not valid JSON.');
    if (bp.type === 'encoding.unsupported' || bp.type === 'charset.unsupported') return new HttpError(415, 'unsupported_media_type', 'The request body encoding is not supported.');
  }
  // Other http-errors raised by Express middleware (e.g. a missing static asset).
  if (bp && typeof bp === 'object' && typeof bp.status === 'number' && bp.status >= 400 && bp.status < 500) {
    return bp.status === 404 ? new HttpError(404, 'not_found', 'No such file.') : new HttpError(bp.status, 'bad_request', 'The request could not be handled.');
  }
  return null;
}

/** Final error middleware: answers `{ error: { code, message, fields? } }`. */
export function errorHandler(log: (err: unknown) => void = (e) => console.error(e)): ErrorRequestHandler {
  return (err, _req, res, next) => {
    if (res.headersSent) return next(err);
    const known = toHttpError(err);
    if (!known) log(err);
    const e = known ?? storageFullError(err) ?? new HttpError(500, 'internal', 'Something went wrong on the server; nothing was saved by this request.');
    for (const [name, value] of Object.entries(e.headers ?? {})) res.setHeader(name, value);
    res.status(e.status).json({ error: { code: e.code, message: e.message, ...(e.fields ? { fields: e.fields } : {}), ...e.details } });
  };
}

/** JSON 404 for any /api path no route claimed. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'not_found', `No API route ${req.method} ${req.path}.`));
};
