// Export and import of the pattern file (shared/schemas/pattern-file.ts).
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, collarWithGirth, type ShopWorld } from '../helpers/shop-world.ts';

let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  t = await createTestApp({ env: { IMPORT_LIMIT_KB: '64' } });
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

async function exported() {
  await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec: collarWithGirth(345), note: 'up a size' }).expect(201);
  const res = await request(t.app).get(`/api/patterns/${w.collar.pattern.id}/export`).set('Cookie', w.maker.cookie).expect(200);
  return res;
}
const counts = async () => ({
  patterns: Number((await t.db('patterns').count({ n: '*' }).first())!.n),
  revisions: Number((await t.db('revisions').count({ n: '*' }).first())!.n),
});
const upload = (cookie: string, body: string | Buffer, name = 'juniper.latchet.json') =>
  request(t.app).post('/api/patterns/import').set('Cookie', cookie).attach('file', Buffer.from(body), { filename: name, contentType: 'application/json' });

describe('export', () => {
  it('when a pattern is exported, then the file carries the format, version and every revision in order', async () => {
    const res = await exported();
    expect(res.headers['content-disposition']).toBe('attachment; filename="juniper-s-collar.latchet.json"');
    expect(res.body).toMatchObject({ format: 'latchet-pattern', formatVersion: 1, pattern: { name: "Juniper's collar", kind: 'collar', tags: ['dog', 'order-1043'] } });
    expect(res.body.revisions.map((r: { number: number; note: string }) => [r.number, r.note])).toEqual([[1, 'First cut for Juniper'], [2, 'up a size']]);
    expect(res.body.revisions[1].spec.girthMm).toBe(345);
  });
});

describe('import', () => {
  it('when another shop imports the file, then it gets a new pattern with the same numbered history', async () => {
    const file = (await exported()).body;
    const res = await upload(w.outsider.cookie, JSON.stringify(file)).expect(201);
    expect(res.body.pattern).toMatchObject({ name: "Juniper's collar", headNumber: 2 });
    expect(res.body.pattern.id).not.toBe(w.collar.pattern.id);
    const history = await request(t.app).get(`/api/patterns/${res.body.pattern.id}/revisions`).set('Cookie', w.outsider.cookie).expect(200);
    expect(history.body.items.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    expect(res.body.head.spec).toEqual(file.revisions[1].spec);
  });

  // The file is JSON the test reshapes freely; typing each shape would hide the intent.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  const broken: Array<[string, (f: Record<string, any>) => unknown, string]> = [
    ['the format is wrong', (f) => ({ ...f, format: 'something-else' }), 'format'],
    ['the version is from the future', (f) => ({ ...f, formatVersion: 2 }), 'formatVersion'],
    ['a revision number skips', (f) => ({ ...f, revisions: [f.revisions[0], { ...f.revisions[1], number: 3 }] }), 'revisions.1.number'],
    ['a spec has a negative girth', (f) => ({ ...f, revisions: [f.revisions[0], { ...f.revisions[1], spec: { ...f.revisions[1].spec, girthMm: -1 } }] }), 'revisions.1.spec.girthMm'],
    ['the pattern name is missing', (f) => ({ ...f, pattern: { ...f.pattern, name: undefined } }), 'pattern.name'],
    ['there are no revisions', (f) => ({ ...f, revisions: [] }), 'revisions'],
  ];
  for (const [what, mutate, field] of broken) {
    it(`when ${what}, then 400 names ${field} and nothing is created`, async () => {
      const file = (await exported()).body;
      const before = await counts();
      const res = await upload(w.maker.cookie, JSON.stringify(mutate(file))).expect(400);
      expect(res.body.error.fields).toHaveProperty(field);
      expect(await counts()).toEqual(before);
    });
  }

  it('when the upload is not JSON, then 400 names file', async () => {
    const res = await upload(w.maker.cookie, '{"format": "latchet-pattern", ').expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['file']);
  });

  it('when the upload is larger than IMPORT_LIMIT_KB, then 413 names file and nothing is created', async () => {
    const before = await counts();
    const res = await upload(w.maker.cookie, 'x'.repeat(65 * 1024)).expect(413);
    expect(res.body.error.fields).toHaveProperty('file');
    expect(await counts()).toEqual(before);
  });

  it('when no file is sent, or it is sent under another field name, then 400 names file', async () => {
    await request(t.app).post('/api/patterns/import').set('Cookie', w.maker.cookie).field('note', 'x').expect(400);
    const res = await request(t.app).post('/api/patterns/import').set('Cookie', w.maker.cookie).attach('upload', Buffer.from('{}'), 'p.json').expect(400);
    expect(res.body.error.fields).toHaveProperty('file');
  });
});
