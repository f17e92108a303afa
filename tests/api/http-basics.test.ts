// The HTTP frame around every route: health, 404, body errors, headers, no stack traces.
import { mkdtempSync, mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { MIGRATIONS } from '../../server/db/migration-source.ts';
import { HttpError } from '../../server/http/http-error.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { signUpBody } from '../helpers/accounts.ts';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(async () => {
  await t.close();
});

describe('health', () => {
  it('when the database is migrated, then /api/health is 200 with the level of the last migration file', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    const files = readdirSync(new URL('../../db/migrations/', import.meta.url)).filter((f) => f.endsWith('.ts')).sort();
    expect(res.body).toEqual({ status: 'ok', database: 'reachable', migration: { level: files.length, latest: files.at(-1), pending: 0 } });
  });

  it('when the static migration list is compared with db/migrations, then they name the same files in the same order', () => {
    const files = readdirSync(new URL('../../db/migrations/', import.meta.url)).filter((f) => f.endsWith('.ts')).sort();
    expect(MIGRATIONS.map(([name]) => name)).toEqual(files);
  });

  it('when the database is closed, then health answers 503 in the error format', async () => {
    await t.db.destroy();
    const res = await request(t.app).get('/api/health').expect(503);
    expect(res.body.error.code).toBe('database_unreachable');
    t = await createTestApp();
  });
});

describe('errors', () => {
  it('when an unknown /api route is asked for, then the answer is a JSON 404', async () => {
    const res = await request(t.app).get('/api/no-such-thing').expect(404).expect('content-type', /json/);
    expect(res.body.error).toMatchObject({ code: 'not_found' });
    await request(t.app).delete('/api/auth/nowhere').expect(404);
  });

  it('when the JSON body is malformed, then 400 malformed_json and no stack trace', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').set('content-type', 'application/json').send('{"email": ').expect(400);
    expect(res.body.error.code).toBe('malformed_json');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+/);
  });

  it('when the body is larger than JSON_LIMIT_KB, then 413', async () => {
    const big = { ...signUpBody(), name: 'x'.repeat(t.config.jsonLimitBytes + 10) };
    const res = await request(t.app).post('/api/auth/sign-up').send(big).expect(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('when the body is not JSON, then 415', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').set('content-type', 'text/plain').send('email=maren').expect(415);
    expect(res.body.error.code).toBe('unsupported_media_type');
  });

  it('when a handler throws an unexpected error, then 500 carries a plain message and no stack or internal text', async () => {
    const logged: unknown[] = [];
    const broken = await createTestApp({ deps: { log: (e) => logged.push(e) } });
    try {
      // Dropping the table makes the sign-up query fail inside the route.
      await broken.db.schema.dropTable('sessions');
      await broken.db.schema.dropTable('memberships');
      const res = await request(broken.app).post('/api/auth/sign-up').send(signUpBody()).expect(500);
      expect(res.body.error.code).toBe('internal');
      expect(JSON.stringify(res.body)).not.toMatch(/memberships|sqlite|stack|\.ts/i);
      expect(logged).toHaveLength(1);
    } finally {
      await broken.close();
    }
  });

  it('when an HttpError is built with fields, then its fields are kept for the handler', () => {
    const e = new HttpError(400, 'invalid_input', 'email is required', { email: 'email is required' });
    expect(e.fields).toEqual({ email: 'email is required' });
  });
});

describe('bad input names the field', () => {
  const cases: Array<[string, string, Record<string, unknown>, string]> = [
    ['sign-up without email', '/api/auth/sign-up', { ...signUpBody(), email: undefined }, 'email'],
    ['sign-up with a malformed email', '/api/auth/sign-up', { ...signUpBody(), email: 'maren-at-harrowfinch' }, 'email'],
    ['sign-up with a 7-character password', '/api/auth/sign-up', { ...signUpBody(), password: 'short77' }, 'password'],
    ['sign-up with a 129-character password', '/api/auth/sign-up', { ...signUpBody(), password: 'p'.repeat(129) }, 'password'],
    ['sign-up with an empty name', '/api/auth/sign-up', { ...signUpBody(), name: '   ' }, 'name'],
    ['sign-up with a 101-character shop name', '/api/auth/sign-up', { ...signUpBody(), shopName: 's'.repeat(101) }, 'shopName'],
    ['sign-up with a number as name', '/api/auth/sign-up', { ...signUpBody(), name: 42 }, 'name'],
    ['sign-in without password', '/api/auth/sign-in', { email: 'maren@harrowfinch.example' }, 'password'],
    ['sign-in with a malformed email', '/api/auth/sign-in', { email: 'maren', password: 'whatever-it-is' }, 'email'],
  ];
  for (const [what, path, body, field] of cases) {
    it(`when ${what}, then 400 names ${field}`, async () => {
      const res = await request(t.app).post(path).send(body).expect(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(Object.keys(res.body.error.fields)).toEqual([field]);
      // The message names the field by its label ("Shop name"), never its key ("shopName").
      expect(res.body.error.message.toLowerCase()).toContain(field.replace(/([A-Z])/g, ' $1').toLowerCase());
      expect(res.body.error.message).not.toMatch(/[a-z][A-Z]/);
    });
  }

  it('when sign-in is sent with no body at all, then 400 names email and password', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });
});

describe('static client', () => {
  it('when a client build exists, then deep links get index.html and /api still answers JSON', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'latchet-client-'));
    mkdirSync(join(dir, 'assets'));
    writeFileSync(join(dir, 'index.html'), '<!doctype html><title>Latchet test shell</title>');
    writeFileSync(join(dir, 'assets', 'app-abc123.js'), 'console.log(1)');
    const withClient = await createTestApp({ deps: { clientDir: dir } });
    try {
      const page = await request(withClient.app).get('/patterns/12/history').expect(200);
      expect(page.text).toContain('Latchet test shell');
      expect(page.headers['content-security-policy']).toContain("default-src 'self'");
      const asset = await request(withClient.app).get('/assets/app-abc123.js').expect(200);
      expect(asset.headers['cache-control']).toContain('immutable');
      await request(withClient.app).get('/assets/missing.js').expect(404);
      await request(withClient.app).get('/api/nope').expect(404).expect('content-type', /json/);
    } finally {
      await withClient.close();
    }
  });
});
