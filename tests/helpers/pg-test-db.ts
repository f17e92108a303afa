// Fresh PostgreSQL databases for tests: a copy of a template migrated once per run (CREATE
// DATABASE ... TEMPLATE; faster than running every migration again), and when a test is done
// its database is emptied (rows deleted, ids start at 1 again) and handed to the next test of
// the same worker: copying a database costs several times more.
import pg from 'pg';

/** Name prefix of every test database (the global teardown drops leftovers by it). */
export const TEST_DB_PREFIX = 'latchet_t';
let counter = 0;
/** Emptied databases of this process, by server, ready for the next test. */
const spare = new Map<string, string[]>();

/** `serverUrl` with its database name replaced by `name`. */
export function databaseUrl(serverUrl: string, name: string): string {
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

async function admin<T>(serverUrl: string, work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: databaseUrl(serverUrl, 'postgres') });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

const quoted = (name: string) => `"${name.replace(/"/g, '""')}"`;

/** Creates database `name` (a copy of `template` when given). */
export function createDatabase(serverUrl: string, name: string, template?: string): Promise<void> {
  return admin(serverUrl, async (c) => {
    await c.query(`CREATE DATABASE ${quoted(name)}${template ? ` TEMPLATE ${quoted(template)}` : ''}`);
  });
}

/** Drops database `name`, closing any connection left open to it. */
export function dropDatabase(serverUrl: string, name: string): Promise<void> {
  return admin(serverUrl, async (c) => {
    await c.query(`DROP DATABASE IF EXISTS ${quoted(name)} WITH (FORCE)`);
  });
}

/**
 * Deletes every row of every table but Knex's migration records and restarts the id
 * sequences. With triggers off for this session (replica role: no foreign key checks, no
 * immutability trigger) plain DELETEs on a test's few rows are far cheaper than TRUNCATE, which
 * writes new files for every table and index; TRUNCATE stays the fallback for a non-superuser.
 */
async function empty(url: string): Promise<void> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const { rows } = await client.query<{ kind: string; name: string }>(
      `SELECT 'table' AS kind, quote_ident(tablename) AS name FROM pg_tables WHERE schemaname = 'public' AND tablename NOT LIKE 'knex\\_migrations%'
       UNION ALL SELECT 'sequence', quote_ident(sequencename) FROM pg_sequences WHERE schemaname = 'public' AND sequencename NOT LIKE 'knex\\_migrations%'`,
    );
    const tables = rows.filter((r) => r.kind === 'table').map((r) => r.name);
    const sequences = rows.filter((r) => r.kind === 'sequence').map((r) => r.name);
    if (tables.length === 0) return;
    try {
      await client.query(
        [
          'BEGIN',
          'SET LOCAL session_replication_role = replica',
          ...tables.map((t) => `DELETE FROM ${t}`),
          ...sequences.map((q) => `SELECT setval('${q}', 1, false)`),
          'COMMIT',
        ].join(';\n'),
      );
    } catch {
      await client.query('ROLLBACK').catch(() => undefined);
      await client.query(`TRUNCATE ${tables.join(', ')} RESTART IDENTITY CASCADE`);
    }
  } finally {
    await client.end();
  }
}

/**
 * An empty database at the latest migration level on the server of `serverUrl`: its address,
 * and `release()` to call once nothing is connected to it any more.
 */
export async function freshDatabase(serverUrl: string, template?: string): Promise<{ url: string; release(): Promise<void> }> {
  const pool = spare.get(serverUrl) ?? [];
  spare.set(serverUrl, pool);
  let name = pool.pop();
  if (!name) {
    counter += 1;
    name = `${TEST_DB_PREFIX}${process.pid}_${counter}_${Math.random().toString(36).slice(2, 8)}`;
    await createDatabase(serverUrl, name, template);
  }
  const url = databaseUrl(serverUrl, name);
  const taken = name;
  return {
    url,
    async release() {
      try {
        await empty(url);
        pool.push(taken);
      } catch {
        await dropDatabase(serverUrl, taken);
      }
    },
  };
}

/** Drops every test database on the server (end of run, for a server that outlives it). */
export function dropTestDatabases(serverUrl: string): Promise<void> {
  return admin(serverUrl, async (c) => {
    const { rows } = await c.query<{ datname: string }>('SELECT datname FROM pg_database WHERE starts_with(datname, $1)', [TEST_DB_PREFIX]);
    for (const r of rows) await c.query(`DROP DATABASE IF EXISTS ${quoted(r.datname)} WITH (FORCE)`);
  });
}
