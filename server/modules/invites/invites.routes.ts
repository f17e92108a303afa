// Invites: owners send and revoke them; anyone holding the link looks at and accepts it.
import { Router } from 'express';
import type { MeResponse } from '@shared/schemas/auth.ts';
import { AcceptInviteSchema, CreateInviteSchema } from '@shared/schemas/library.ts';
import type { Config } from '../../config.ts';
import { param, route } from '../../http/allow.ts';
import { failureLimiter } from '../../http/rate-limit.ts';
import { authOf } from '../../http/require-role.ts';
import { setSessionCookie, type AppLucia } from '../../http/session.ts';
import { validate } from '../../http/validate.ts';
import type { AuthRepository } from '../auth/auth.repository.ts';
import type { AuthService } from '../auth/auth.service.ts';
import type { InvitesService } from './invites.service.ts';

export function invitesRoutes(invites: InvitesService, auth: { service: AuthService; repo: AuthRepository; lucia: AppLucia }, config: Config): Router {
  const r = Router();
  // Accepting may check an existing account's password: limit guesses like sign-in.
  const acceptLimit = failureLimiter(config.authRateLimit, config.authRateWindowMs);

  route(r, 'invites.list', async (req, res) => {
    res.json(await invites.list(authOf(req)));
  });
  route(r, 'invites.create', validate(CreateInviteSchema), async (req, res) => {
    res.status(201).json(await invites.create(authOf(req), req.body));
  });
  route(r, 'invites.revoke', async (req, res) => {
    await invites.revoke(authOf(req), param(req, 'inviteId'));
    res.status(204).end();
  });
  route(r, 'invites.view', async (req, res) => {
    res.json(await invites.view(param(req, 'token')));
  });
  route(r, 'invites.accept', acceptLimit, validate(AcceptInviteSchema), async (req, res) => {
    const joined = await invites.accept(req.auth, param(req, 'token'), req.body);
    // A fresh session acting for the shop just joined; the one held before ends.
    if (req.auth) await auth.lucia.invalidateSession(req.auth.session.id);
    const sessionId = await auth.service.startSession(joined.userId, joined.shopId);
    setSessionCookie(auth.lucia, req, res, sessionId);
    const user = (await auth.repo.findUserById(joined.userId))!;
    const member = (await auth.repo.membership(joined.userId, joined.shopId))!;
    const me: MeResponse = { user: { id: user.id, email: user.email, name: user.name }, shop: { id: member.shopId, name: member.shopName }, role: member.role };
    res.status(joined.created ? 201 : 200).json(me);
  });
  return r;
}
