// Measuring links e-mailed to customers: only the token's SHA-256 is stored; a link works
// once, until it expires, and until the shop withdraws it.
import type { Knex } from 'knex';

export interface MeasureLinkRow {
  id: number;
  shop_id: number;
  order_id: number;
  token_hash: string;
  email: string;
  message: string;
  created_by: number | null;
  created_at: number;
  expires_at: number;
  answered_at: number | null;
  measurement_id: number | null;
  revoked_at: number | null;
}

export function createMeasureLinksRepository(db: Knex) {
  return {
    ofOrder: (orderId: number) => db<MeasureLinkRow>('measure_links').where({ order_id: orderId }).orderBy('id', 'desc'),
    byTokenHash: (hash: string, q: Knex = db) => q<MeasureLinkRow>('measure_links').where({ token_hash: hash }).first(),
    inShop: (id: number, shopId: number, q: Knex = db) => q<MeasureLinkRow>('measure_links').where({ id, shop_id: shopId }).first(),
    async insert(q: Knex, row: Omit<MeasureLinkRow, 'id' | 'answered_at' | 'measurement_id' | 'revoked_at'>): Promise<number> {
      const [r] = await q('measure_links').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    /** Marks the link used; 0 when another answer got there first or the shop withdrew it. */
    markAnswered: (q: Knex, id: number, measurementId: number, now: number) =>
      q('measure_links').where({ id }).whereNull('answered_at').whereNull('revoked_at').update({ answered_at: now, measurement_id: measurementId }),
    /** Withdraws an unanswered link; 0 when it was answered or withdrawn already. */
    revoke: (q: Knex, id: number, now: number) => q('measure_links').where({ id }).whereNull('answered_at').whereNull('revoked_at').update({ revoked_at: now }),
  };
}
export type MeasureLinksRepository = ReturnType<typeof createMeasureLinksRepository>;

/** Who hears about a customer's answer: the shop's owners and whoever took the order. */
export function shopRecipients(db: Knex, shopId: number, takenBy: number | null): Promise<{ email: string }[]> {
  return db('users as u')
    .join('memberships as m', 'm.user_id', 'u.id')
    .where('m.shop_id', shopId)
    .where((w) => {
      w.where('m.role', 'owner');
      if (takenBy !== null) w.orWhere('u.id', takenBy);
    })
    .distinct('u.email as email')
    .orderBy('u.email');
}
