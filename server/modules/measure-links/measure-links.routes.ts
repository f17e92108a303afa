// The measuring link: a member sends it from an order (and may withdraw it while unanswered); the customer's page reads and answers
// it (public: the token is the permission).
import { Router } from 'express';
import { MeasurementRequestSchema } from '@shared/schemas/orders.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate as body } from '../../http/validate.ts';
import type { MeasureLinksService } from './measure-links.service.ts';

export function measureLinksRoutes(links: MeasureLinksService): Router {
  const r = Router();
  route(r, 'orders.requestMeasurement', body(MeasurementRequestSchema), async (req, res) => {
    res.status(201).json(await links.send(authOf(req), param(req, 'id'), req.body));
  });
  route(r, 'orders.measurementRequestRevoke', async (req, res) => {
    await links.revoke(authOf(req), param(req, 'requestId'));
    res.status(204).end();
  });
  route(r, 'measure.view', async (req, res) => {
    res.json(await links.page(param(req, 'token')));
  });
  route(r, 'measure.answer', async (req, res) => {
    res.status(201).json(await links.answer(param(req, 'token'), req.body));
  });
  return r;
}
