// Customers, wearers and measurements (every member of the shop).
import { Router } from 'express';
import { CustomerSchema, MeasurementSchema, UpdateCustomerSchema, UpdateWearerSchema, WearerSchema } from '@shared/schemas/orders.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate as body } from '../../http/validate.ts';
import type { CustomersService } from './customers.service.ts';

export function customersRoutes(customers: CustomersService): Router {
  const r = Router();
  route(r, 'customers.list', async (req, res) => {
    res.json(await customers.list(authOf(req), typeof req.query.query === 'string' ? req.query.query.slice(0, 100) : undefined));
  });
  route(r, 'customers.create', body(CustomerSchema), async (req, res) => {
    res.status(201).json(await customers.create(authOf(req), req.body));
  });
  route(r, 'customers.read', async (req, res) => {
    res.json(await customers.read(authOf(req), param(req, 'id')));
  });
  route(r, 'customers.update', body(UpdateCustomerSchema), async (req, res) => {
    res.json(await customers.update(authOf(req), param(req, 'id'), req.body));
  });
  route(r, 'wearers.create', body(WearerSchema), async (req, res) => {
    res.status(201).json(await customers.createWearer(authOf(req), param(req, 'id'), req.body));
  });
  route(r, 'wearers.update', body(UpdateWearerSchema), async (req, res) => {
    res.json(await customers.updateWearer(authOf(req), param(req, 'wearerId'), req.body));
  });
  route(r, 'measurements.list', async (req, res) => {
    res.json(await customers.measurements(authOf(req), param(req, 'wearerId')));
  });
  route(r, 'measurements.create', body(MeasurementSchema), async (req, res) => {
    res.status(201).json(await customers.addMeasurement(authOf(req), param(req, 'wearerId'), req.body));
  });
  return r;
}
