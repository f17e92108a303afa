// Customer proof links of orders: only the token's SHA-256 is stored.
import type { Knex } from 'knex';

export interface ProofRow {
  id: number;
  shop_id: number;
  order_id: number;
  token_hash: string;
  created_by: number | null;
  created_by_name: string | null;
  created_at: number;
  revoked_at: number | null;
  status: 'open' | 'approved' | 'change-requested';
  answered_at: number | null;
  answer_name: string;
  answer_message: string;
}

export function createProofsRepository(db: Knex) {
  const base = (q: Knex = db) => q('proof_links as pl').leftJoin('users as u', 'u.id', 'pl.created_by').select<ProofRow[]>('pl.*', 'u.name as created_by_name');
  return {
    /** Newest first. */
    ofOrder: (orderId: number) => base().where('pl.order_id', orderId).orderBy('pl.id', 'desc'),
    /** The newest live (not revoked) link's status of each order. */
    latestStatus: (orderIds: number[]) =>
      db('proof_links').whereIn('order_id', orderIds).whereNull('revoked_at').orderBy('id').select<{ order_id: number; status: ProofRow['status'] }[]>('order_id', 'status'),
    byTokenHash: (hash: string, q: Knex = db) => base(q).where('pl.token_hash', hash).first() as Promise<ProofRow | undefined>,
    inShop: (id: number, shopId: number, q: Knex = db) => base(q).where({ 'pl.id': id, 'pl.shop_id': shopId }).first() as Promise<ProofRow | undefined>,
    async insert(q: Knex, row: Pick<ProofRow, 'shop_id' | 'order_id' | 'token_hash' | 'created_by' | 'created_at' | 'status'>): Promise<number> {
      const [r] = await q('proof_links').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    revoke: (q: Knex, id: number, now: number) => q('proof_links').where({ id }).whereNull('revoked_at').update({ revoked_at: now }),
    answer: (q: Knex, id: number, patch: Pick<ProofRow, 'status' | 'answered_at' | 'answer_name' | 'answer_message'>) => q('proof_links').where({ id }).whereNull('revoked_at').update(patch),
  };
}
export type ProofsRepository = ReturnType<typeof createProofsRepository>;
