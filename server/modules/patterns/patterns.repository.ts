// Pattern rows: the library listing (keyset pages), one pattern of a shop, and its changes.
import type { Knex } from 'knex';
import type { ListPatternsQuery } from '@shared/schemas/library.ts';
import { caseFoldedAfter, caseFoldedOrder, containsIgnoringCase, jsonArrayHas } from '../../db/dialect.ts';

export interface PatternRow {
  id: number;
  shop_id: number;
  name: string;
  kind: string;
  tags: string;
  archived: number | boolean;
  head_number: number;
  created_by: number | null;
  created_at: number;
  updated_at: number;
}
export interface ListedRow extends PatternRow {
  head_note: string;
  head_created_at: number;
  head_engine_version: string;
  head_author_id: number | null;
  head_author_name: string | null;
  head_restored_from: number | null;
  /** The head's spec JSON: the card shows its girth or size range (and the thumbnail's revision). */
  head_spec: string;
  following: number;
}
/** Position after the last row of a page: its sort key and id. */
export interface PageCursor {
  key: string | number;
  id: number;
}

export function createPatternsRepository(db: Knex) {
  return {
    async insert(q: Knex, row: Omit<PatternRow, 'id'>): Promise<number> {
      const [r] = await q('patterns').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    /** The pattern if it belongs to `shopId`; another shop's id reads as absent. */
    inShop: (id: number, shopId: number, q: Knex = db) => q<PatternRow>('patterns').where({ id, shop_id: shopId }).first(),
    update: (q: Knex, id: number, fields: Partial<Pick<PatternRow, 'name' | 'tags' | 'archived' | 'updated_at'>>) => q('patterns').where({ id }).update(fields),
    /** Compare-and-set of the head: moves only when it still is `expected`. Returns rows changed. */
    moveHead: (q: Knex, id: number, expected: number, next: number, now: number) =>
      q('patterns').where({ id, head_number: expected }).update({ head_number: next, updated_at: now }),

    /** One page of a shop's library, `limit + 1` rows so the caller knows whether more follow. */
    list(shopId: number, userId: number, f: ListPatternsQuery, after: PageCursor | null): Promise<ListedRow[]> {
      const q = db('patterns as p')
        .join('revisions as r', function () {
          this.on('r.pattern_id', '=', 'p.id').andOn('r.number', '=', 'p.head_number');
        })
        .leftJoin('users as a', 'a.id', 'r.author_id')
        .leftJoin('pattern_follows as f', function () {
          this.on('f.pattern_id', '=', 'p.id').andOn('f.user_id', '=', db.raw('?', [userId]));
        })
        .where('p.shop_id', shopId)
        .select(
          'p.*',
          'r.note as head_note',
          'r.created_at as head_created_at',
          'r.engine_version as head_engine_version',
          'r.author_id as head_author_id',
          'a.name as head_author_name',
          'r.restored_from as head_restored_from',
          'r.spec as head_spec',
          db.raw('f.user_id IS NOT NULL as following'),
        );
      if (f.archived !== 'all') q.where('p.archived', f.archived === 'true');
      if (f.kind) q.where('p.kind', f.kind);
      // Dialect-specific SQL (SQLite or PostgreSQL) comes from server/db/dialect.ts.
      if (f.tag) q.where(jsonArrayHas(db, 'p.tags', f.tag));
      if (f.query) q.where(containsIgnoringCase(db, 'p.name', f.query));
      if (f.sort === 'name') {
        if (after) q.where(caseFoldedAfter(db, 'p.name', 'p.id', String(after.key), after.id));
        q.orderByRaw(caseFoldedOrder(db, 'p.name', 'p.id'));
      } else {
        if (after) q.whereRaw('(p.updated_at, p.id) < (?, ?)', [after.key, after.id]);
        q.orderBy([{ column: 'p.updated_at', order: 'desc' }, { column: 'p.id', order: 'desc' }]);
      }
      return q.limit(f.limit + 1) as unknown as Promise<ListedRow[]>;
    },
  };
}
export type PatternsRepository = ReturnType<typeof createPatternsRepository>;
