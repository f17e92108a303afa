// The role x route matrix, generated from the permission table (shared/schemas/permissions.ts):
// every action, for owner, maker and apprentice of the shop, the owner of another shop, and
// an anonymous visitor. Allowed -> 2xx; not signed in -> 401; wrong role -> 403; another
// shop's object -> 404 (never 403).
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PERMISSIONS, can, type Action, type Actor } from '@shared/schemas/permissions.ts';
import { newToken, tokenHash } from '../../server/modules/invites/tokens.ts';
import { revisionEtag } from '../../server/modules/revisions/etag.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { pollJob, postJob } from '../helpers/print-jobs.ts';
import { buildWorld, collarWithGirth, type Member, type ShopWorld } from '../helpers/shop-world.ts';
import { ORDER_SAMPLES } from '../helpers/order-samples.ts';

type Who = Exclude<Actor, 'anonymous'> | 'outsider' | 'anonymous';
const WHO: Who[] = ['owner', 'maker', 'apprentice', 'outsider', 'anonymous'];

/** What a sample request targets: an object of the main shop, the asker's own shop, or a public token. */
type Scope = 'pattern' | 'shop' | 'public';
interface Sample {
  path: string;
  body?: unknown;
  headers?: Record<string, string>;
  attach?: { field: string; content: string | Buffer; filename: string };
}
type Ctx = { t: TestApp; w: ShopWorld; who: Who; me: Member | null };

let extraMembers = 0;
async function extraMember(t: TestApp, w: ShopWorld): Promise<number> {
  extraMembers += 1;
  const [u] = await t.db('users').insert({ email: `extra${extraMembers}@harrowfinch.example`, name: `Extra ${extraMembers}`, password_hash: 'x', created_at: Date.now() }).returning<{ id: number }[]>('id');
  await t.db('memberships').insert({ shop_id: w.shopId, user_id: u!.id, role: 'apprentice', created_at: Date.now() });
  return u!.id;
}
async function shareToken({ t, w }: Ctx): Promise<{ token: string; id: number }> {
  const res = await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/share`).set('Cookie', w.maker.cookie).send({}).expect(201);
  return { token: res.body.share.token, id: res.body.share.id };
}
async function inviteToken(t: TestApp, from: Member, email: string): Promise<{ token: string; id: number }> {
  const before = t.mailbox.messages().length;
  const res = await request(t.app).post('/api/shop/invites').set('Cookie', from.cookie).send({ email, role: 'apprentice' }).expect(201);
  const mail = await t.mailbox.waitFor((m) => m.id > before && m.recipients.includes(email));
  return { token: /\/invite\/([A-Za-z0-9_-]{43})/.exec(mail.text)![1]!, id: res.body.invite.id };
}
/** An invite written straight to the database (accepting ends the asker's old session, so
 * the inviting owner's cookie must not be needed afterwards). */
async function inviteRow(t: TestApp, shopId: number, email: string): Promise<string> {
  const token = newToken();
  await t.db('invites').insert({ shop_id: shopId, email, role: 'apprentice', token_hash: tokenHash(token), invited_by: null, expires_at: Date.now() + 3_600_000, created_at: Date.now() });
  return token;
}
const headEtag = async ({ t, w }: Ctx) => {
  const p = await t.db('patterns').where({ id: w.collar.pattern.id }).first();
  return revisionEtag(p.id, p.head_number);
};
const pid = (c: Ctx) => c.w.collar.pattern.id;
/** A print job of the main shop's collar, started by its maker (settled when `settled`). */
async function memberJob({ t, w }: Ctx, settled = false): Promise<string> {
  const job = await postJob(t.app, `/api/patterns/${w.collar.pattern.id}/revisions/1/print-jobs`, {}, w.maker.cookie);
  if (settled) await pollJob(t.app, job.url, w.maker.cookie, 20);
  return job.url;
}
/** A print job started through a share link (settled when `settled`). */
async function shareJob(c: Ctx, settled = false): Promise<string> {
  const job = await postJob(c.t.app, `/api/s/${(await shareToken(c)).token}/print-jobs`);
  if (settled) await pollJob(c.t.app, job.url, undefined, 20);
  return job.url;
}

/** One request per action that succeeds for an allowed actor. */
const SAMPLES: Record<Action, { scope: Scope; make: (c: Ctx) => Promise<Sample> }> = {
  'patterns.list': { scope: 'shop', make: async () => ({ path: '/api/patterns' }) },
  'patterns.create': { scope: 'shop', make: async () => ({ path: '/api/patterns', body: { name: 'Bosun lead', kind: 'collar', spec: collarWithGirth(400) } }) },
  'patterns.import': {
    scope: 'shop',
    make: async ({ w }) => ({
      path: '/api/patterns/import',
      attach: {
        field: 'file',
        filename: 'p.latchet.json',
        content: JSON.stringify({ format: 'latchet-pattern', formatVersion: 1, exportedAt: new Date().toISOString(), pattern: { name: 'Imported', kind: 'collar' }, revisions: [{ number: 1, spec: w.collar.head.spec, engineVersion: '1.0.0', createdAt: new Date().toISOString() }] }),
      },
    }),
  },
  'patterns.read': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}` }) },
  'patterns.update': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}`, body: { tags: ['dog', 'reviewed'] } }) },
  'patterns.duplicate': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/duplicate`, body: {} }) },
  'patterns.export': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/export` }) },
  'patterns.compare': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/compare?from=1&to=1` }) },
  'patterns.activity': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/activity` }) },
  'patterns.follow': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/follow` }) },
  'patterns.unfollow': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/follow` }) },
  'revisions.list': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions` }) },
  'revisions.read': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions/1` }) },
  'revisions.create': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions`, body: { spec: collarWithGirth(350), note: 'matrix' }, headers: { 'If-Match': await headEtag(c) } }) },
  'revisions.restore': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions/1/restore` }) },
  'print.pdf': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions/1/pdf` }) },
  'print.svg': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions/1/svg` }) },
  'print.cutter': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions/1/cutter.svg` }) },
  'print.jobs.create': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions/1/print-jobs`, body: { paper: 'a4' } }) },
  'print.jobs.read': { scope: 'pattern', make: async (c) => ({ path: await memberJob(c) }) },
  'print.jobs.file': { scope: 'pattern', make: async (c) => ({ path: `${await memberJob(c, true)}/file` }) },
  'print.trial': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/trial-print`, body: { spec: collarWithGirth(360), basedOn: 1, options: { paper: 'letter' } } }) },
  'print.thumbnail': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/revisions/1/thumbnail.svg` }) },
  'share.list': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/shares` }) },
  'share.create': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/share`, body: { revision: 1 } }) },
  'share.revoke': { scope: 'pattern', make: async (c) => ({ path: `/api/share/${(await shareToken(c)).id}` }) },
  'share.view': { scope: 'public', make: async (c) => ({ path: `/api/s/${(await shareToken(c)).token}` }) },
  'share.pdf': { scope: 'public', make: async (c) => ({ path: `/api/s/${(await shareToken(c)).token}/pdf` }) },
  'share.svg': { scope: 'public', make: async (c) => ({ path: `/api/s/${(await shareToken(c)).token}/svg` }) },
  'share.cutter': { scope: 'public', make: async (c) => ({ path: `/api/s/${(await shareToken(c)).token}/cutter.svg` }) },
  'share.jobs.create': { scope: 'public', make: async (c) => ({ path: `/api/s/${(await shareToken(c)).token}/print-jobs`, body: {} }) },
  'share.jobs.read': { scope: 'public', make: async (c) => ({ path: await shareJob(c) }) },
  'share.jobs.file': { scope: 'public', make: async (c) => ({ path: `${await shareJob(c, true)}/file` }) },
  'members.list': { scope: 'shop', make: async () => ({ path: '/api/shop/members' }) },
  'members.update': { scope: 'pattern', make: async ({ t, w }) => ({ path: `/api/shop/members/${await extraMember(t, w)}`, body: { role: 'maker' } }) },
  'members.remove': { scope: 'pattern', make: async ({ t, w }) => ({ path: `/api/shop/members/${await extraMember(t, w)}` }) },
  'invites.list': { scope: 'shop', make: async () => ({ path: '/api/shop/invites' }) },
  'invites.create': { scope: 'shop', make: async () => ({ path: '/api/shop/invites', body: { email: `new-${randomBytes(4).toString('hex')}@harrowfinch.example`, role: 'maker' } }) },
  'invites.revoke': { scope: 'pattern', make: async ({ t, w }) => ({ path: `/api/shop/invites/${(await inviteToken(t, w.owner, `gone-${randomBytes(4).toString('hex')}@x.example`)).id}` }) },
  'invites.view': { scope: 'public', make: async ({ t, w }) => ({ path: `/api/invites/${(await inviteToken(t, w.owner, `look-${randomBytes(4).toString('hex')}@x.example`)).token}` }) },
  'invites.accept': {
    scope: 'public',
    make: async ({ t, w, who, me }) => {
      // Signed-in askers accept an invite to their own address from the shop they are not in.
      if (me) {
        const shopId = who === 'outsider' ? w.shopId : w.outsider.shopId;
        return { path: `/api/invites/${await inviteRow(t, shopId, me.email)}/accept`, body: {} };
      }
      return { path: `/api/invites/${await inviteRow(t, w.shopId, `anon-${randomBytes(4).toString('hex')}@x.example`)}/accept`, body: { name: 'Wren Adler', password: 'waxed-thread-44' } };
    },
  },
  'shops.list': { scope: 'shop', make: async () => ({ path: '/api/me/shops' }) },
  // Switching to the shop one acts for already is allowed (it starts a new session; each
  // actor calls once per world, so the ended session is not needed again).
  'shops.switch': { scope: 'shop', make: async ({ me }) => ({ path: '/api/me/shop', body: { shopId: me?.shopId ?? 1 } }) },
  'settings.read': { scope: 'shop', make: async () => ({ path: '/api/me/settings' }) },
  'settings.update': { scope: 'shop', make: async () => ({ path: '/api/me/settings', body: { notifyOnFollowedRevisions: false } }) },
  'devmail.read': { scope: 'shop', make: async () => ({ path: '/api/dev/mail' }) },
  ...ORDER_SAMPLES,
  'standards.read': { scope: 'shop', make: async () => ({ path: '/api/shop/standards' }) },
  'standards.update': { scope: 'shop', make: async () => ({ path: '/api/shop/standards', body: { units: 'mm', hardware: [{ id: 'd-ring-1in', kind: 'd-ring', name: '1 in D-ring', insideWidthMm: 25.4, unitCostCents: 120 }] } }) },
  'standards.start': { scope: 'shop', make: async () => ({ path: '/api/shop/standards/start/collar' }) },
};

/** The status family the table says `who` gets for `action`. */
function expected(action: Action, who: Who): '2xx' | 401 | 403 | 404 {
  const role: Actor = who === 'outsider' ? 'owner' : who;
  if (!can(role, action)) return who === 'anonymous' ? 401 : 403;
  if (who === 'outsider' && SAMPLES[action].scope === 'pattern') return 404;
  return '2xx';
}

it('when the permission table is read, then every action has a sample request here', () => {
  expect(Object.keys(SAMPLES).sort()).toEqual(Object.keys(PERMISSIONS).sort());
});

for (const action of Object.keys(PERMISSIONS) as Action[]) {
  const { method, path } = PERMISSIONS[action];
  describe(`${action} (${method} /api${path})`, () => {
    let t: TestApp;
    let w: ShopWorld;
    let revisionsBefore: unknown[];
    beforeAll(async () => {
      // Every actor's sample may start a print job; the queue bound is not what this tests.
      t = await createTestApp({ env: { AUTH_RATE_LIMIT: '1000' }, deps: { printJobs: { maxPending: 50, maxPendingPerOwner: 50 } } });
      w = await buildWorld(t);
      revisionsBefore = await t.db('revisions').orderBy('id');
    });
    afterAll(async () => {
      await t.close();
    });
    for (const who of WHO) {
      const want = expected(action, who);
      it(`when ${who} calls it, then ${want === '2xx' ? 'it succeeds' : `it gets ${want}`}`, async () => {
        const me = who === 'anonymous' ? null : who === 'outsider' ? w.outsider : w[who];
        const s = await SAMPLES[action].make({ t, w, who, me });
        let req = request(t.app)[method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete'](s.path);
        if (me) req = req.set('Cookie', me.cookie);
        for (const [k, v] of Object.entries(s.headers ?? {})) req = req.set(k, v);
        if (s.attach) req = req.attach(s.attach.field, typeof s.attach.content === 'string' ? Buffer.from(s.attach.content) : s.attach.content, s.attach.filename);
        else if (s.body !== undefined) req = req.send(s.body as object);
        const res = await req;
        if (want === '2xx') expect(res.status, JSON.stringify(res.body)).toBeGreaterThanOrEqual(200);
        if (want === '2xx') expect(res.status, JSON.stringify(res.body)).toBeLessThan(300);
        else expect(res.status, JSON.stringify(res.body)).toBe(want);
        if (action === 'patterns.list' && who === 'outsider') expect(res.body.items).toEqual([]);
      });
    }
    it('when every actor has called it, then every revision saved before is unchanged', async () => {
      const after = await t.db('revisions').orderBy('id');
      expect(after.slice(0, revisionsBefore.length)).toEqual(revisionsBefore);
    });
  });
}
