// Revision rows. Only INSERT and SELECT: the table's triggers refuse UPDATE and DELETE.
import type { Knex } from 'knex';

export interface RevisionRow {
  id: number;
  pattern_id: number;
  number: number;
  spec: string;
  engine_version: string;
  author_id: number | null;
  author_name: string | null;
  note: string;
  restored_from: number | null;
  created_at: number;
}
export type NewRevision = Omit<RevisionRow, 'id' | 'author_name'>;

const COLUMNS = ['r.id', 'r.pattern_id', 'r.number', 'r.engine_version', 'r.author_id', 'u.name as author_name', 'r.note', 'r.restored_from', 'r.created_at'];

export function createRevisionsRepository(db: Knex) {
  const base = (q: Knex, patternId: number) => q('revisions as r').leftJoin('users as u', 'u.id', 'r.author_id').where('r.pattern_id', patternId);
  return {
    insert: (q: Knex, row: NewRevision) => q('revisions').insert(row),
    byNumber: (patternId: number, n: number, q: Knex = db) => base(q, patternId).where('r.number', n).first<RevisionRow | undefined>([...COLUMNS, 'r.spec']),
    /** History newest first, without specs. */
    list: (patternId: number) => base(db, patternId).orderBy('r.number', 'desc').select<Omit<RevisionRow, 'spec'>[]>(COLUMNS),
    /** Every revision with its spec, oldest first (export). */
    all: (patternId: number) => base(db, patternId).orderBy('r.number', 'asc').select<RevisionRow[]>([...COLUMNS, 'r.spec']),
  };
}
export type RevisionsRepository = ReturnType<typeof createRevisionsRepository>;
