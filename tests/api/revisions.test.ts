// Patterns and revisions: create, read with ETag, compare-and-set saves (RFC 9110 If-Match,
// RFC 6585 428), restore, immutability.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, collarWithGirth, type ShopWorld } from '../helpers/shop-world.ts';

let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

const path = () => `/api/patterns/${w.collar.pattern.id}`;

describe('creating and reading', () => {
  it('when a maker creates a pattern, then it has revision 1 holding the parsed spec and a strong ETag', async () => {
    expect(w.collar.head.number).toBe(1);
    expect(w.collar.head.spec).toEqual(presetSpec('collar'));
    expect(w.collar.etag).toMatch(/^"[^"]+"$/); // strong: no W/ prefix (RFC 9110, 8.8.3)
    const res = await request(t.app).get(path()).set('Cookie', w.apprentice.cookie).expect(200);
    expect(res.headers.etag).toBe(w.collar.etag);
    expect(res.body.head.author).toEqual({ id: w.maker.id, name: 'Tobias Harrow' });
    expect(res.body.pattern).toMatchObject({ name: "Juniper's collar", kind: 'collar', tags: ['dog', 'order-1043'], archived: false, headNumber: 1 });
  });

  it('when the spec breaks a schema limit, then 400 names the spec field and nothing is created', async () => {
    const res = await request(t.app).post('/api/patterns').set('Cookie', w.maker.cookie).send({ name: 'Bosun lead', kind: 'collar', spec: { ...presetSpec('collar'), girthMm: -5 } }).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['spec.girthMm']);
    expect(await t.db('patterns').count({ n: '*' }).first()).toEqual({ n: 1 });
  });

  it('when kind and spec.kind disagree, then 400 names kind', async () => {
    const res = await request(t.app).post('/api/patterns').set('Cookie', w.maker.cookie).send({ name: 'Odd', kind: 'belt', spec: presetSpec('collar') }).expect(400);
    expect(res.body.error.fields).toHaveProperty('kind');
  });

  it('when another shop asks for the pattern, then 404 (never 403)', async () => {
    const res = await request(t.app).get(path()).set('Cookie', w.outsider.cookie).expect(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('saving a revision', () => {
  const save = (cookie: string, ifMatch: string | undefined, girthMm: number, note = '') => {
    const req = request(t.app).post(`${path()}/revisions`).set('Cookie', cookie);
    if (ifMatch !== undefined) req.set('If-Match', ifMatch);
    return req.send({ spec: collarWithGirth(girthMm), note });
  };

  it('when If-Match is missing, then 428 (RFC 6585, 3) and no revision is added', async () => {
    const res = await save(w.maker.cookie, undefined, 340).expect(428);
    expect(res.body.error.code).toBe('precondition_required');
    await save(w.maker.cookie, '*', 340).expect(428);
    expect(await t.db('revisions').count({ n: '*' }).first()).toEqual({ n: 1 });
  });

  it('when If-Match is the head ETag, then 201 with revision 2 and its new ETag', async () => {
    const res = await save(w.maker.cookie, w.collar.etag, 340, 'Juniper grew').expect(201);
    expect(res.body.revision).toMatchObject({ number: 2, note: 'Juniper grew', restoredFrom: null });
    expect(res.headers.etag).not.toBe(w.collar.etag);
    const head = await request(t.app).get(path()).set('Cookie', w.owner.cookie).expect(200);
    expect(head.headers.etag).toBe(res.headers.etag);
    expect(head.body.head.spec.girthMm).toBe(340);
  });

  it('when If-Match is stale, then 412 carries the current head in the body and its ETag (RFC 9110, 13.1.1)', async () => {
    const first = await save(w.maker.cookie, w.collar.etag, 340).expect(201);
    const res = await save(w.owner.cookie, w.collar.etag, 350).expect(412);
    expect(res.body.error.code).toBe('stale_revision');
    expect(res.body.error.head).toMatchObject({ number: 2, spec: { girthMm: 340 } });
    expect(res.headers.etag).toBe(first.headers.etag);
  });

  it('when 20 saves race on the same base, then exactly one 201 and nineteen 412 and the numbers stay contiguous', async () => {
    const results = await Promise.all(Array.from({ length: 20 }, (_, i) => save(w.maker.cookie, w.collar.etag, 330 + i)));
    const statuses = results.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 412)).toHaveLength(19);
    const numbers = await t.db('revisions').where({ pattern_id: w.collar.pattern.id }).orderBy('number').pluck('number');
    expect(numbers).toEqual([1, 2]);
    // The next save on the winner's ETag continues at 3.
    const winner = results.find((r) => r.status === 201)!;
    await save(w.maker.cookie, String(winner.headers.etag), 360).expect(201);
    expect(await t.db('revisions').where({ pattern_id: w.collar.pattern.id }).orderBy('number').pluck('number')).toEqual([1, 2, 3]);
  });

  it('when an apprentice saves, then 403 and no revision is added', async () => {
    await save(w.apprentice.cookie, w.collar.etag, 340).expect(403);
    expect(await t.db('revisions').count({ n: '*' }).first()).toEqual({ n: 1 });
  });
});

describe('history', () => {
  it('when revision 1 is restored after revision 2, then revision 3 equals 1 and 1 and 2 are unchanged', async () => {
    const r2 = await request(t.app).post(`${path()}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec: collarWithGirth(340), note: 'bigger' }).expect(201);
    const before = await t.db('revisions').where({ pattern_id: w.collar.pattern.id }).orderBy('number');
    const res = await request(t.app).post(`${path()}/revisions/1/restore`).set('Cookie', w.maker.cookie).set('If-Match', String(r2.headers.etag)).expect(201);
    expect(res.body.revision).toMatchObject({ number: 3, restoredFrom: 1, note: 'Restored from revision 1' });
    const r3 = await request(t.app).get(`${path()}/revisions/3`).set('Cookie', w.apprentice.cookie).expect(200);
    expect(r3.body.revision.spec).toEqual(w.collar.head.spec);
    const after = await t.db('revisions').where({ pattern_id: w.collar.pattern.id }).orderBy('number');
    expect(after.slice(0, 2)).toEqual(before);
    const list = await request(t.app).get(`${path()}/revisions`).set('Cookie', w.apprentice.cookie).expect(200);
    expect(list.body.items.map((r: { number: number }) => r.number)).toEqual([3, 2, 1]);
    expect(list.body.items[0]).not.toHaveProperty('spec');
  });

  it('when a pattern is created, saved, restored and renamed, then its activity lists each step with who did it, newest first', async () => {
    const r2 = await request(t.app).post(`${path()}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec: collarWithGirth(340) }).expect(201);
    await request(t.app).post(`${path()}/revisions/1/restore`).set('Cookie', w.owner.cookie).set('If-Match', String(r2.headers.etag)).expect(201);
    await request(t.app).patch(path()).set('Cookie', w.owner.cookie).send({ name: "Juniper's everyday collar" }).expect(200);
    const res = await request(t.app).get(`${path()}/activity`).set('Cookie', w.apprentice.cookie).expect(200);
    expect(res.body.items.map((e: { action: string; by: { name: string } }) => [e.action, e.by.name])).toEqual([
      ['pattern.updated', 'Maren Finch'],
      ['revision.restored', 'Maren Finch'],
      ['revision.saved', 'Tobias Harrow'],
      ['pattern.created', 'Tobias Harrow'],
    ]);
  });

  it('when the database is asked to change or delete a revision, then the triggers refuse', async () => {
    await expect(t.db('revisions').where({ pattern_id: w.collar.pattern.id }).update({ note: 'rewritten' })).rejects.toThrow(/immutable/);
    await expect(t.db('revisions').where({ pattern_id: w.collar.pattern.id }).delete()).rejects.toThrow(/immutable/);
  });

  it('when a client tries to overwrite or delete a revision over HTTP, then no route exists for it and the row is unchanged', async () => {
    const before = await t.db('revisions').where({ pattern_id: w.collar.pattern.id });
    const rev = `${path()}/revisions/1`;
    for (const method of ['put', 'patch', 'delete'] as const) {
      await request(t.app)[method](rev).set('Cookie', w.owner.cookie).send({ spec: collarWithGirth(999), note: 'rewritten' }).expect(404);
    }
    expect(await t.db('revisions').where({ pattern_id: w.collar.pattern.id })).toEqual(before);
  });

  it('when a revision number does not exist or is not a number, then 404', async () => {
    await request(t.app).get(`${path()}/revisions/9`).set('Cookie', w.owner.cookie).expect(404);
    await request(t.app).get(`${path()}/revisions/abc`).set('Cookie', w.owner.cookie).expect(404);
    await request(t.app).post(`${path()}/revisions/9/restore`).set('Cookie', w.owner.cookie).expect(404);
  });
});
