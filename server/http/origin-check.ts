// CSRF guard: a state-changing request whose Origin (or, lacking it, Referer) is another
// site gets 403. Browsers send Origin on every cross-origin POST/PATCH/PUT/DELETE, and the
// SameSite=Lax cookie is not sent on cross-site sub-requests either, so this is the second
// lock on the same door. Requests without either header come from non-browser clients
// (curl, tests, the CLI), which a cookie-stealing page cannot drive.
import type { RequestHandler } from 'express';
import { HttpError } from './http-error.ts';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

function originOf(value: string): string | null {
  try {
    return new URL(value).origin;
  } catch {
    return null;
  }
}

/** Allows the configured public origin and the origin matching the request's own Host. */
export function originCheck(publicOrigin: string): RequestHandler {
  const allowed = originOf(publicOrigin);
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const header = req.headers.origin ?? req.headers.referer;
    if (header === undefined) return next();
    const origin = header === 'null' ? null : originOf(header);
    const host = req.headers.host;
    const own = host ? [`http://${host}`, `https://${host}`] : [];
    if (origin !== null && (origin === allowed || own.includes(origin))) return next();
    next(new HttpError(403, 'foreign_origin', 'This request came from another site and was refused.'));
  };
}
