// Fresh PostgreSQL databases for tests: each one a copy of a template migrated once per run
// (CREATE DATABASE ... TEMPLATE copies files; faster than running every migration again).
import pg from 'pg';

let counter = 0;

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

/** A new, uniquely named database on the server of `serverUrl`; its address and how to drop it. */
export async function freshDatabase(serverUrl: string, template?: string): Promise<{ url: string; drop(): Promise<void> }> {
  counter += 1;
  const name = `latchet_t${process.pid}_${counter}_${Math.random().toString(36).slice(2, 8)}`;
  await createDatabase(serverUrl, name, template);
  return { url: databaseUrl(serverUrl, name), drop: () => dropDatabase(serverUrl, name) };
}
