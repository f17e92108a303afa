// Guards for routes: 401 without a session, 403 when the member's role is not allowed.
import type { Request, RequestHandler } from 'express';
import type { Role } from '@shared/schemas/auth.ts';
import { HttpError } from './http-error.ts';
import type { AuthContext } from './session.ts';

const unauthenticated = () => new HttpError(401, 'unauthenticated', 'Sign in to continue.');

/** Passes signed-in requests only. */
export const requireAuth: RequestHandler = (req, _res, next) => next(req.auth ? undefined : unauthenticated());

/** Passes members holding one of `roles` in the session's shop. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.auth) return next(unauthenticated());
    if (!roles.includes(req.auth.role)) return next(new HttpError(403, 'forbidden', `This needs the role ${roles.join(' or ')}; you are ${req.auth.role}.`));
    next();
  };
}

/** The auth context of a request that passed requireAuth/requireRole. */
export function authOf(req: Request): AuthContext {
  if (!req.auth) throw unauthenticated();
  return req.auth;
}
