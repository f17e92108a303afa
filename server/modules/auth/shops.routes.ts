// GET /api/me/shops and POST /api/me/shop: a user in several shops chooses which one to act for.
import { Router } from 'express';
import type { MeResponse } from '@shared/schemas/auth.ts';
import { SwitchShopSchema } from '@shared/schemas/library.ts';
import { route } from '../../http/allow.ts';
import { notFound } from '../../http/http-error.ts';
import { authOf } from '../../http/require-role.ts';
import { setSessionCookie, type AppLucia } from '../../http/session.ts';
import { validate } from '../../http/validate.ts';
import type { AuthRepository } from './auth.repository.ts';
import type { AuthService } from './auth.service.ts';

export function shopsRoutes(repo: AuthRepository, service: AuthService, lucia: AppLucia): Router {
  const r = Router();
  route(r, 'shops.list', async (req, res) => {
    const auth = authOf(req);
    const items = (await repo.memberships(auth.user.id)).map((m) => ({ id: m.shopId, name: m.shopName, role: m.role }));
    res.json({ items, currentShopId: auth.shop.id });
  });
  route(r, 'shops.switch', validate(SwitchShopSchema), async (req, res) => {
    const auth = authOf(req);
    const member = await repo.membership(auth.user.id, req.body.shopId);
    if (!member) throw notFound('shop');
    // A new session for the other shop; the current one ends (sessions act for one shop).
    await lucia.invalidateSession(auth.session.id);
    setSessionCookie(lucia, req, res, await service.startSession(auth.user.id, member.shopId));
    const { user } = auth;
    res.json({ user: { id: user.id, email: user.email, name: user.name }, shop: { id: member.shopId, name: member.shopName }, role: member.role } satisfies MeResponse);
  });
  return r;
}
