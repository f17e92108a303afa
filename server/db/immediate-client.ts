// A Knex client for better-sqlite3 whose transactions start with BEGIN IMMEDIATE.
//
// SQLite's plain BEGIN is deferred: the write lock is taken at the first write, so two
// transactions that both read the head revision and then write can interleave and one dies
// with SQLITE_BUSY half way. BEGIN IMMEDIATE takes the write lock up front, so a
// compare-and-set (read head, check, insert) runs as one unit and waits (busy_timeout)
// instead of failing. Every transaction here is a write transaction; reads need none.
import { createRequire } from 'node:module';
import type { Knex } from 'knex';

const require = createRequire(import.meta.url);
// Knex exposes no typed entry for its dialect classes; these are its own CommonJS files.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type AnyClass = new (...args: any[]) => any;
const ClientBetterSqlite3 = require('knex/lib/dialects/better-sqlite3/index.js') as AnyClass;
const TransactionSqlite = require('knex/lib/dialects/sqlite3/execution/sqlite-transaction.js') as AnyClass;

class ImmediateTransaction extends TransactionSqlite {
  begin(conn: { inTransaction?: boolean } | undefined) {
    return this.query(conn, 'BEGIN IMMEDIATE;');
  }

  // SQLite ends a transaction by itself after some errors (SQLITE_FULL, SQLITE_IOERR,
  // SQLITE_NOMEM: "Response To Errors Within A Transaction" in its docs). Knex's ROLLBACK then
  // fails with "no transaction is active" and that error replaces the real one, so a full
  // disk would look like a bug. When better-sqlite3 says no transaction is open, send a no-op.
  query(conn: { inTransaction?: boolean } | undefined, sql: string, status?: number, value?: unknown) {
    const alreadyEnded = /^ROLLBACK/i.test(sql) && conn?.inTransaction === false;
    return super.query(conn, alreadyEnded ? 'SELECT 1' : sql, status, value);
  }
}

class ImmediateClient extends ClientBetterSqlite3 {
  transaction(container: unknown, config: unknown, outerTx: unknown) {
    return new ImmediateTransaction(this, container, config, outerTx);
  }
}

/** Pass as Knex's `client` option. */
export const immediateClient = ImmediateClient as unknown as typeof Knex.Client;
