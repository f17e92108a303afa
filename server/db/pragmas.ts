// Pragmas set on every new SQLite connection (Knex pool `afterCreate`).
import type Database from 'better-sqlite3';

/** How long a connection waits for another writer's lock before SQLITE_BUSY, in ms. */
export const BUSY_TIMEOUT_MS = 5000;

/**
 * - journal_mode=WAL: readers never block the writer (the CLI can read while the server saves).
 * - foreign_keys=ON: SQLite leaves them off per connection unless asked.
 * - busy_timeout: wait for a lock instead of failing at once.
 * - synchronous=FULL: in WAL mode NORMAL may lose the last commits on power loss; a saved
 *   revision the maker was told is safe must survive that, so we pay one fsync per commit.
 */
export function applyPragmas(conn: Database.Database): void {
  conn.pragma('journal_mode = WAL');
  conn.pragma('foreign_keys = ON');
  conn.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
  conn.pragma('synchronous = FULL');
}

/** Knex pool hook running {@link applyPragmas}. */
export function afterCreate(conn: Database.Database, done: (err: Error | null, conn: Database.Database) => void): void {
  try {
    applyPragmas(conn);
    done(null, conn);
  } catch (err) {
    done(err as Error, conn);
  }
}
