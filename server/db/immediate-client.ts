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
  begin(conn: unknown) {
    return this.query(conn, 'BEGIN IMMEDIATE;');
  }
}

class ImmediateClient extends ClientBetterSqlite3 {
  transaction(container: unknown, config: unknown, outerTx: unknown) {
    return new ImmediateTransaction(this, container, config, outerTx);
  }
}

/** Pass as Knex's `client` option. */
export const immediateClient = ImmediateClient as unknown as typeof Knex.Client;
