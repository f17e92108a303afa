// GET /api/shop/standards (every member), PUT (owners), and the spec a new pattern starts from.
import { Router } from 'express';
import { ShopStandardsSchema } from '@shared/schemas/shop-standards.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate } from '../../http/validate.ts';
import type { StandardsService } from './standards.service.ts';

export function standardsRoutes(standards: StandardsService): Router {
  const r = Router();
  route(r, 'standards.read', async (req, res) => {
    res.json(await standards.read(authOf(req)));
  });
  route(r, 'standards.update', validate(ShopStandardsSchema), async (req, res) => {
    res.json(await standards.replace(authOf(req), req.body));
  });
  route(r, 'standards.start', async (req, res) => {
    res.json(await standards.startSpec(authOf(req), param(req, 'kind')));
  });
  return r;
}
