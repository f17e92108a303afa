// Bad input to every library route that takes a body or a query: 400 naming the field.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { NOTE_MAX_CHARS, PAGE_LIMIT_MAX } from '@shared/schemas/library.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, collarWithGirth, type ShopWorld } from '../helpers/shop-world.ts';

let t: TestApp;
let w: ShopWorld;
beforeAll(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterAll(async () => {
  await t.close();
});

type Case = [what: string, method: 'get' | 'post' | 'patch', path: () => string, body: unknown, field: string];
const p = () => `/api/patterns/${w.collar.pattern.id}`;
const CASES: Case[] = [
  ['a pattern without a name', 'post', () => '/api/patterns', { kind: 'collar', spec: collarWithGirth(330) }, 'name'],
  ['a pattern of an unknown kind', 'post', () => '/api/patterns', { name: 'X', kind: 'saddle', spec: collarWithGirth(330) }, 'kind'],
  ['a pattern without a spec', 'post', () => '/api/patterns', { name: 'X', kind: 'collar' }, 'spec'],
  ['21 tags', 'post', () => '/api/patterns', { name: 'X', kind: 'collar', spec: collarWithGirth(330), tags: Array.from({ length: 21 }, (_, i) => `t${i}`) }, 'tags'],
  ['a rename to nothing', 'patch', p, { name: '  ' }, 'name'],
  ['an update that changes nothing', 'patch', p, {}, 'name'],
  ['archived as a string', 'patch', p, { archived: 'yes' }, 'archived'],
  [`a note over ${NOTE_MAX_CHARS} characters`, 'post', () => `${p()}/revisions`, { spec: collarWithGirth(330), note: 'n'.repeat(NOTE_MAX_CHARS + 1) }, 'note'],
  ['a revision with a width of 0 mm', 'post', () => `${p()}/revisions`, { spec: { ...collarWithGirth(330), widthMm: 0 } }, 'spec.widthMm'],
  ['a revision of another kind', 'post', () => `${p()}/revisions`, { spec: { ...collarWithGirth(330), kind: 'belt' } }, 'spec.kind'],
  ['a duplicate of revision 0', 'post', () => `${p()}/duplicate`, { revision: 0 }, 'revision'],
  ['a duplicate of revision 9', 'post', () => `${p()}/duplicate`, { revision: 9 }, 'revision'],
  ['a share of revision -1', 'post', () => `${p()}/share`, { revision: -1 }, 'revision'],
  ['a member role "boss"', 'patch', () => `/api/shop/members/${w.maker.id}`, { role: 'boss' }, 'role'],
  ['an invite to a malformed address', 'post', () => '/api/shop/invites', { email: 'ilse', role: 'maker' }, 'email'],
  ['an invite without a role', 'post', () => '/api/shop/invites', { email: 'ilse2@harrowfinch.example' }, 'role'],
  ['a setting as a string', 'patch', () => '/api/me/settings', { notifyOnFollowedRevisions: 'no' }, 'notifyOnFollowedRevisions'],
  ['a library sort "size"', 'get', () => '/api/patterns?sort=size', undefined, 'sort'],
  [`a page limit of ${PAGE_LIMIT_MAX + 1}`, 'get', () => `/api/patterns?limit=${PAGE_LIMIT_MAX + 1}`, undefined, 'limit'],
  ['a forged cursor', 'get', () => '/api/patterns?cursor=bm90LWpzb24', undefined, 'cursor'],
  ['a library kind "saddle"', 'get', () => '/api/patterns?kind=saddle', undefined, 'kind'],
];

describe('bad input to library routes', () => {
  for (const [what, method, path, body, field] of CASES) {
    it(`when ${what} is sent, then 400 names ${field}`, async () => {
      let req = request(t.app)[method](path()).set('Cookie', w.owner.cookie);
      if (method === 'post' && path().endsWith('/revisions')) req = req.set('If-Match', w.collar.etag);
      const res = body === undefined ? await req : await req.send(body as object);
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(Object.keys(res.body.error.fields)).toContain(field);
    });
  }
});

describe('library paging', () => {
  it('when the library is read two at a time sorted by name, then the pages join up in order without repeats', async () => {
    for (const name of ['Bosun harness strap', 'Apron neck strap', 'Camera strap']) {
      await request(t.app).post('/api/patterns').set('Cookie', w.maker.cookie).send({ name, kind: 'collar', spec: collarWithGirth(330) }).expect(201);
    }
    const names: string[] = [];
    let cursor = '';
    for (let i = 0; i < 5; i += 1) {
      const res = await request(t.app).get(`/api/patterns?sort=name&limit=2${cursor ? `&cursor=${cursor}` : ''}`).set('Cookie', w.apprentice.cookie).expect(200);
      names.push(...res.body.items.map((x: { name: string }) => x.name));
      if (!res.body.nextCursor) break;
      cursor = res.body.nextCursor;
    }
    const all = (await t.db('patterns').where({ shop_id: w.shopId, archived: false }).pluck('name')).sort((a, b) => a.localeCompare(b, 'en', { sensitivity: 'base' }));
    expect(names).toEqual(all);
    const found = await request(t.app).get('/api/patterns?query=STRAP&tag=').set('Cookie', w.apprentice.cookie).expect(200);
    expect(found.body.items.map((x: { name: string }) => x.name).sort()).toEqual(['Apron neck strap', 'Bosun harness strap', 'Camera strap']);
    const tagged = await request(t.app).get('/api/patterns?tag=order-1043').set('Cookie', w.apprentice.cookie).expect(200);
    expect(tagged.body.items.map((x: { name: string }) => x.name)).toEqual(["Juniper's collar"]);
  });

  it('when a pattern is archived, then the default library hides it and archived=true shows it', async () => {
    const made = await request(t.app).post('/api/patterns').set('Cookie', w.maker.cookie).send({ name: 'Retired lead', kind: 'collar', spec: collarWithGirth(330) }).expect(201);
    await request(t.app).patch(`/api/patterns/${made.body.pattern.id}`).set('Cookie', w.maker.cookie).send({ archived: true }).expect(200);
    const live = await request(t.app).get('/api/patterns?limit=100').set('Cookie', w.maker.cookie).expect(200);
    expect(live.body.items.map((x: { name: string }) => x.name)).not.toContain('Retired lead');
    const archived = await request(t.app).get('/api/patterns?archived=true').set('Cookie', w.maker.cookie).expect(200);
    expect(archived.body.items.map((x: { name: string }) => x.name)).toEqual(['Retired lead']);
  });
});
