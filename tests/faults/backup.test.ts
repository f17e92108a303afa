// `npm run db:backup` while the server is saving: SQLite's online backup API (through
// better-sqlite3) copies a consistent snapshot; the copy passes PRAGMA integrity_check, holds
// every revision acknowledged before the copy began, numbers them without gaps, and
// `npm run db:restore` puts it back so the server serves it.
import { spawn } from 'node:child_process';
import { closeSync, existsSync, mkdtempSync, openSync, rmSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import request from 'supertest';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import { loadConfig } from '../../server/config.ts';
import { migrateLatest, openDb } from '../../server/db/connection.ts';
import { integrityOf } from '../../server/db/backup.ts';
import { presetSpec } from '@shared/pattern/index.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { sessionCookieOf, signUpBody } from '../helpers/accounts.ts';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
let t: TestApp | undefined;
let dir: string | undefined;
afterEach(async () => {
  await t?.close();
  if (dir) rmSync(dir, { recursive: true, force: true });
  t = undefined;
  dir = undefined;
});

/** Runs an npm script the way a person would, in its own process. */
function npmRun(script: string, args: string[], env: Record<string, string>): Promise<{ code: number | null; out: string }> {
  return new Promise((resolve) => {
    const child = spawn('npm', ['run', '--silent', script, '--', ...args], { cwd: ROOT, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    child.stdout.on('data', (c: Buffer) => (out += c.toString('utf8')));
    child.stderr.on('data', (c: Buffer) => (out += c.toString('utf8')));
    child.on('exit', (code) => resolve({ code, out }));
  });
}

function revisionsIn(file: string, patternId: number): { numbers: number[]; head: number } {
  const db = new Database(file, { readonly: true });
  try {
    const numbers = (db.prepare('SELECT number FROM revisions WHERE pattern_id = ? ORDER BY number').all(patternId) as { number: number }[]).map((r) => r.number);
    const head = (db.prepare('SELECT head_number FROM patterns WHERE id = ?').get(patternId) as { head_number: number }).head_number;
    return { numbers, head };
  } finally {
    db.close();
  }
}

describe('backup and restore', () => {
  it('when db:backup runs while revisions are being saved, then the copy passes integrity_check, has every earlier save without gaps, and db:restore brings it back', async () => {
    t = await createTestApp();
    dir = mkdtempSync(join(tmpdir(), 'latchet-backup-'));
    const live = t.config.databaseFile;
    const app0 = t.app;
    const cookie = sessionCookieOf((await request(app0).post('/api/auth/sign-up').send(signUpBody()).expect(201)).headers['set-cookie']);
    const created = await request(app0).post('/api/patterns').set('Cookie', cookie).send({ name: 'Belt for Tobias Harrow', kind: 'belt', spec: presetSpec('belt') }).expect(201);
    const id = created.body.pattern.id as number;
    let etag = created.headers.etag as string;
    let saved = 1;
    const save = async () => {
      const res = await request(app0).post(`/api/patterns/${id}/revisions`).set('Cookie', cookie).set('If-Match', etag).send({ spec: { ...presetSpec('belt'), girthMm: 800 + saved }, note: `fitting ${saved + 1}` }).expect(201);
      etag = res.headers.etag as string;
      saved = res.body.revision.number as number;
    };
    for (let i = 0; i < 5; i++) await save();
    const beforeBackup = saved;

    // Saves go on the whole time the backup process runs.
    const copy = join(dir, 'copy.sqlite3');
    let running = true;
    const backup = npmRun('db:backup', [copy], { DATABASE_FILE: live }).finally(() => (running = false));
    let during = 0;
    while (running) {
      await save();
      during++;
    }
    const { code, out } = await backup;
    expect(code, out).toBe(0);
    expect(out).toMatch(/integrity_check: ok/);
    expect(during).toBeGreaterThan(0);

    expect(integrityOf(copy)).toBe('ok');
    const inCopy = revisionsIn(copy, id);
    expect(inCopy.numbers).toEqual(Array.from({ length: inCopy.head }, (_, i) => i + 1));
    expect(inCopy.head).toBeGreaterThanOrEqual(beforeBackup);
    expect(inCopy.head).toBeLessThanOrEqual(saved);

    // Restore over another database file (the server stopped), then serve it.
    const target = join(dir, 'restored', 'latchet.sqlite3');
    const other = openDb(target);
    await migrateLatest(other);
    await other.destroy();
    const restored = await npmRun('db:restore', [copy], { DATABASE_FILE: target });
    expect(restored.code, restored.out).toBe(0);
    const keptAs = /kept as (\S+)/.exec(restored.out)?.[1];
    expect(keptAs && existsSync(keptAs)).toBe(true);
    const db = openDb(target);
    try {
      const app = createApp({ db, config: loadConfig({ NODE_ENV: 'test', DATABASE_FILE: target, PORT: '0' }) });
      // Sessions are in the database too: the same cookie works on the restored copy.
      const read = await request(app).get(`/api/patterns/${id}`).set('Cookie', cookie).expect(200);
      expect(read.body.head.number).toBe(inCopy.head);
    } finally {
      await db.destroy();
    }
  });

  it('when the backup file is damaged, then db:restore refuses and leaves the database alone', async () => {
    dir = mkdtempSync(join(tmpdir(), 'latchet-backup-'));
    const bad = join(dir, 'bad.sqlite3');
    const db = new Database(bad);
    db.exec('CREATE TABLE t (x); INSERT INTO t VALUES (1);');
    db.close();
    // Overwrite the 16-byte header string "SQLite format 3\0" and more: no longer a database.
    const fd = openSync(bad, 'r+');
    writeSync(fd, Buffer.from('not a database at all, sorry'), 0, 28, 0);
    closeSync(fd);
    const target = join(dir, 'latchet.sqlite3');
    const res = await npmRun('db:restore', [bad], { DATABASE_FILE: target });
    expect(res.code).toBe(1);
    expect(res.out).toMatch(/restore failed/);
    expect(existsSync(target)).toBe(false);
  });
});
