// 415 for a request body that is neither JSON nor (where a route takes uploads) multipart.
import type { RequestHandler } from 'express';
import { HttpError } from './http-error.ts';

/** Rejects bodies of other media types; requests without a body pass. */
export function requireJsonBody(allowMultipart = true): RequestHandler {
  return (req, _res, next) => {
    const hasBody = req.headers['transfer-encoding'] !== undefined || Number(req.headers['content-length'] ?? 0) > 0;
    if (!hasBody || req.is('application/json') || (allowMultipart && req.is('multipart/form-data'))) return next();
    next(new HttpError(415, 'unsupported_media_type', 'Send the request body as application/json.'));
  };
}
