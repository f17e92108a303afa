// Sessions: lucia (sliding idle lifetime) behind our adapter, plus the absolute lifetime
// lucia lacks, checked on every request. The session cookie is HttpOnly, SameSite=Lax,
// and Secure whenever the request arrived over HTTPS.
import type { Request, RequestHandler, Response } from 'express';
import { Lucia, TimeSpan, type Session, type User } from 'lucia';
import type { Role } from '@shared/schemas/auth.ts';
import type { Config } from '../config.ts';
import type { AuthRepository } from '../modules/auth/auth.repository.ts';
import { createSessionAdapter } from '../modules/auth/session-adapter.ts';

/** Name of the session cookie. */
export const SESSION_COOKIE = 'latchet_session';

export function createLucia(repo: AuthRepository, config: Config) {
  return new Lucia(createSessionAdapter(repo), {
    sessionExpiresIn: new TimeSpan(Math.round(config.sessionIdleMs / 1000), 's'),
    sessionCookie: { name: SESSION_COOKIE, attributes: { sameSite: 'lax', secure: false } },
    getUserAttributes: (a) => ({ email: a.email, name: a.name }),
    getSessionAttributes: (a) => ({ shopId: a.shopId, createdAt: a.createdAt }),
  });
}
export type AppLucia = ReturnType<typeof createLucia>;

declare module 'lucia' {
  interface Register {
    Lucia: AppLucia;
    UserId: number;
    DatabaseUserAttributes: { email: string; name: string };
    DatabaseSessionAttributes: { shopId: number; createdAt: number };
  }
}

/** Who is asking: set on req by {@link sessionMiddleware} when the cookie names a live session. */
export interface AuthContext {
  user: User;
  session: Session;
  shop: { id: number; name: string };
  role: Role;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      auth?: AuthContext;
    }
  }
}

/** Write the session cookie (or a blank one that clears it) with Secure matching the request. */
export function setSessionCookie(lucia: AppLucia, req: Request, res: Response, sessionId: string | null): void {
  const cookie = sessionId === null ? lucia.createBlankSessionCookie() : lucia.createSessionCookie(sessionId);
  cookie.attributes.secure = req.secure;
  res.append('Set-Cookie', cookie.serialize());
}

/** Reads the cookie, validates the session and the membership, and sets `req.auth`. */
export function sessionMiddleware(lucia: AppLucia, repo: AuthRepository, config: Config): RequestHandler {
  return async (req, res, next) => {
    const id = lucia.readSessionCookie(req.headers.cookie ?? '');
    if (!id) return next();
    const { session, user } = await lucia.validateSession(id);
    if (!session) {
      setSessionCookie(lucia, req, res, null);
      return next();
    }
    if (Date.now() - session.createdAt > config.sessionAbsoluteMs) {
      await lucia.invalidateSession(session.id);
      setSessionCookie(lucia, req, res, null);
      return next();
    }
    // Read the role on every request so a demotion or removal takes effect at once.
    const member = await repo.membership(user.id, session.shopId);
    if (!member) {
      await lucia.invalidateSession(session.id);
      setSessionCookie(lucia, req, res, null);
      return next();
    }
    if (session.fresh) setSessionCookie(lucia, req, res, session.id);
    req.auth = { user, session, shop: { id: member.shopId, name: member.shopName }, role: member.role };
    next();
  };
}
