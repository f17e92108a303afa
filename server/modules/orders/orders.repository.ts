// Orders, their history (order_events) and job-sheet prints. Every read is scoped to a shop.
import type { Knex } from 'knex';

export interface OrderRow {
  id: number;
  shop_id: number;
  number: number;
  customer_id: number;
  wearer_id: number;
  pattern_id: number;
  revision_number: number;
  fit_from: 'size' | 'measurement' | 'later';
  size_name: string | null;
  measurement_id: number | null;
  girth_mm: number | null;
  stage: string;
  due_date: string;
  quantity: number;
  leather_id: string | null;
  leather_colour: string;
  leather_finish: string;
  thread: string;
  notes: string;
  bench_minutes: number;
  hardware: string | null;
  created_by: number | null;
  created_at: number;
  updated_at: number;
}
/** An order with the names the board shows and its revision's spec (JSON). */
export interface ListedOrderRow extends OrderRow {
  shop_name: string;
  customer_name: string;
  customer_email: string;
  wearer_name: string;
  wearer_kind: string;
  pattern_name: string;
  pattern_kind: string;
  spec: string;
  created_by_name: string | null;
}
export interface OrderEventRow {
  id: number;
  order_id: number;
  user_id: number | null;
  user_name: string | null;
  by_label: string;
  kind: string;
  from_stage: string | null;
  to_stage: string | null;
  summary: string;
  at: number;
}
export interface NewOrderEvent {
  order_id: number;
  user_id: number | null;
  by_label?: string;
  kind: string;
  from_stage?: string | null;
  to_stage?: string | null;
  summary: string;
  detail?: Record<string, unknown>;
  at: number;
}
export interface OrderFilters {
  stages: string[];
  customerId?: number;
  dueFrom?: string;
  dueTo?: string;
  query?: string;
  active: boolean;
  sort: 'due' | 'updated' | 'number';
  limit: number;
}

const listed = (q: Knex) =>
  q('orders as o')
    .join('shops as s', 's.id', 'o.shop_id')
    .join('customers as c', 'c.id', 'o.customer_id')
    .join('wearers as w', 'w.id', 'o.wearer_id')
    .join('patterns as p', 'p.id', 'o.pattern_id')
    .join('revisions as r', (j) => j.on('r.pattern_id', 'o.pattern_id').andOn('r.number', 'o.revision_number'))
    .leftJoin('users as u', 'u.id', 'o.created_by')
    .select<ListedOrderRow[]>(
      'o.*',
      's.name as shop_name',
      'c.name as customer_name',
      'c.email as customer_email',
      'w.name as wearer_name',
      'w.kind as wearer_kind',
      'p.name as pattern_name',
      'p.kind as pattern_kind',
      'r.spec as spec',
      'u.name as created_by_name',
    );

export function createOrdersRepository(db: Knex) {
  return {
    list(shopId: number, f: OrderFilters): Promise<ListedOrderRow[]> {
      const q = listed(db).where('o.shop_id', shopId);
      if (f.stages.length) q.whereIn('o.stage', f.stages);
      if (f.active) q.whereNot('o.stage', 'handed-over');
      if (f.customerId !== undefined) q.where('o.customer_id', f.customerId);
      if (f.dueFrom) q.where('o.due_date', '>=', f.dueFrom);
      if (f.dueTo) q.where('o.due_date', '<=', f.dueTo);
      if (f.query) {
        const like = `%${f.query.toLowerCase()}%`;
        const n = /^\d+$/.test(f.query) ? Number(f.query) : null;
        q.where((w) => {
          w.whereRaw('lower(c.name) like ?', [like]).orWhereRaw('lower(w.name) like ?', [like]).orWhereRaw('lower(p.name) like ?', [like]);
          if (n !== null) w.orWhere('o.number', n);
        });
      }
      if (f.sort === 'due') q.orderBy([{ column: 'o.due_date' }, { column: 'o.number' }]);
      else if (f.sort === 'updated') q.orderBy([{ column: 'o.updated_at', order: 'desc' }, { column: 'o.id', order: 'desc' }]);
      else q.orderBy('o.number', 'desc');
      return q.limit(f.limit);
    },
    inShop: (id: number, shopId: number, q: Knex = db) => listed(q).where({ 'o.id': id, 'o.shop_id': shopId }).first() as Promise<ListedOrderRow | undefined>,
    byId: (id: number, q: Knex = db) => listed(q).where('o.id', id).first() as Promise<ListedOrderRow | undefined>,
    async nextNumber(q: Knex, shopId: number): Promise<number> {
      const row = await q('orders').where({ shop_id: shopId }).max<{ n: number | null }>('number as n').first();
      // Numbers start at 1001 so an order number never reads like a quantity.
      return Math.max(1000, Number(row?.n ?? 1000)) + 1;
    },
    async insert(q: Knex, row: Omit<OrderRow, 'id'>): Promise<number> {
      const [r] = await q('orders').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    update: (q: Knex, id: number, patch: Partial<OrderRow>) => q('orders').where({ id }).update(patch),

    record: (q: Knex, e: NewOrderEvent) =>
      q('order_events').insert({ ...e, by_label: e.by_label ?? '', from_stage: e.from_stage ?? null, to_stage: e.to_stage ?? null, detail: JSON.stringify(e.detail ?? {}) }),
    /** Newest first. */
    events: (orderId: number) =>
      db('order_events as e').leftJoin('users as u', 'u.id', 'e.user_id').where('e.order_id', orderId).orderBy('e.id', 'desc').select<OrderEventRow[]>('e.*', 'u.name as user_name'),

    logPrint: (q: Knex, row: { order_id: number; user_id: number; paper: string; at: number }) => q('order_prints').insert(row),
    prints: (orderId: number) =>
      db('order_prints as p')
        .leftJoin('users as u', 'u.id', 'p.user_id')
        .where('p.order_id', orderId)
        .orderBy('p.id', 'desc')
        .select<{ id: number; user_id: number | null; user_name: string | null; paper: string; at: number }[]>('p.*', 'u.name as user_name'),
  };
}
export type OrdersRepository = ReturnType<typeof createOrdersRepository>;
