// Moving a shop from SQLite to PostgreSQL (server/db/copy-database.ts): every row arrives
// unchanged, ids continue after the copied ones, and a second copy is refused.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Knex } from 'knex';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { seed as seedShop } from '../../db/seeds/01-demo-shop.ts';
import { seed as seedPatterns } from '../../db/seeds/02-demo-patterns.ts';
import { migrateLatest, openDb } from '../../server/db/connection.ts';
import { copyDatabase } from '../../server/db/copy-database.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';

let dir: string;
let sqlite: Knex;
let t: TestApp;
beforeEach(async () => {
  dir = mkdtempSync(join(tmpdir(), 'latchet-copy-'));
  sqlite = openDb(join(dir, 'shop.sqlite3'));
  await migrateLatest(sqlite);
  await seedShop(sqlite);
  await seedPatterns(sqlite);
  t = await createTestApp(); // a fresh PostgreSQL database in this project
});
afterEach(async () => {
  await t.close();
  await sqlite.destroy();
  rmSync(dir, { recursive: true, force: true });
});

const TABLES = ['users', 'shops', 'memberships', 'patterns', 'revisions', 'pattern_follows', 'audit_events'];

describe('copying SQLite into PostgreSQL', () => {
  it('when the demo shop is copied, then every row of every table reads the same on both', async () => {
    const report = await copyDatabase(sqlite, t.db);
    expect(report.tables.find((r) => r.table === 'revisions')?.rows).toBeGreaterThan(0);
    // Parents before children: a row is never inserted before the row it references.
    const at = (name: string) => report.tables.findIndex((r) => r.table === name);
    expect(at('shops')).toBeLessThan(at('patterns'));
    expect(at('patterns')).toBeLessThan(at('revisions'));
    for (const table of TABLES) {
      const order = table === 'memberships' ? ['shop_id', 'user_id'] : table === 'pattern_follows' ? ['pattern_id', 'user_id'] : ['id'];
      const norm = (rows: Array<Record<string, unknown>>) =>
        rows.map((r) => Object.fromEntries(Object.entries(r).map(([k, v]) => [k, typeof v === 'boolean' ? Number(v) : v])));
      expect(norm(await t.db(table).orderBy(order)), table).toEqual(norm(await sqlite(table).orderBy(order)));
    }
  });

  it('when the copied database is used, then new rows get fresh ids and the copied revisions stay immutable', async () => {
    await copyDatabase(sqlite, t.db);
    const top = async (table: string) => (await t.db(table).max({ m: 'id' }).first())!.m as number;
    const [topShop, topUser, topPattern] = [await top('shops'), await top('users'), await top('patterns')];
    const signUp = await request(t.app)
      .post('/api/auth/sign-up')
      .send({ email: 'quinn@bosuntack.example', password: 'bridle-leather-9', name: 'Quinn Abara', shopName: 'Bosun Tack Co.' })
      .expect(201);
    const cookie = signUp.headers['set-cookie']!;
    const created = await request(t.app).post('/api/patterns').set('Cookie', cookie).send({ name: 'Bosun lead', kind: 'collar', spec: presetSpec('collar') }).expect(201);
    expect(signUp.body.shop.id).toBeGreaterThan(topShop);
    expect(signUp.body.user.id).toBeGreaterThan(topUser);
    expect(created.body.pattern.id).toBeGreaterThan(topPattern);
    await expect(t.db('revisions').where('pattern_id', '<=', topPattern).update({ note: 'rewritten' })).rejects.toThrow(/immutable/);
  });

  it('when the target already holds rows, then the copy is refused and nothing is added', async () => {
    await t.db('shops').insert({ name: 'Bosun Tack Co.', created_at: 1 });
    await expect(copyDatabase(sqlite, t.db)).rejects.toThrow(/already has rows in shops/);
    expect(await t.db('shops').count({ n: '*' }).first()).toEqual({ n: 1 });
  });
});
