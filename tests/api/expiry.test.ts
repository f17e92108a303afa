// Every lifetime the API enforces, reached by moving a frozen clock (never by sleeping):
// idle and absolute sessions, the sign-in failure window, invite links.
import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp, type TestAppOptions } from '../helpers/test-app.ts';
import { freezeDate } from '../helpers/frozen-date.ts';
import { sessionCookieOf, signUpBody } from '../helpers/accounts.ts';

const HOUR_MS = 3_600_000;
let t: TestApp | undefined;
afterEach(async () => {
  await t?.close();
  t = undefined;
});

async function app(options: TestAppOptions = {}) {
  t = await createTestApp(options);
  return t;
}

async function signUp(a: TestApp) {
  const body = signUpBody();
  const res = await request(a.app).post('/api/auth/sign-up').send(body).expect(201);
  return { body, cookie: sessionCookieOf(res.headers['set-cookie']) };
}

describe('sessions', () => {
  it('when a session is left unused for SESSION_IDLE_HOURS, then it is refused; used a moment before, it stays', async () => {
    const clock = freezeDate();
    const a = await app({ env: { SESSION_IDLE_HOURS: '2', SESSION_ABSOLUTE_HOURS: '720' } });
    const { cookie } = await signUp(a);
    clock.advance(2 * HOUR_MS - 1000);
    await request(a.app).get('/api/me').set('Cookie', cookie).expect(200);
    // The lifetime slides: lucia extends a session used in the second half of its life.
    clock.advance(2 * HOUR_MS - 1000);
    await request(a.app).get('/api/me').set('Cookie', cookie).expect(200);
    clock.advance(2 * HOUR_MS + 1000);
    await request(a.app).get('/api/me').set('Cookie', cookie).expect(401);
  });

  it('when a session in steady use reaches SESSION_ABSOLUTE_HOURS, then it is refused', async () => {
    const clock = freezeDate();
    const a = await app({ env: { SESSION_IDLE_HOURS: '2', SESSION_ABSOLUTE_HOURS: '5' } });
    const { cookie } = await signUp(a);
    for (let i = 0; i < 5; i += 1) {
      clock.advance(HOUR_MS - 1000);
      await request(a.app).get('/api/me').set('Cookie', cookie).expect(200);
    }
    // Exactly 5 h old is still inside the lifetime; a millisecond more is not.
    clock.advance(5000);
    await request(a.app).get('/api/me').set('Cookie', cookie).expect(200);
    clock.advance(1);
    await request(a.app).get('/api/me').set('Cookie', cookie).expect(401);
  });
});

describe('sign-in failure window', () => {
  it('when AUTH_RATE_WINDOW_MINUTES pass after a 429, then sign-in works again; a second before, it is still refused', async () => {
    const clock = freezeDate();
    const a = await app({ env: { AUTH_RATE_LIMIT: '3', AUTH_RATE_WINDOW_MINUTES: '15' } });
    const { body } = await signUp(a);
    const signIn = (password: string) => request(a.app).post('/api/auth/sign-in').send({ email: body.email, password });
    for (let i = 0; i < 3; i += 1) expect((await signIn('wrong-password')).status).toBe(401);
    const refused = await signIn(body.password);
    expect(refused.status).toBe(429);
    expect(refused.headers['retry-after']).toBe(String(15 * 60));
    clock.advance(15 * 60_000 - 1000);
    expect((await signIn(body.password)).status).toBe(429);
    clock.advance(1000);
    expect((await signIn(body.password)).status).toBe(200);
  });
});

describe('invites', () => {
  it('when INVITE_TTL_HOURS is 1, then the link answers 410 invite_expired exactly one hour after it was sent', async () => {
    const clock = freezeDate();
    const a = await app({ env: { INVITE_TTL_HOURS: '1' } });
    const { cookie } = await signUp(a);
    const sent = await request(a.app).post('/api/shop/invites').set('Cookie', cookie).send({ email: 'wren@harrowfinch.example', role: 'apprentice' }).expect(201);
    expect(Date.parse(sent.body.invite.expiresAt)).toBe(clock.now() + HOUR_MS);
    const mail = await a.mailbox.waitFor((m) => m.recipients.includes('wren@harrowfinch.example'));
    const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text)![1]!;
    clock.advance(HOUR_MS - 1);
    await request(a.app).get(`/api/invites/${token}`).expect(200);
    clock.advance(1);
    const late = await request(a.app).post(`/api/invites/${token}/accept`).send({ name: 'Wren Adler', password: 'waxed-thread-44' }).expect(410);
    expect(late.body.error.code).toBe('invite_expired');
    const listed = await request(a.app).get('/api/shop/invites').set('Cookie', cookie).expect(200);
    expect(listed.body.items[0].expired).toBe(true);
  });
});
