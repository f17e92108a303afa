// Photos of orders and patterns: rows only; the bytes live in the FileStore under
// storage_key and thumb_key.
import type { Knex } from 'knex';

export interface PhotoRow {
  id: number;
  shop_id: number;
  order_id: number | null;
  pattern_id: number | null;
  storage_key: string;
  thumb_key: string;
  content_type: string;
  byte_size: number;
  width_px: number;
  height_px: number;
  caption: string;
  created_by: number | null;
  created_by_name: string | null;
  created_at: number;
}
export type PhotoOwner = { orderId: number } | { patternId: number };

const whereOwner = (owner: PhotoOwner) => ('orderId' in owner ? { 'ph.order_id': owner.orderId } : { 'ph.pattern_id': owner.patternId });

export function createPhotosRepository(db: Knex) {
  const base = (q: Knex = db) => q('photos as ph').leftJoin('users as u', 'u.id', 'ph.created_by').select<PhotoRow[]>('ph.*', 'u.name as created_by_name');
  return {
    /** Oldest first (the first is the order's thumbnail on the board). */
    list: (owner: PhotoOwner, q: Knex = db) => base(q).where(whereOwner(owner)).orderBy('ph.id'),
    count: async (owner: PhotoOwner, q: Knex = db) => Number((await q('photos as ph').where(whereOwner(owner)).count<{ n: number }[]>('* as n'))[0]!.n),
    one: (owner: PhotoOwner, id: number, q: Knex = db) => base(q).where(whereOwner(owner)).where('ph.id', id).first() as Promise<PhotoRow | undefined>,
    /** The first photo of each order (board thumbnails). */
    firstOfOrders: (orderIds: number[]) => db('photos').whereIn('order_id', orderIds).groupBy('order_id').select<{ order_id: number; id: number }[]>('order_id', db.raw('min(id) as id')),
    async insert(q: Knex, row: Omit<PhotoRow, 'id' | 'created_by_name'>): Promise<number> {
      const [r] = await q('photos').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    remove: (q: Knex, id: number) => q('photos').where({ id }).delete(),
  };
}
export type PhotosRepository = ReturnType<typeof createPhotosRepository>;
