// A Knex client for PostgreSQL whose transactions take one shop-wide write lock first.
//
// On SQLite every transaction begins IMMEDIATE (immediate-client.ts): one writer at a time,
// so read-check-write sequences (the revision compare-and-set, "is this the last owner?",
// "is the invite still open?") never interleave. PostgreSQL's default READ COMMITTED lets
// two such transactions read the same head and both insert the next number, and one dies on
// the unique index. Taking the same transaction-scoped advisory lock at BEGIN gives the same
// one-writer semantics without touching any repository; it is released at COMMIT/ROLLBACK.
// Plain reads take no lock and run in parallel on the pool's other connections.
import { createRequire } from 'node:module';
import type { Knex } from 'knex';

const require = createRequire(import.meta.url);
// Knex exposes no typed entry for its dialect classes; these are its own CommonJS files.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type AnyClass = new (...args: any[]) => any;
const ClientPG = require('knex/lib/dialects/postgres/index.js') as AnyClass;
const TransactionPG = require('knex/lib/dialects/postgres/execution/pg-transaction.js') as AnyClass;

/** The advisory lock key every write transaction takes ("LATCH" in ASCII). */
export const WRITE_LOCK_KEY = 0x4c41544348;

class LockingTransaction extends TransactionPG {
  begin(conn: unknown) {
    return super.begin(conn).then(() => this.query(conn, `SELECT pg_advisory_xact_lock(${WRITE_LOCK_KEY});`));
  }
}

class LockingPgClient extends ClientPG {
  transaction(container: unknown, config: unknown, outerTx: unknown) {
    return new LockingTransaction(this, container, config, outerTx);
  }
}

/** Pass as Knex's `client` option. */
export const lockingPgClient = LockingPgClient as unknown as typeof Knex.Client;
