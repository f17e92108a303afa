// PostgreSQL counterparts of the checks of SQLite itself in tests/api/database.test.ts: the
// one-writer lock, every migration down and up again, and column types that hold our values.
// Runs only in the vitest project `postgres` (a throwaway cluster, tests/pg/global-setup.ts).
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { WRITE_LOCK_KEY } from '../../server/db/locking-pg-client.ts';
import { writeTransaction } from '../../server/db/write-transaction.ts';
import { MIGRATIONS } from '../../server/db/migration-source.ts';
import { migrationLevel } from '../../server/db/migration-level.ts';
import { createTestApp, onPostgres, type TestApp } from '../helpers/test-app.ts';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(async () => {
  await t.close();
});

/** Transactions waiting for the write lock right now (PostgreSQL docs, 54.12 pg_locks). */
async function waitingForWriteLock(): Promise<number> {
  // An advisory lock on one bigint key shows its high and low 32 bits as classid and objid.
  const rows = await t.db.raw<{ rows: Array<{ n: number }> }>(
    "SELECT count(*) AS n FROM pg_locks WHERE locktype = 'advisory' AND NOT granted AND classid::bigint = ? AND objid::bigint = ?",
    [Math.floor(WRITE_LOCK_KEY / 2 ** 32), WRITE_LOCK_KEY % 2 ** 32],
  );
  return rows.rows[0]!.n;
}

describe('the test database', () => {
  it('when the postgres project runs, then createTestApp gives a PostgreSQL database', async () => {
    expect(onPostgres()).toBe(true);
    const { rows } = await t.db.raw<{ rows: Array<{ v: string }> }>("SELECT current_setting('server_version_num') AS v");
    expect(Number(rows[0]!.v)).toBeGreaterThanOrEqual(130000); // DROP DATABASE ... WITH (FORCE) needs 13
  });
});

describe('write transactions', () => {
  it('when a write transaction has begun, then a second one waits for it before its first statement (the BEGIN IMMEDIATE equivalent)', async () => {
    const order: string[] = [];
    let releaseFirst!: () => void;
    const firstMayEnd = new Promise<void>((resolve) => (releaseFirst = resolve));
    let firstStarted!: () => void;
    const firstHasLock = new Promise<void>((resolve) => (firstStarted = resolve));

    const first = writeTransaction(t.db, async (trx) => {
      await trx('shops').select('id'); // a read only: plain BEGIN would lock nothing yet
      firstStarted();
      await firstMayEnd;
      await trx('shops').insert({ name: 'Juniper Goods', created_at: 1 });
      order.push('first commits');
    });
    await firstHasLock;
    const second = writeTransaction(t.db, async (trx) => {
      order.push('second runs');
      return trx('shops').count<{ n: number }[]>({ n: '*' }).first();
    });
    // Condition, not a clock: either PostgreSQL reports the second transaction queued, or
    // (without the lock) the second one finishes while the first is still open.
    let settled = false;
    const queued = (async () => {
      while (!settled && (await waitingForWriteLock()) === 0) await new Promise((r) => setImmediate(r));
      return 'second waits';
    })();
    const outcome = await Promise.race([queued, second.then(() => 'second ran while the first was open')]);
    settled = true;
    if (outcome !== 'second waits') releaseFirst(); // end the first before failing, so close() does not hang
    expect(outcome).toBe('second waits');
    expect(order).toEqual([]);
    releaseFirst();
    await first;
    expect(await second).toEqual({ n: 1 }); // it saw the first one's row: it ran after
    expect(order).toEqual(['first commits', 'second runs']);
  });

  it('when a write transaction throws, then its rows are gone and the lock is free for the next', async () => {
    await expect(
      writeTransaction(t.db, async (trx) => {
        await trx('shops').insert({ name: 'Half Done', created_at: 1 });
        throw new Error('refused');
      }),
    ).rejects.toThrow('refused');
    await writeTransaction(t.db, (trx) => trx('shops').insert({ name: 'Next One', created_at: 2 }));
    expect(await t.db('shops').orderBy('id').pluck('name')).toEqual(['Next One']);
  });
});

describe('migrations', () => {
  it('when every migration is rolled back and applied again, then the level is the same and no table is left over', async () => {
    expect(await migrationLevel(t.db)).toMatchObject({ level: MIGRATIONS.length, pending: 0 });
    await t.db.migrate.rollback(undefined, true);
    const tables = await t.db('information_schema.tables').where({ table_schema: 'public' }).pluck('table_name');
    expect(tables.filter((n) => !n.startsWith('knex_migrations')).sort()).toEqual([]);
    await t.db.migrate.latest();
    expect(await migrationLevel(t.db)).toMatchObject({ level: MIGRATIONS.length, pending: 0 });
  });

  it('when the schema is read, then every *_at column is bigint, since Date.now() overflows a 32-bit integer', async () => {
    const narrow = await t.db('information_schema.columns')
      .where({ table_schema: 'public' })
      .andWhereLike('column_name', '%\\_at')
      .whereNot('data_type', 'bigint')
      .select('table_name', 'column_name', 'data_type');
    expect(narrow).toEqual([]);
  });

  it('when a time or a count is read, then it comes back as a number, as SQLite gives it (node-postgres reads int8 as text by default)', async () => {
    await t.db('shops').insert({ name: 'Bosun Tack Co.', created_at: 1_796_342_400_000 });
    expect(await t.db('shops').select('created_at').first()).toEqual({ created_at: 1_796_342_400_000 });
    expect(await t.db('shops').count({ n: '*' }).first()).toEqual({ n: 1 });
  });
});

describe('test databases', () => {
  it('when earlier tests of this file wrote shops, then this test still starts empty and ids start again at 1', async () => {
    expect(await t.db('shops').count({ n: '*' }).first()).toEqual({ n: 0 });
    const [shop] = await t.db('shops').insert({ name: 'Juniper Goods', created_at: 1 }).returning<{ id: number }[]>('id');
    expect(shop!.id).toBe(1);
  });
});
