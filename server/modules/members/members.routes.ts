// GET/PATCH/DELETE /api/shop/members.
import { Router } from 'express';
import { MemberRoleSchema } from '@shared/schemas/library.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate } from '../../http/validate.ts';
import type { MembersService } from './members.service.ts';

export function membersRoutes(members: MembersService): Router {
  const r = Router();
  route(r, 'members.list', async (req, res) => {
    res.json(await members.list(authOf(req)));
  });
  route(r, 'members.update', validate(MemberRoleSchema), async (req, res) => {
    res.json(await members.changeRole(authOf(req), param(req, 'userId'), req.body.role));
  });
  route(r, 'members.remove', async (req, res) => {
    await members.remove(authOf(req), param(req, 'userId'));
    res.status(204).end();
  });
  return r;
}
