// The few SQL fragments that differ between SQLite and PostgreSQL, in one place, so
// repositories stay portable. Everything else goes through Knex's query and schema builders.
import type { Knex } from 'knex';

/** True when `db` talks to PostgreSQL. */
export function isPostgres(db: Knex): boolean {
  return db.client.dialect === 'postgresql';
}

/** `column` (a JSON array of strings stored as text) contains `value`. */
export function jsonArrayHas(db: Knex, column: string, value: string): Knex.Raw {
  return isPostgres(db)
    ? db.raw('EXISTS (SELECT 1 FROM jsonb_array_elements_text(??::jsonb) AS e(value) WHERE e.value = ?)', [column, value])
    : db.raw('EXISTS (SELECT 1 FROM json_each(??) WHERE json_each.value = ?)', [column, value]);
}

/** `column` contains `text` anywhere, ignoring case (LIKE wildcards in `text` match literally). */
export function containsIgnoringCase(db: Knex, column: string, text: string): Knex.Raw {
  const pattern = `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  return isPostgres(db)
    ? db.raw("?? ILIKE ? ESCAPE '\\'", [column, pattern])
    : db.raw("?? LIKE ? ESCAPE '\\' COLLATE NOCASE", [column, pattern]);
}

/** Keyset condition: (`column` ignoring case, `idColumn`) comes after (`key`, `id`). */
export function caseFoldedAfter(db: Knex, column: string, idColumn: string, key: string, id: number): Knex.Raw {
  return isPostgres(db)
    ? db.raw('(lower(??), ??) > (lower(?), ?)', [column, idColumn, key, id])
    : db.raw('(?? COLLATE NOCASE, ??) > (?, ?)', [column, idColumn, key, id]);
}

/** ORDER BY `column` ignoring case, then `idColumn`, both ascending. */
export function caseFoldedOrder(db: Knex, column: string, idColumn: string): Knex.Raw {
  return isPostgres(db) ? db.raw('lower(??) ASC, ?? ASC', [column, idColumn]) : db.raw('?? COLLATE NOCASE ASC, ?? ASC', [column, idColumn]);
}
