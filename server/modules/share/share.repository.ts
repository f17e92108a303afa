// Share link rows: a revision (or the head) of one pattern behind a hashed token.
import type { Knex } from 'knex';

export interface ShareRow {
  id: number;
  pattern_id: number;
  revision_number: number | null;
  created_by: number | null;
  creator_name: string | null;
  created_at: number;
  revoked_at: number | null;
}
export interface ResolvedShare extends ShareRow {
  shop_id: number;
  shop_name: string;
  pattern_name: string;
  pattern_kind: string;
  head_number: number;
}

export function createShareRepository(db: Knex) {
  return {
    async insert(q: Knex, row: { pattern_id: number; revision_number: number | null; token_hash: string; created_by: number; created_at: number }): Promise<number> {
      const [r] = await q('share_links').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    forPattern: (patternId: number) =>
      db('share_links as l')
        .leftJoin('users as u', 'u.id', 'l.created_by')
        .where('l.pattern_id', patternId)
        .whereNull('l.revoked_at')
        .orderBy('l.id', 'desc')
        .select<ShareRow[]>('l.id', 'l.pattern_id', 'l.revision_number', 'l.created_by', 'u.name as creator_name', 'l.created_at', 'l.revoked_at'),
    /** The link if it exists, is not revoked, and its pattern belongs to `shopId`. */
    inShop: (q: Knex, id: number, shopId: number) =>
      q('share_links as l')
        .join('patterns as p', 'p.id', 'l.pattern_id')
        .where({ 'l.id': id, 'p.shop_id': shopId })
        .whereNull('l.revoked_at')
        .first<{ id: number; pattern_id: number } | undefined>('l.id', 'l.pattern_id'),
    revoke: (q: Knex, id: number, now: number) => q('share_links').where({ id }).whereNull('revoked_at').update({ revoked_at: now }),
    /** A live link by token hash, with just enough of its pattern to show one revision. */
    resolve: (hash: string) =>
      db('share_links as l')
        .join('patterns as p', 'p.id', 'l.pattern_id')
        .join('shops as s', 's.id', 'p.shop_id')
        .where('l.token_hash', hash)
        .whereNull('l.revoked_at')
        .first<ResolvedShare | undefined>(
          'l.id',
          'l.pattern_id',
          'l.revision_number',
          'l.created_by',
          'l.created_at',
          'l.revoked_at',
          'p.shop_id',
          's.name as shop_name',
          'p.name as pattern_name',
          'p.kind as pattern_kind',
          'p.head_number',
        ),
  };
}
export type ShareRepository = ReturnType<typeof createShareRepository>;
