// Customers, wearers and measurements for the members of one shop. Another shop's ids
// answer 404 like ids that do not exist.
import type { z } from 'zod';
import type { CustomerSchema, MeasurementSchema, UpdateCustomerSchema, UpdateWearerSchema, WearerSchema } from '@shared/schemas/orders.ts';
import type { CustomerDetail, OrderSummary } from '@shared/schemas/order-views.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { idParam } from '../patterns/pattern-access.ts';
import { createCustomersRepository } from './customers.repository.ts';
import { customerView, measurementView, wearerView } from './customer-views.ts';

export interface CustomersDeps extends LibraryDeps {
  now: () => number;
  /** The orders of one customer, as the board shows them (from the orders module). */
  ordersOfCustomer: (shopId: number, customerId: number) => Promise<OrderSummary[]>;
}

export function createCustomersService(deps: CustomersDeps) {
  const { db, now } = deps;
  const repo = createCustomersRepository(db);

  async function customerOr404(auth: AuthContext, raw: string | undefined) {
    const id = idParam(raw);
    const row = id === null ? undefined : await repo.inShop(id, auth.shop.id);
    if (!row) throw notFound('customer');
    return row;
  }
  async function wearerOr404(auth: AuthContext, raw: string | undefined) {
    const id = idParam(raw);
    const row = id === null ? undefined : await repo.wearerInShop(id, auth.shop.id);
    if (!row) throw notFound('wearer');
    return row;
  }
  const oneWearer = async (id: number) => {
    const w = (await db('wearers').where({ id }).first())!;
    return wearerView(w, await repo.measurementsOf([id]));
  };

  return {
    repo,
    wearerOr404,
    list: async (auth: AuthContext, query: string | undefined) => ({ items: (await repo.list(auth.shop.id, query?.trim() || undefined)).map(customerView) }),

    async create(auth: AuthContext, input: z.output<typeof CustomerSchema>) {
      const t = now();
      const id = await writeTransaction(db, (trx) => repo.insert(trx, { shop_id: auth.shop.id, ...input, created_at: t, updated_at: t, created_by: auth.user.id }));
      return { customer: customerView((await repo.inShop(id, auth.shop.id))!) };
    },

    async read(auth: AuthContext, raw: string | undefined): Promise<CustomerDetail> {
      const c = await customerOr404(auth, raw);
      const wearers = await repo.wearersOf(c.id);
      const measurements = await repo.measurementsOf(wearers.map((w) => w.id));
      return { customer: customerView(c), wearers: wearers.map((w) => wearerView(w, measurements)), orders: await deps.ordersOfCustomer(auth.shop.id, c.id) };
    },

    async update(auth: AuthContext, raw: string | undefined, patch: z.output<typeof UpdateCustomerSchema>) {
      const c = await customerOr404(auth, raw);
      await writeTransaction(db, (trx) => repo.update(trx, c.id, { ...patch, updated_at: now() }));
      return { customer: customerView((await repo.inShop(c.id, auth.shop.id))!) };
    },

    async createWearer(auth: AuthContext, raw: string | undefined, input: z.output<typeof WearerSchema>) {
      const c = await customerOr404(auth, raw);
      const id = await writeTransaction(db, (trx) => repo.insertWearer(trx, { shop_id: auth.shop.id, customer_id: c.id, ...input, created_at: now() }));
      return { wearer: await oneWearer(id) };
    },

    async updateWearer(auth: AuthContext, raw: string | undefined, patch: z.output<typeof UpdateWearerSchema>) {
      const w = await wearerOr404(auth, raw);
      await writeTransaction(db, (trx) => repo.updateWearer(trx, w.id, patch));
      return { wearer: await oneWearer(w.id) };
    },

    async measurements(auth: AuthContext, raw: string | undefined) {
      const w = await wearerOr404(auth, raw);
      return { items: (await repo.measurementsOf([w.id])).map(measurementView) };
    },

    async addMeasurement(auth: AuthContext, raw: string | undefined, input: z.output<typeof MeasurementSchema>) {
      const w = await wearerOr404(auth, raw);
      const t = now();
      const id = await writeTransaction(db, (trx) =>
        repo.insertMeasurement(trx, {
          shop_id: auth.shop.id,
          wearer_id: w.id,
          girth_mm: input.girthMm,
          unit: input.unit,
          part: input.part,
          method: input.method,
          note: input.note,
          taken_at: input.takenAt ? Date.parse(input.takenAt) : t,
          taken_by: auth.user.id,
          taken_by_label: '',
          created_at: t,
        }),
      );
      return { measurement: measurementView((await repo.measurementById(id))!) };
    },
  };
}
export type CustomersService = ReturnType<typeof createCustomersService>;
