// Orders: the board and table list, one order, take, change, move along the flow, and the
// job sheet PDF. Every member may use them (apprentices take and move orders).
import { Router } from 'express';
import { CreateOrderSchema, JobSheetQuerySchema, MoveOrderSchema, OrderListQuerySchema, UpdateOrderSchema } from '@shared/schemas/orders.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate as body } from '../../http/validate.ts';
import { parseOr400 } from '../../http/zod-fields.ts';
import type { OrdersService } from './orders.service.ts';

export function ordersRoutes(orders: OrdersService): Router {
  const r = Router();
  route(r, 'orders.list', async (req, res) => {
    res.json(await orders.list(authOf(req), parseOr400(OrderListQuerySchema, req.query)));
  });
  route(r, 'orders.create', body(CreateOrderSchema), async (req, res) => {
    const out = await orders.create(authOf(req), req.body);
    res.status(201).setHeader('Location', `/api/orders/${out.order.id}`).json(out);
  });
  route(r, 'orders.read', async (req, res) => {
    res.json(await orders.read(authOf(req), param(req, 'id')));
  });
  route(r, 'orders.update', body(UpdateOrderSchema), async (req, res) => {
    res.json(await orders.update(authOf(req), param(req, 'id'), req.body));
  });
  route(r, 'orders.move', body(MoveOrderSchema), async (req, res) => {
    res.json(await orders.move(authOf(req), param(req, 'id'), req.body));
  });
  route(r, 'orders.jobSheet', async (req, res) => {
    const { paper } = parseOr400(JobSheetQuerySchema, req.query);
    const file = await orders.jobSheet(authOf(req), param(req, 'id'), paper);
    res.setHeader('Content-Type', file.contentType);
    res.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
    res.send(file.body);
  });
  return r;
}
