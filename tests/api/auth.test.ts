// Accounts and sessions over HTTP (supertest on createApp, a fresh database per test).
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { sessionCookieOf, signUpAgent, signUpBody } from '../helpers/accounts.ts';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp({ env: { AUTH_RATE_LIMIT: '20' } });
});
afterEach(async () => {
  await t.close();
});

describe('sign-up', () => {
  it('when a new maker signs up, then the user owns a new shop and /api/me says so', async () => {
    const { agent, me, body } = await signUpAgent(t.app);
    expect(me.role).toBe('owner');
    expect(me.shop.name).toBe(body.shopName);
    const res = await agent.get('/api/me').expect(200);
    expect(res.body).toEqual(me);
    const member = await t.db('memberships').where({ user_id: me.user.id, shop_id: me.shop.id }).first();
    expect(member.role).toBe('owner');
  });

  it('when the password is stored, then it is an Argon2id hash with m=19456, t=2, p=1 (OWASP Password Storage Cheat Sheet)', async () => {
    const { me } = await signUpAgent(t.app);
    const row = await t.db('users').where({ id: me.user.id }).first();
    expect(row.password_hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });

  it('when the same e-mail signs up twice (in other letter case), then the second gets 409 naming email', async () => {
    const body = signUpBody();
    await request(t.app).post('/api/auth/sign-up').send(body).expect(201);
    const res = await request(t.app).post('/api/auth/sign-up').send({ ...body, email: body.email.toUpperCase() }).expect(409);
    expect(res.body.error.code).toBe('email_taken');
    expect(res.body.error.fields).toHaveProperty('email');
    expect(await t.db('users').count({ n: '*' }).first()).toEqual({ n: 1 });
  });

  it('when the session cookie is set, then it is HttpOnly, SameSite=Lax and not Secure over plain HTTP', async () => {
    const res = await request(t.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('latchet_session='))!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
  });

  it('when the request arrived over HTTPS behind a trusted proxy, then the cookie is Secure', async () => {
    const proxied = await createTestApp({ env: { TRUST_PROXY: '1' } });
    try {
      const res = await request(proxied.app).post('/api/auth/sign-up').set('X-Forwarded-Proto', 'https').send(signUpBody()).expect(201);
      expect(String(res.headers['set-cookie'])).toMatch(/Secure/);
    } finally {
      await proxied.close();
    }
  });
});

describe('sign-in and sign-out', () => {
  it('when the right password is given, then a new session starts and the earlier one ends', async () => {
    const { agent, body } = await signUpAgent(t.app);
    const first = await request(t.app).post('/api/auth/sign-in').send({ email: body.email, password: body.password }).expect(200);
    const firstCookie = sessionCookieOf(first.headers['set-cookie']);
    const second = await request(t.app).post('/api/auth/sign-in').set('Cookie', firstCookie).send({ email: body.email, password: body.password }).expect(200);
    const secondCookie = sessionCookieOf(second.headers['set-cookie']);
    expect(secondCookie).not.toBe(firstCookie);
    await request(t.app).get('/api/me').set('Cookie', firstCookie).expect(401);
    await request(t.app).get('/api/me').set('Cookie', secondCookie).expect(200);
    await agent.get('/api/me').expect(200);
  });

  it('when the e-mail is unknown or the password wrong, then both get the same 401 answer', async () => {
    const { body } = await signUpAgent(t.app);
    const wrong = await request(t.app).post('/api/auth/sign-in').send({ email: body.email, password: 'not-the-password' }).expect(401);
    const unknown = await request(t.app).post('/api/auth/sign-in').send({ email: 'nobody@harrowfinch.example', password: 'not-the-password' }).expect(401);
    expect(unknown.body).toEqual(wrong.body);
  });

  it('when a signed-out session cookie is replayed, then the API answers 401', async () => {
    const res = await request(t.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
    const cookie = sessionCookieOf(res.headers['set-cookie']);
    await request(t.app).post('/api/auth/sign-out').set('Cookie', cookie).expect(204);
    const replay = await request(t.app).get('/api/me').set('Cookie', cookie).expect(401);
    expect(replay.body.error.code).toBe('unauthenticated');
    await request(t.app).post('/api/auth/sign-out').set('Cookie', cookie).expect(401);
  });

  it('when a session is older than SESSION_ABSOLUTE_HOURS, then it is refused however recently used', async () => {
    const res = await request(t.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
    const cookie = sessionCookieOf(res.headers['set-cookie']);
    await request(t.app).get('/api/me').set('Cookie', cookie).expect(200);
    const id = cookie.split('=')[1];
    await t.db('sessions').where({ id }).update({ created_at: Date.now() - t.config.sessionAbsoluteMs - 1000 });
    await request(t.app).get('/api/me').set('Cookie', cookie).expect(401);
    expect(await t.db('sessions').where({ id }).first()).toBeUndefined();
  });

  it('when 20 sign-ins in a row fail, then the next one gets 429 even with the right password', async () => {
    const { body } = await signUpAgent(t.app);
    for (let i = 0; i < 20; i += 1) {
      await request(t.app).post('/api/auth/sign-in').send({ email: body.email, password: `wrong-${i}-password` }).expect(401);
    }
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: body.email, password: body.password }).expect(429);
    expect(res.body.error.code).toBe('rate_limited');
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('when a sign-in succeeds between failures, then the failure count starts again', async () => {
    const small = await createTestApp({ env: { AUTH_RATE_LIMIT: '3' } });
    try {
      const { body } = await signUpAgent(small.app);
      const fail = () => request(small.app).post('/api/auth/sign-in').send({ email: body.email, password: 'wrong-password' });
      for (let i = 0; i < 3; i += 1) expect((await fail()).status).toBe(401);
      expect((await fail()).status).toBe(429);
    } finally {
      await small.close();
    }
    const again = await createTestApp({ env: { AUTH_RATE_LIMIT: '3' } });
    try {
      const { body } = await signUpAgent(again.app);
      const fail = () => request(again.app).post('/api/auth/sign-in').send({ email: body.email, password: 'wrong-password' });
      await fail();
      await fail();
      await request(again.app).post('/api/auth/sign-in').send({ email: body.email, password: body.password }).expect(200);
      for (let i = 0; i < 3; i += 1) expect((await fail()).status).toBe(401);
    } finally {
      await again.close();
    }
  });
});

describe('sign-up rate limit', () => {
  it('when sign-ups keep failing past AUTH_RATE_LIMIT, then the next one gets 429', async () => {
    const small = await createTestApp({ env: { AUTH_RATE_LIMIT: '2' } });
    try {
      const body = signUpBody();
      await request(small.app).post('/api/auth/sign-up').send(body).expect(201);
      await request(small.app).post('/api/auth/sign-up').send(body).expect(409);
      await request(small.app).post('/api/auth/sign-up').send({ ...body, email: 'bad' }).expect(400);
      const res = await request(small.app).post('/api/auth/sign-up').send(signUpBody()).expect(429);
      expect(res.body.error.code).toBe('rate_limited');
    } finally {
      await small.close();
    }
  });
});

describe('cross-site requests', () => {
  it('when a POST carries a foreign Origin, then it gets 403 and nothing is created', async () => {
    const res = await request(t.app).post('/api/auth/sign-up').set('Origin', 'https://evil.example').send(signUpBody()).expect(403);
    expect(res.body.error.code).toBe('foreign_origin');
    expect(await t.db('users').count({ n: '*' }).first()).toEqual({ n: 0 });
  });

  it('when a POST carries the public origin or its own host, then it passes', async () => {
    await request(t.app).post('/api/auth/sign-up').set('Origin', t.config.publicOrigin).send(signUpBody()).expect(201);
    // Same-origin by Host: what the Vite dev proxy forwards (Host and Origin both localhost:5173).
    await request(t.app).post('/api/auth/sign-up').set('Host', 'workshop.local:5173').set('Origin', 'http://workshop.local:5173').send(signUpBody()).expect(201);
    await request(t.app).post('/api/auth/sign-up').set('Host', 'workshop.local:5173').set('Origin', 'http://workshop.local:6000').send(signUpBody()).expect(403);
  });
});
