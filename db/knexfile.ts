// Knex CLI settings (`npm run db:migrate|db:rollback|db:seed`, run through tsx), on the SQLite
// file or, with DATABASE_URL, on PostgreSQL. The CLI switches into db/, so paths are resolved
// from the repository root here.
import { fileURLToPath } from 'node:url';
import { resolve } from 'node:path';
import { knexConfig } from '../server/db/connection.ts';

const root = fileURLToPath(new URL('..', import.meta.url));
// DATABASE_URL (postgres://...) wins over DATABASE_FILE, as in the server's config.
const target = process.env.DATABASE_URL || resolve(root, process.env.DATABASE_FILE || 'data/latchet.sqlite3');
const base = knexConfig(target);

export default {
  ...base,
  // The CLI reads the folder so `migrate:make` works; the names it records are the file
  // names, the same ones server/db/migration-source.ts reports.
  migrations: { directory: resolve(root, 'db/migrations'), extension: 'ts', loadExtensions: ['.ts'] },
  seeds: { directory: resolve(root, 'db/seeds'), extension: 'ts', loadExtensions: ['.ts'] },
};
