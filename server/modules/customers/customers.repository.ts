// Customers, their wearers and the wearers' measurements. Every query is scoped to a shop.
import type { Knex } from 'knex';

export interface CustomerRow {
  id: number;
  shop_id: number;
  name: string;
  email: string;
  phone: string;
  notes: string;
  created_at: number;
  updated_at: number;
  wearer_count?: number;
  open_order_count?: number;
}
export interface WearerRow {
  id: number;
  shop_id: number;
  customer_id: number;
  name: string;
  kind: string;
  notes: string;
  created_at: number;
}
export interface MeasurementRow {
  id: number;
  shop_id: number;
  wearer_id: number;
  girth_mm: number;
  unit: string;
  part: string;
  method: string;
  note: string;
  taken_at: number;
  taken_by: number | null;
  taken_by_name: string | null;
  taken_by_label: string;
}

const counted = (db: Knex) =>
  db('customers as c').select(
    'c.*',
    db('wearers').count('*').where('customer_id', db.ref('c.id')).as('wearer_count'),
    db('orders').count('*').where('customer_id', db.ref('c.id')).whereNot('stage', 'handed-over').as('open_order_count'),
  );

const measurementsQuery = (q: Knex) =>
  q('measurements as m').leftJoin('users as u', 'u.id', 'm.taken_by').select<MeasurementRow[]>('m.*', 'u.name as taken_by_name');

export function createCustomersRepository(db: Knex) {
  return {
    list: (shopId: number, query: string | undefined) => {
      const q = counted(db).where('c.shop_id', shopId).orderBy('c.name').limit(500);
      if (query) q.where((w) => w.whereRaw('lower(c.name) like ?', [`%${query.toLowerCase()}%`]).orWhereRaw('lower(c.email) like ?', [`%${query.toLowerCase()}%`]));
      return q as Promise<CustomerRow[]>;
    },
    inShop: (id: number, shopId: number, q: Knex = db) => counted(q).where({ 'c.id': id, 'c.shop_id': shopId }).first() as Promise<CustomerRow | undefined>,
    async insert(q: Knex, row: Omit<CustomerRow, 'id'> & { created_by: number | null }): Promise<number> {
      const [r] = await q('customers').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    update: (q: Knex, id: number, patch: Partial<CustomerRow>) => q('customers').where({ id }).update(patch),

    wearersOf: (customerId: number, q: Knex = db) => q<WearerRow>('wearers').where({ customer_id: customerId }).orderBy('id'),
    wearerInShop: (id: number, shopId: number, q: Knex = db) => q<WearerRow>('wearers').where({ id, shop_id: shopId }).first(),
    async insertWearer(q: Knex, row: Omit<WearerRow, 'id'>): Promise<number> {
      const [r] = await q('wearers').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    updateWearer: (q: Knex, id: number, patch: Partial<WearerRow>) => q('wearers').where({ id }).update(patch),

    /** Oldest first, so a chart reads left to right. */
    measurementsOf: (wearerIds: number[], q: Knex = db) => measurementsQuery(q).whereIn('m.wearer_id', wearerIds).orderBy([{ column: 'm.taken_at' }, { column: 'm.id' }]),
    measurementById: (id: number, q: Knex = db) => measurementsQuery(q).where('m.id', id).first() as Promise<MeasurementRow | undefined>,
    /** The newest measurement of a wearer at one body part ('other' = any part). */
    latestMeasurement: (wearerId: number, part: string, q: Knex = db) => {
      const query = measurementsQuery(q).where('m.wearer_id', wearerId);
      if (part !== 'other') query.where('m.part', part);
      return query.orderBy([{ column: 'm.taken_at', order: 'desc' }, { column: 'm.id', order: 'desc' }]).first() as Promise<MeasurementRow | undefined>;
    },
    async insertMeasurement(q: Knex, row: Omit<MeasurementRow, 'id' | 'taken_by_name'> & { created_at: number }): Promise<number> {
      const [r] = await q('measurements').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
  };
}
export type CustomersRepository = ReturnType<typeof createCustomersRepository>;
