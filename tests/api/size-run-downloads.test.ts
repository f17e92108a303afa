// A pattern's size run (spec.sizes) reaches the print downloads: size=NAME prints that size,
// size=all the whole run, an unknown size is refused naming the field.
import request from 'supertest';
import { PDFDocument } from 'pdf-lib';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, type ShopWorld } from '../helpers/shop-world.ts';

let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

const binary = (req: request.Test) =>
  req.buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  });

const IN = 25.4; // mm per inch, exact (1959 agreement)
const run = ['XS', 'S', 'M', 'L', 'XL'].map((name, i) => ({ name, girthMm: (10 + 2 * i) * IN }));

async function saveRun(): Promise<string> {
  const spec = { ...w.collar.head.spec!, sizes: run };
  await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec, note: 'graded XS-XL' }).expect(201);
  return `/api/patterns/${w.collar.pattern.id}/revisions/2/pdf?paper=letter`;
}

describe('size runs in print downloads', () => {
  it('when one size of a saved run is asked for, then the PDF is that size alone and smaller than the whole run', async () => {
    const base = await saveRun();
    const one = await binary(request(t.app).get(`${base}&size=M`).set('Cookie', w.apprentice.cookie)).expect(200);
    const all = await binary(request(t.app).get(`${base}&size=all`).set('Cookie', w.apprentice.cookie)).expect(200);
    const pagesOne = (await PDFDocument.load(one.body as Buffer)).getPageCount();
    const pagesAll = (await PDFDocument.load(all.body as Buffer)).getPageCount();
    expect(pagesOne).toBeGreaterThan(0);
    expect(pagesAll).toBeGreaterThan(pagesOne);
    expect(one.headers['content-disposition']).toMatch(/-m-/i);
  });

  it('when a size that is not in the run is asked for, then 400 names the size field', async () => {
    const base = await saveRun();
    const res = await request(t.app).get(`${base}&size=XXL`).set('Cookie', w.apprentice.cookie).expect(400);
    expect(Object.keys(res.body.error.fields ?? {}).join(' ')).toMatch(/size/);
  });

  it('when two sizes share a name, then the save is refused naming sizes', async () => {
    const spec = { ...w.collar.head.spec!, sizes: [run[0], { ...run[1]!, name: 'xs' }] };
    const res = await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec, note: 'dup' }).expect(400);
    expect(Object.keys(res.body.error.fields ?? {}).join(' ')).toMatch(/sizes/);
  });
});

describe('size runs on save', () => {
  it('when a size is too small for the tip holes to fit, then the save is refused naming that size and nothing is stored', async () => {
    // 100 mm is above the schema's girth minimum but leaves no room for five holes 3/4 in apart.
    const spec = { ...w.collar.head.spec!, sizes: [run[2]!, { name: 'kitten', girthMm: 100 }] };
    const res = await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec, note: 'with a kitten size' }).expect(400);
    expect(res.body.error.fields).toHaveProperty(['spec.sizes.1.girthMm']);
    // Named by its label and in the pattern's unit: 100 mm = 3 15/16 in; five holes 3/4 in apart need 6 in.
    expect(res.body.error.fields['spec.sizes.1.girthMm']).toMatch(/^Size kitten \(3 15\/16 in\): Tip holes: 5 holes 3\/4 in apart need 6 in from the tip/);
    const revisions = await request(t.app).get(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).expect(200);
    expect(revisions.body.items).toHaveLength(1);
  });
});
