// Opens the SQLite database through Knex with our pragmas and immediate transactions.
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import knex, { type Knex } from 'knex';
import { immediateClient } from './immediate-client.ts';
import { migrationSource } from './migration-source.ts';
import { afterCreate } from './pragmas.ts';

/** Knex settings for the database file at `file` (created with its folder when missing). */
export function knexConfig(file: string): Knex.Config {
  const filename = resolve(file);
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

/** Open the database at `file`. */
export function openDb(file: string): Knex {
  return knex(knexConfig(file));
}

/** Bring the schema to the latest migration; returns the names applied now. */
export async function migrateLatest(db: Knex): Promise<string[]> {
  const [, applied] = (await db.migrate.latest()) as [number, string[]];
  return applied;
}
