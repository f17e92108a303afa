// POST /api/auth/sign-up, /sign-in, /sign-out and GET /api/me.
import { Router } from 'express';
import { SignInSchema, SignUpSchema, type MeResponse } from '@shared/schemas/auth.ts';
import type { Config } from '../../config.ts';
import { failureLimiter, limiterKey } from '../../http/rate-limit.ts';
import { authOf, requireAuth } from '../../http/require-role.ts';
import { setSessionCookie, type AppLucia } from '../../http/session.ts';
import { validate } from '../../http/validate.ts';
import type { AuthService } from './auth.service.ts';

export function authRoutes(service: AuthService, lucia: AppLucia, config: Config): Router {
  const router = Router();
  const signInLimit = failureLimiter(config.authRateLimit, config.authRateWindowMs);
  const signUpLimit = failureLimiter(config.authRateLimit, config.authRateWindowMs);

  router.post('/auth/sign-up', signUpLimit, validate(SignUpSchema), async (req, res) => {
    const { sessionId, me } = await service.signUp(req.body);
    if (req.auth) await lucia.invalidateSession(req.auth.session.id);
    setSessionCookie(lucia, req, res, sessionId);
    res.status(201).json(me satisfies MeResponse);
  });

  router.post('/auth/sign-in', signInLimit, validate(SignInSchema), async (req, res) => {
    const { sessionId, me } = await service.signIn(req.body);
    // A new session on every sign-in; the one the browser held before is ended.
    if (req.auth) await lucia.invalidateSession(req.auth.session.id);
    await signInLimit.resetKey(limiterKey(req));
    setSessionCookie(lucia, req, res, sessionId);
    res.json(me satisfies MeResponse);
  });

  router.post('/auth/sign-out', requireAuth, async (req, res) => {
    await lucia.invalidateSession(authOf(req).session.id);
    setSessionCookie(lucia, req, res, null);
    res.status(204).end();
  });

  router.get('/me', requireAuth, (req, res) => {
    const { user, shop, role } = authOf(req);
    res.json({ user: { id: user.id, email: user.email, name: user.name }, shop, role } satisfies MeResponse);
  });

  return router;
}
