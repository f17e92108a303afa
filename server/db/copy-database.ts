// Copies every row of one Latchet database into another at the same migration level: the
// way a shop moves from the SQLite file to PostgreSQL (README, "Moving to PostgreSQL").
// Tables go parents first (foreign keys are checked on every row), in one write transaction
// on the target, and PostgreSQL's id sequences are moved past the copied ids afterwards.
import type { Knex } from 'knex';
import { isPostgres } from './dialect.ts';
import { migrationLevel } from './migration-level.ts';
import { writeTransaction } from './write-transaction.ts';

/** Knex's own bookkeeping tables: the target has its own from running the migrations. */
const SKIP = new Set(['knex_migrations', 'knex_migrations_lock']);

/** The source's tables (SQLite) with the tables each one references. */
async function sqliteTables(db: Knex): Promise<Map<string, string[]>> {
  const names = (await db('sqlite_master').where({ type: 'table' }).whereNot('name', 'like', 'sqlite_%').pluck('name')) as string[];
  const out = new Map<string, string[]>();
  for (const name of names.filter((n) => !SKIP.has(n))) {
    const fks = (await db.raw(`PRAGMA foreign_key_list(${JSON.stringify(name)})`)) as Array<{ table: string }>;
    out.set(name, [...new Set(fks.map((f) => f.table))].filter((t) => t !== name));
  }
  return out;
}

/** Parents before children. */
function parentsFirst(tables: Map<string, string[]>): string[] {
  const done: string[] = [];
  const visit = (name: string, path: string[]) => {
    if (done.includes(name)) return;
    if (path.includes(name)) throw new Error(`foreign keys form a cycle: ${[...path, name].join(' -> ')}`);
    for (const parent of tables.get(name) ?? []) if (tables.has(parent)) visit(parent, [...path, name]);
    done.push(name);
  };
  for (const name of [...tables.keys()].sort()) visit(name, []);
  return done;
}

/** Moves a PostgreSQL serial `id` sequence past the highest copied id, so new rows do not collide. */
async function continueIds(trx: Knex.Transaction, table: string): Promise<void> {
  if (!(await trx.schema.hasColumn(table, 'id'))) return;
  const seq = (await trx.raw<{ rows: Array<{ seq: string | null }> }>('SELECT pg_get_serial_sequence(?, ?) AS seq', [table, 'id'])).rows[0]?.seq;
  if (!seq) return; // a text id (sessions), no sequence
  const top = (await trx(table).max({ m: 'id' }).first()) as { m: number | null } | undefined;
  if (top?.m != null) await trx.raw('SELECT setval(?::regclass, ?)', [seq, top.m]);
}

export interface CopyReport {
  tables: Array<{ table: string; rows: number }>;
}

/**
 * Copy all rows from `source` (SQLite) into `target`, which must be migrated to the same level
 * and hold no rows yet. Nothing is written to the target unless every table copies.
 */
export async function copyDatabase(source: Knex, target: Knex): Promise<CopyReport> {
  const [from, to] = await Promise.all([migrationLevel(source), migrationLevel(target)]);
  if (from.latest !== to.latest || from.pending > 0 || to.pending > 0) {
    throw new Error(`both databases must be fully migrated to the same level (source: ${from.latest}, target: ${to.latest}); run the migrations on both first`);
  }
  const order = parentsFirst(await sqliteTables(source));
  for (const table of order) {
    const row = await target(table).first();
    if (row) throw new Error(`the target already has rows in ${table}; copy only into a freshly migrated database`);
  }
  const report: CopyReport = { tables: [] };
  await writeTransaction(target, async (trx) => {
    for (const table of order) {
      const rows = (await source(table).select('*')) as Array<Record<string, unknown>>;
      const columns = Object.keys(rows[0] ?? {}).length || 1;
      // PostgreSQL takes at most 65,535 parameters per statement.
      const perBatch = Math.max(1, Math.floor(60_000 / columns));
      for (let i = 0; i < rows.length; i += perBatch) await trx(table).insert(rows.slice(i, i + perBatch));
      report.tables.push({ table, rows: rows.length });
    }
    if (isPostgres(target)) for (const table of order) await continueIds(trx, table);
  });
  return report;
}
