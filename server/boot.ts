// What `npm start` and the API half of `npm run dev` share: migrate, seed, listen, print.
import type { Knex } from 'knex';
import type { Config } from './config.ts';
import { migrateLatest, openDb } from './db/connection.ts';
import { migrationLevel } from './db/migration-level.ts';
import { listen, stopOnSignals, type RunningServer } from './index.ts';
import { DEMO_PASSWORD, DEMO_USERS, seed } from '../db/seeds/01-demo-shop.ts';

/** Migrates to the latest level and (re)seeds the demo shop. */
export async function prepareDatabase(config: Config): Promise<Knex> {
  const db = openDb(config.databaseFile);
  const applied = await migrateLatest(db);
  const level = await migrationLevel(db);
  console.log(`database ${config.databaseFile}: ${applied.length} migration(s) applied now, level ${level.level} (${level.latest})`);
  if (config.env !== 'production') await seed(db);
  return db;
}

/** The lines that tell a newcomer how to sign in. */
export function demoSignIns(): string {
  const width = Math.max(...DEMO_USERS.map((u) => u.email.length));
  return [
    `Demo sign-ins (password for all: ${DEMO_PASSWORD})`,
    ...DEMO_USERS.map((u) => `  ${u.email.padEnd(width)}  ${u.role.padEnd(10)} ${u.name}`),
  ].join('\n');
}

/** Prepare the database, listen, and stop cleanly on signals. */
export async function boot(config: Config): Promise<RunningServer> {
  const db = await prepareDatabase(config);
  const running = await listen(config, db);
  stopOnSignals([running.stop]);
  return running;
}
