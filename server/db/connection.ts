// Opens the database through Knex: the SQLite file by default (our pragmas, immediate
// transactions), or PostgreSQL when given a postgres:// address (config DATABASE_URL).
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import knex, { type Knex } from 'knex';
import { immediateClient } from './immediate-client.ts';
import { lockingPgClient } from './locking-pg-client.ts';
import { migrationSource } from './migration-source.ts';
import { pgTypes } from './pg-types.ts';
import { afterCreate } from './pragmas.ts';

/** Where the data lives: a SQLite file path or a postgres:// address. */
export type DatabaseTarget = string | { databaseFile: string; databaseUrl?: string | undefined };

const PG_URL = /^postgres(ql)?:\/\//;

function targetOf(target: DatabaseTarget): string {
  return typeof target === 'string' ? target : (target.databaseUrl ?? target.databaseFile);
}

/** Knex settings for `target` (a SQLite file is created with its folder when missing). */
export function knexConfig(target: DatabaseTarget): Knex.Config {
  const where = targetOf(target);
  if (PG_URL.test(where)) {
    return {
      client: lockingPgClient,
      connection: { connectionString: where, types: pgTypes },
      // Writers queue on one advisory lock (locking-pg-client.ts); readers use the rest.
      pool: { min: 0, max: 10 },
      migrations: { migrationSource },
    };
  }
  const filename = resolve(where);
  mkdirSync(dirname(filename), { recursive: true });
  return {
    client: immediateClient,
    connection: { filename },
    useNullAsDefault: true,
    // One connection: SQLite has one writer anyway, and the pool then queues requests in
    // order instead of letting them contend for the file lock.
    pool: { min: 1, max: 1, afterCreate },
    migrations: { migrationSource },
  };
}

/** Open the database at `target` (a file, a postgres:// address, or the config's choice). */
export function openDb(target: DatabaseTarget): Knex {
  return knex(knexConfig(target));
}

/** `target` for logs: the file, or the address without its password. */
export function describeDatabase(target: DatabaseTarget): string {
  const where = targetOf(target);
  if (!PG_URL.test(where)) return where;
  const url = new URL(where);
  if (url.password) url.password = '***';
  return url.toString();
}

/** Bring the schema to the latest migration; returns the names applied now. */
export async function migrateLatest(db: Knex): Promise<string[]> {
  const [, applied] = (await db.migrate.latest()) as [number, string[]];
  return applied;
}
