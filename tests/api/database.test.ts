// The database layer: pragmas on every connection, immediate write transactions, the seed.
import Database from 'better-sqlite3';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { writeTransaction } from '../../server/db/write-transaction.ts';
import { DEMO_SHOP, DEMO_USERS, seed } from '../../db/seeds/01-demo-shop.ts';
import { seed as seedPatterns } from '../../db/seeds/02-demo-patterns.ts';
import { createTestApp, onPostgres, type TestApp } from '../helpers/test-app.ts';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(async () => {
  await t.close();
});

// Checks of SQLite itself skip on PostgreSQL; tests/pg/ has the PostgreSQL counterparts.
describe('connection pragmas', () => {
  it.skipIf(onPostgres())('when a connection is opened, then WAL, foreign keys, busy_timeout 5000 and synchronous FULL are set (SQLite pragma docs: FULL = 2)', async () => {
    const get = async (p: string) => Object.values((await t.db.raw(`PRAGMA ${p}`))[0] as Record<string, unknown>)[0];
    expect(await get('journal_mode')).toBe('wal');
    expect(await get('foreign_keys')).toBe(1);
    expect(await get('busy_timeout')).toBe(5000);
    expect(await get('synchronous')).toBe(2);
  });

  it('when a membership names a missing shop, then the foreign key refuses it', async () => {
    await expect(t.db('memberships').insert({ shop_id: 999, user_id: 999, role: 'owner', created_at: 0 })).rejects.toThrow(/FOREIGN KEY|foreign key constraint/);
  });

  it('when a role outside owner|maker|apprentice is written, then the check constraint refuses it', async () => {
    const [shop] = await t.db('shops').insert({ name: 'Bosun Tack', created_at: 0 }).returning('id');
    const [user] = await t.db('users').insert({ email: 'b@x.example', name: 'B', password_hash: 'x', created_at: 0 }).returning('id');
    await expect(t.db('memberships').insert({ shop_id: shop.id, user_id: user.id, role: 'boss', created_at: 0 })).rejects.toThrow(/CHECK|check constraint/);
  });
});

describe('write transactions', () => {
  it.skipIf(onPostgres())('when a write transaction has begun, then it already holds the write lock before its first write (BEGIN IMMEDIATE)', async () => {
    const other = new Database(t.config.databaseFile);
    other.pragma('busy_timeout = 0');
    try {
      await writeTransaction(t.db, async (trx) => {
        await trx('shops').select('id'); // a read only: a deferred BEGIN would hold no write lock yet
        expect(() => other.prepare("INSERT INTO shops (name, created_at) VALUES ('Juniper Goods', 0)").run()).toThrow(/locked|busy/i);
      });
      other.prepare("INSERT INTO shops (name, created_at) VALUES ('Juniper Goods', 0)").run();
    } finally {
      other.close();
    }
  });
});

describe('demo seed', () => {
  it('when the seed runs twice, then the demo rows exist once and rows of other shops are untouched', async () => {
    const [ownShop] = await t.db('shops').insert({ name: 'Park Strapworks', created_at: 1 }).returning('id');
    await seed(t.db);
    await seed(t.db);
    expect(await t.db('shops').where({ name: DEMO_SHOP }).count({ n: '*' }).first()).toEqual({ n: 1 });
    expect(await t.db('users').whereIn('email', DEMO_USERS.map((u) => u.email)).count({ n: '*' }).first()).toEqual({ n: DEMO_USERS.length });
    const roles = await t.db('memberships as m').join('users as u', 'u.id', 'm.user_id').orderBy('m.created_at').pluck('m.role');
    expect(roles).toEqual(['owner', 'maker', 'apprentice']);
    expect(await t.db('shops').where({ id: ownShop.id }).first()).toMatchObject({ name: 'Park Strapworks' });
  });

  it('when both seeds run twice, then the demo patterns and their revisions exist once, numbered from 1', async () => {
    for (let i = 0; i < 2; i += 1) {
      await seed(t.db);
      await seedPatterns(t.db);
    }
    const patterns = await t.db('patterns').orderBy('name');
    expect(patterns.map((p) => p.name)).toEqual(['Belt, order 1043 (Ed Marsh)', "Juniper's collar", 'Shop stock collars, XS to XL', 'Watch strap, 20 mm lugs']);
    for (const p of patterns) {
      const numbers = await t.db('revisions').where({ pattern_id: p.id }).orderBy('number').pluck('number');
      expect(numbers).toEqual(Array.from({ length: p.head_number }, (_, i) => i + 1));
    }
  });
});
