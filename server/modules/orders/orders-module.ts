// Assembles the orders side (customers, orders, measuring links, proofs, photos, pricing)
// into one router for createApp, so the app mounts it with one line.
import { Router } from 'express';
import { customersRoutes } from '../customers/customers.routes.ts';
import { createCustomersService } from '../customers/customers.service.ts';
import { measureLinksRoutes } from '../measure-links/measure-links.routes.ts';
import { createMeasureLinksService } from '../measure-links/measure-links.service.ts';
import { photosRoutes } from '../photos/photos.routes.ts';
import { createPhotosService } from '../photos/photos.service.ts';
import { pricingRoutes } from '../pricing/pricing.routes.ts';
import { createPricingService } from '../pricing/pricing.service.ts';
import { proofsRoutes } from '../proofs/proofs.routes.ts';
import { createProofsService } from '../proofs/proofs.service.ts';
import type { FileStore } from '../storage/file-store.ts';
import { ordersRoutes } from './orders.routes.ts';
import { createOrdersService, type OrdersDeps } from './orders.service.ts';

export function ordersModule(deps: OrdersDeps & { fileStore: FileStore }): Router {
  const orders = createOrdersService(deps);
  const photos = createPhotosService(deps, orders.orderOr404);
  const r = Router();
  r.use(customersRoutes(createCustomersService({ ...deps, ordersOfCustomer: orders.ordersOfCustomer })));
  r.use(ordersRoutes(orders));
  r.use(measureLinksRoutes(createMeasureLinksService(deps, orders.orderOr404)));
  r.use(proofsRoutes(createProofsService(deps, orders.orderOr404), photos));
  r.use(photosRoutes(photos, deps.config));
  r.use(pricingRoutes(createPricingService(deps.db, deps.now)));
  return r;
}
