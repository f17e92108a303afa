// GET /api/shop/pricing (every member) and PUT (owners): waste factor, leather prices per
// square foot, hourly bench rate and currency. Hardware costs live in the shop standards.
import { Router } from 'express';
import { ShopPricingSchema } from '@shared/schemas/orders.ts';
import { route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate as body } from '../../http/validate.ts';
import type { PricingService } from './pricing.service.ts';

export function pricingRoutes(pricing: PricingService): Router {
  const r = Router();
  route(r, 'pricing.read', async (req, res) => {
    res.json(await pricing.get(authOf(req)));
  });
  route(r, 'pricing.update', body(ShopPricingSchema), async (req, res) => {
    res.json(await pricing.put(authOf(req), req.body));
  });
  return r;
}
