// Registers a route from the permission table: its method, path and allowed actors come
// from shared/schemas/permissions.ts, so the table and the routes cannot drift apart.
import type { RequestHandler, Router } from 'express';
import { PERMISSIONS, type Action } from '@shared/schemas/permissions.ts';
import type { Role } from '@shared/schemas/auth.ts';
import { requireRole } from './require-role.ts';

/** Guard for `action`: public actions pass everyone; others need one of the listed roles. */
export function allow(action: Action): RequestHandler {
  const actors = PERMISSIONS[action].actors as readonly string[];
  if (actors.includes('anonymous')) return (_req, _res, next) => next();
  return requireRole(...(actors as Role[]));
}

/** `router.<method>(path, allow(action), ...handlers)` for the table's entry `action`. */
export function route(router: Router, action: Action, ...handlers: RequestHandler[]): void {
  const { method, path } = PERMISSIONS[action];
  const verb = method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';
  router[verb](path, allow(action), ...handlers);
}

/** A named path parameter as a string (Express 5 types allow arrays for splats). */
export function param(req: { params: Record<string, string | string[] | undefined> }, name: string): string | undefined {
  const v = req.params[name];
  return typeof v === 'string' ? v : undefined;
}
