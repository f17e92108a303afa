// Where the schema stands: applied and pending migrations (for /api/health and start-up).
import type { Knex } from 'knex';

export interface MigrationLevel {
  /** Number of applied migrations. */
  level: number;
  /** File name of the last applied migration, or null on an empty database. */
  latest: string | null;
  pending: number;
}

export async function migrationLevel(db: Knex): Promise<MigrationLevel> {
  const [completed, pending] = (await db.migrate.list()) as [Array<{ name: string } | string>, unknown[]];
  const names = completed.map((m) => (typeof m === 'string' ? m : m.name));
  return { level: names.length, latest: names.at(-1) ?? null, pending: pending.length };
}
