// The one way to write several rows as a unit. Our Knex client begins every transaction
// IMMEDIATE (see immediate-client.ts), so the write lock is held from the first read.
import type { Knex } from 'knex';

/** Run `work` in one BEGIN IMMEDIATE transaction; commits when it resolves, rolls back when it throws. */
export function writeTransaction<T>(db: Knex, work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
  return db.transaction(work);
}
