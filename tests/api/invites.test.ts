// Members and invites by e-mail, through the fake SMTP server.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, WORLD_PASSWORD, type ShopWorld } from '../helpers/shop-world.ts';
import { sessionCookieOf } from '../helpers/accounts.ts';

let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

/** Sends an invite as the owner and returns the token from the link in the received mail. */
async function invite(email: string, role: 'owner' | 'maker' | 'apprentice' = 'apprentice') {
  const res = await request(t.app).post('/api/shop/invites').set('Cookie', w.owner.cookie).send({ email, role }).expect(201);
  const mail = await t.mailbox.waitFor((m) => m.recipients.includes(email));
  const link = /https?:\/\/\S+\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!link) throw new Error(`no invite link in: ${mail.text}`);
  return { res, mail, token: link[1]! };
}

describe('invites', () => {
  it('when the owner invites an apprentice, then the mail arrives with a link that signs up once', async () => {
    const { res, mail, token } = await invite('wren@harrowfinch.example');
    expect(res.body).toMatchObject({ invite: { email: 'wren@harrowfinch.example', role: 'apprentice', shopName: 'Harrow & Finch Leatherworks' }, mail: 'sent' });
    expect(mail.subject).toContain('Harrow & Finch Leatherworks');
    expect(mail.html).toContain(`/invite/${token}`);
    const look = await request(t.app).get(`/api/invites/${token}`).expect(200);
    expect(look.body).toMatchObject({ accountExists: false, invite: { role: 'apprentice', invitedBy: 'Maren Finch' } });

    const accepted = await request(t.app).post(`/api/invites/${token}/accept`).send({ name: 'Wren Adler', password: 'waxed-thread-44' }).expect(201);
    expect(accepted.body).toMatchObject({ user: { email: 'wren@harrowfinch.example', name: 'Wren Adler' }, shop: { id: w.shopId }, role: 'apprentice' });
    const cookie = sessionCookieOf(accepted.headers['set-cookie']);
    await request(t.app).get(`/api/patterns/${w.collar.pattern.id}`).set('Cookie', cookie).expect(200);

    const again = await request(t.app).post(`/api/invites/${token}/accept`).send({ name: 'Someone Else', password: 'waxed-thread-44' }).expect(410);
    expect(again.body.error.code).toBe('invite_used');
    await request(t.app).get(`/api/invites/${token}`).expect(410);
  });

  it('when the invite has passed its expiry, then its link answers 410 invite_expired', async () => {
    const { token } = await invite('late@harrowfinch.example');
    await t.db('invites').update({ expires_at: Date.now() - 1 });
    const res = await request(t.app).post(`/api/invites/${token}/accept`).send({ name: 'Late', password: 'waxed-thread-44' }).expect(410);
    expect(res.body.error.code).toBe('invite_expired');
    expect(await t.db('users').where({ email: 'late@harrowfinch.example' }).first()).toBeUndefined();
  });

  it('when someone with an account in another shop accepts with their password, then they join and act for the new shop', async () => {
    const { token } = await invite(w.outsider.email, 'maker');
    expect((await request(t.app).get(`/api/invites/${token}`).expect(200)).body.accountExists).toBe(true);
    await request(t.app).post(`/api/invites/${token}/accept`).send({ password: 'wrong-password-1' }).expect(401);
    const res = await request(t.app).post(`/api/invites/${token}/accept`).send({ password: WORLD_PASSWORD }).expect(200);
    expect(res.body).toMatchObject({ shop: { id: w.shopId }, role: 'maker' });
  });

  it('when a member of two shops signs in, then they land in the first and can switch to the other', async () => {
    const { token } = await invite(w.outsider.email, 'maker');
    await request(t.app).post(`/api/invites/${token}/accept`).send({ password: WORLD_PASSWORD }).expect(200);
    const signIn = await request(t.app).post('/api/auth/sign-in').send({ email: w.outsider.email, password: WORLD_PASSWORD }).expect(200);
    expect(signIn.body.shop.name).toBe('Bosun Tack Co.');
    const cookie = sessionCookieOf(signIn.headers['set-cookie']);
    const shops = await request(t.app).get('/api/me/shops').set('Cookie', cookie).expect(200);
    expect(shops.body.items.map((s: { name: string; role: string }) => [s.name, s.role])).toEqual([['Bosun Tack Co.', 'owner'], ['Harrow & Finch Leatherworks', 'maker']]);
    const switched = await request(t.app).post('/api/me/shop').set('Cookie', cookie).send({ shopId: w.shopId }).expect(200);
    expect(switched.body).toMatchObject({ shop: { id: w.shopId }, role: 'maker' });
    await request(t.app).get('/api/me').set('Cookie', cookie).expect(401);
    const next = sessionCookieOf(switched.headers['set-cookie']);
    await request(t.app).get(`/api/patterns/${w.collar.pattern.id}`).set('Cookie', next).expect(200);
    await request(t.app).post('/api/me/shop').set('Cookie', next).send({ shopId: 9999 }).expect(404);
  });

  it('when a signed-in member of another address opens the link, then 403 and the invite stays usable', async () => {
    const { token } = await invite('pip@harrowfinch.example');
    const res = await request(t.app).post(`/api/invites/${token}/accept`).set('Cookie', w.maker.cookie).expect(403);
    expect(res.body.error.code).toBe('invite_for_other_email');
    await request(t.app).get(`/api/invites/${token}`).expect(200);
  });

  it('when a new person accepts without name or password, then 400 names both', async () => {
    const { token } = await invite('bare@harrowfinch.example');
    const res = await request(t.app).post(`/api/invites/${token}/accept`).send({}).expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['name', 'password']);
  });

  it('when an existing member is invited again, then 409 names email and no mail is sent', async () => {
    const res = await request(t.app).post('/api/shop/invites').set('Cookie', w.owner.cookie).send({ email: w.maker.email, role: 'owner' }).expect(409);
    expect(res.body.error.fields).toHaveProperty('email');
    expect(t.mailbox.messages()).toHaveLength(0);
  });

  it('when the owner revokes an invite, then its link answers 404', async () => {
    const { token, res } = await invite('gone@harrowfinch.example');
    await request(t.app).delete(`/api/shop/invites/${res.body.invite.id}`).set('Cookie', w.owner.cookie).expect(204);
    await request(t.app).get(`/api/invites/${token}`).expect(404);
    await request(t.app).get('/api/invites/not-a-token').expect(404);
  });
});

describe('members', () => {
  it('when the only owner would be demoted or removed, then 409 last_owner', async () => {
    const demote = await request(t.app).patch(`/api/shop/members/${w.owner.id}`).set('Cookie', w.owner.cookie).send({ role: 'maker' }).expect(409);
    expect(demote.body.error.code).toBe('last_owner');
    await request(t.app).delete(`/api/shop/members/${w.owner.id}`).set('Cookie', w.owner.cookie).expect(409);
    await request(t.app).patch(`/api/shop/members/${w.maker.id}`).set('Cookie', w.owner.cookie).send({ role: 'owner' }).expect(200);
    await request(t.app).patch(`/api/shop/members/${w.owner.id}`).set('Cookie', w.owner.cookie).send({ role: 'maker' }).expect(200);
  });

  it('when a member is removed, then their session ends at once and their next request is 401', async () => {
    await request(t.app).get('/api/me').set('Cookie', w.apprentice.cookie).expect(200);
    await request(t.app).delete(`/api/shop/members/${w.apprentice.id}`).set('Cookie', w.owner.cookie).expect(204);
    await request(t.app).get('/api/me').set('Cookie', w.apprentice.cookie).expect(401);
    const list = await request(t.app).get('/api/shop/members').set('Cookie', w.maker.cookie).expect(200);
    expect(list.body.items.map((m: { name: string }) => m.name)).toEqual(['Maren Finch', 'Tobias Harrow']);
  });

  it('when a role changes, then the member\'s next request already uses it', async () => {
    await request(t.app).patch(`/api/shop/members/${w.apprentice.id}`).set('Cookie', w.owner.cookie).send({ role: 'maker' }).expect(200);
    const me = await request(t.app).get('/api/me').set('Cookie', w.apprentice.cookie).expect(200);
    expect(me.body.role).toBe('maker');
  });

  it('when a member of another shop is named, then 404', async () => {
    await request(t.app).patch(`/api/shop/members/${w.outsider.id}`).set('Cookie', w.owner.cookie).send({ role: 'maker' }).expect(404);
    await request(t.app).delete(`/api/shop/members/${w.outsider.id}`).set('Cookie', w.owner.cookie).expect(404);
  });
});

describe('notifications and the dev mailbox', () => {
  const save = (cookie: string, etag: string, note: string) =>
    request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', cookie).set('If-Match', etag).send({ spec: { ...w.collar.head.spec, girthMm: 345 }, note });

  it('when a revision is saved, then followers (not the author) get a mail with the note and a link', async () => {
    await request(t.app).put(`/api/patterns/${w.collar.pattern.id}/follow`).set('Cookie', w.apprentice.cookie).expect(200);
    await save(w.owner.cookie, w.collar.etag, 'Juniper is up a hole').expect(201);
    await t.flushMail();
    const got = t.mailbox.messages();
    // The maker created the pattern (follows it); the apprentice chose to; the owner saved.
    expect(got.map((m) => m.recipients[0]).sort()).toEqual([w.apprentice.email, w.maker.email].sort());
    expect(got[0]!.text).toContain('Juniper is up a hole');
    expect(got[0]!.text).toMatch(new RegExp(`/patterns/${w.collar.pattern.id}/revisions/2`));
  });

  it('when a follower turns the setting off, then they get no mail', async () => {
    await request(t.app).patch('/api/me/settings').set('Cookie', w.maker.cookie).send({ notifyOnFollowedRevisions: false }).expect(200);
    expect((await request(t.app).get('/api/me/settings').set('Cookie', w.maker.cookie).expect(200)).body).toEqual({ settings: { notifyOnFollowedRevisions: false } });
    await save(w.owner.cookie, w.collar.etag, 'quiet').expect(201);
    await t.flushMail();
    expect(t.mailbox.messages()).toHaveLength(0);
  });

  it('when an owner opens the dev mailbox, then every received message is listed with clickable links; others get 403', async () => {
    await invite('mailbox@harrowfinch.example');
    const json = await request(t.app).get('/api/dev/mail').set('Cookie', w.owner.cookie).expect(200);
    expect(json.body.messages).toHaveLength(1);
    await request(t.app).get('/api/dev/mail').set('Cookie', w.maker.cookie).expect(403);
    const page = await request(t.app).get('/dev/mail').set('Cookie', w.owner.cookie).expect(200);
    expect(page.text).toMatch(/<a href="http[^"]+\/invite\/[A-Za-z0-9_-]{43}">/);
    await request(t.app).get('/dev/mail').expect(302);
  });

  it('when the app runs in production, then the dev mailbox does not exist', async () => {
    const prod = await createTestApp({ env: { NODE_ENV: 'production', PUBLIC_ORIGIN: 'https://patterns.harrowfinch.example' } });
    try {
      const pw = await buildWorld(prod);
      await request(prod.app).get('/api/dev/mail').set('Cookie', pw.owner.cookie).expect(404);
    } finally {
      await prod.close();
    }
  });
});
