// GET/PATCH /api/me/settings: the signed-in user's own preferences.
import { Router } from 'express';
import { SettingsSchema, type Settings } from '@shared/schemas/library.ts';
import { route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate } from '../../http/validate.ts';
import type { FollowsRepository } from '../follows/follows.repository.ts';

export function settingsRoutes(follows: FollowsRepository): Router {
  const r = Router();
  route(r, 'settings.read', async (req, res) => {
    res.json({ settings: (await follows.settings(authOf(req).user.id)) satisfies Settings });
  });
  route(r, 'settings.update', validate(SettingsSchema), async (req, res) => {
    const userId = authOf(req).user.id;
    await follows.saveSettings(userId, req.body.notifyOnFollowedRevisions);
    res.json({ settings: await follows.settings(userId) });
  });
  return r;
}
