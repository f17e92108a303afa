// The migrations, imported statically. Knex cannot load .ts migration files by itself
// outside the tsx-run CLI, and a static list also works inside vitest and bundles. Each
// name is the file name the CLI records in knex_migrations, so both ways agree on the level.
import type { Knex } from 'knex';
import * as accounts from '../../db/migrations/20261202023500_accounts.ts';
import * as patternLibrary from '../../db/migrations/20261202041000_pattern_library.ts';
import * as shopStandards from '../../db/migrations/20261203114000_shop_standards.ts';
import * as orders from '../../db/migrations/20261203115500_orders.ts';
import * as measureLinkRevoke from '../../db/migrations/20261203150500_measure_link_revoke.ts';

interface Migration {
  up(knex: Knex): Promise<void>;
  down(knex: Knex): Promise<void>;
}

/** Every migration in order, keyed by its file name in db/migrations. */
export const MIGRATIONS: ReadonlyArray<readonly [name: string, migration: Migration]> = [
  ['20261202023500_accounts.ts', accounts],
  ['20261202041000_pattern_library.ts', patternLibrary],
  ['20261203114000_shop_standards.ts', shopStandards],
  ['20261203115500_orders.ts', orders],
  ['20261203150500_measure_link_revoke.ts', measureLinkRevoke],
];

/** Knex `migrations.migrationSource` over {@link MIGRATIONS}. */
export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => MIGRATIONS.map(([name]) => name),
  getMigrationName: (name) => name,
  getMigration: async (name) => {
    const found = MIGRATIONS.find(([n]) => n === name);
    if (!found) throw new Error(`unknown migration ${name}`);
    return found[1];
  },
};
