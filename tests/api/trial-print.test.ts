// Trial prints (the form's values as a PDF, nothing saved), a saved revision printed at a
// customer's girth, and the library card's thumbnail and fit summary.
import request from 'supertest';
import { PDFDocument } from 'pdf-lib';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, collarWithGirth, type ShopWorld } from '../helpers/shop-world.ts';
import { pageText, writeOut } from '../print/pdf-tools.ts';

let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

const IN = 25.4; // mm per inch, exact (1959 agreement)
const binary = (req: request.Test) =>
  req.buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  });
const trial = (id: number) => `/api/patterns/${id}/trial-print`;

/** Every page's text, read back with pdftotext (poppler). */
async function pagesText(name: string, pdf: Buffer): Promise<string[]> {
  const path = writeOut(name, pdf);
  const count = (await PDFDocument.load(pdf)).getPageCount();
  return Array.from({ length: count }, (_, i) => pageText(path, i + 1));
}

describe('trial print', () => {
  it('when a maker prints unsaved values, then the PDF says "not saved" in the title block and on every page, and no revision is added', async () => {
    const spec = { ...collarWithGirth(16 * IN), name: 'Trial collar' };
    const res = await binary(request(t.app).post(trial(w.collar.pattern.id)).set('Cookie', w.maker.cookie).send({ spec, basedOn: 1, options: { paper: 'letter', jobSheet: true } })).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/not-saved/);
    const pages = await pagesText('trial-print.pdf', res.body as Buffer);
    expect(pages.length).toBeGreaterThan(1);
    for (const text of pages) expect(text.toLowerCase()).toContain('not saved');
    // Title block: the revision row reads "not saved · from rev 1", the girth row the form's 16 in.
    expect(pages[0]).toMatch(/not saved · from rev 1/);
    expect(pages[0]).toMatch(/16 in/);
    const revisions = await t.db('revisions').where({ pattern_id: w.collar.pattern.id }).count<{ n: number }[]>({ n: '*' });
    expect(Number(revisions[0]!.n)).toBe(1);
  });

  it('when an apprentice asks for a trial print, then 403: apprentices print saved revisions only', async () => {
    await request(t.app).post(trial(w.collar.pattern.id)).set('Cookie', w.apprentice.cookie).send({ spec: collarWithGirth(400), options: {} }).expect(403);
  });

  it('when a print option is out of range, then 400 names it by its label in the pattern unit', async () => {
    const res = await request(t.app).post(trial(w.collar.pattern.id)).set('Cookie', w.maker.cookie).send({ spec: collarWithGirth(400), options: { margin: '2in' } }).expect(400);
    // 25.4 mm is the print module's largest margin (MARGIN_MAX_MM); the collar preset shows inches.
    expect(res.body.error.fields.margin).toBe('Margin must be at most 1 in');
  });

  it('when the unsaved girth cannot be drawn, then 400 keys it under spec and names it by its label in the display unit', async () => {
    const res = await request(t.app).post(trial(w.collar.pattern.id)).set('Cookie', w.maker.cookie).send({ spec: collarWithGirth(20), options: {} }).expect(400);
    expect(Object.keys(res.body.error.fields)).toContain('spec.girthMm');
    // By its label in the collar's inches: 50 mm (GIRTH_MIN_MM) is 1 31/32 in to the nearest 1/32.
    expect(res.body.error.fields['spec.girthMm']).toBe('Girth must be at least 1 31/32 in');
    expect(res.body.error.message).not.toMatch(/girthMm|spec\./);
  });
});

describe('a saved revision at a customer girth', () => {
  const pdf = (q: string) => `/api/patterns/${w.collar.pattern.id}/revisions/1/pdf?paper=letter&${q}`;

  it('when an apprentice prints at 14 1/2 in, then the title block names that girth and the pattern keeps its own', async () => {
    const res = await binary(request(t.app).get(pdf(`girth=${encodeURIComponent('14 1/2in')}`)).set('Cookie', w.apprentice.cookie)).expect(200);
    const [first] = await pagesText('customer-girth.pdf', res.body as Buffer);
    expect(first).toMatch(/rev 1 · at 14 1\/2 in girth/);
    const detail = await request(t.app).get(`/api/patterns/${w.collar.pattern.id}`).set('Cookie', w.apprentice.cookie).expect(200);
    expect(detail.body.head.spec.girthMm).toBe(w.collar.head.spec!.girthMm);
    expect(detail.body.pattern.headNumber).toBe(1);
  });

  it('when the customer girth is below the limit, then 400 names "Customer girth" in inches', async () => {
    const res = await request(t.app).get(pdf('girth=1in')).set('Cookie', w.apprentice.cookie).expect(400);
    // 50 mm is GIRTH_MIN_MM in shared/schemas/strap-spec-limits.ts: 1 31/32 in to the nearest 1/32.
    expect(res.body.error.fields.girth).toBe('Customer girth must be at least 1 31/32 in');
  });

  it('when the customer girth is not a length, then 400 says so under its label', async () => {
    const res = await request(t.app).get(pdf('girth=wide')).set('Cookie', w.apprentice.cookie).expect(400);
    expect(res.body.error.fields.girth).toMatch(/^Customer girth: "wide" is not a length/);
  });
});

describe('library cards', () => {
  it('when the library is listed, then each card carries the head girth in the display unit source (mm + unit)', async () => {
    const res = await request(t.app).get('/api/patterns').set('Cookie', w.apprentice.cookie).expect(200);
    expect(res.body.items[0].head.fit).toEqual({ units: 'in', girthMm: w.collar.head.spec!.girthMm, closes: true });
    expect(res.body.items[0].head.spec).toBeUndefined();
  });

  it('when a head has a size run, then the card gets its count and girth range', async () => {
    const sizes = [10, 14, 12].map((g, i) => ({ name: ['S', 'L', 'M'][i]!, girthMm: g * IN }));
    await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec: { ...w.collar.head.spec!, sizes }, note: 'run' }).expect(201);
    const res = await request(t.app).get('/api/patterns').set('Cookie', w.apprentice.cookie).expect(200);
    expect(res.body.items[0].head.fit.run).toEqual({ count: 3, minGirthMm: 10 * IN, maxGirthMm: 14 * IN });
  });

  it('when a thumbnail is fetched, then it is a small SVG without labels, cached by revision', async () => {
    const url = `/api/patterns/${w.collar.pattern.id}/revisions/1/thumbnail.svg`;
    const res = await request(t.app).get(url).set('Cookie', w.apprentice.cookie).expect(200);
    expect(res.headers['content-type']).toMatch(/image\/svg\+xml/);
    const svg = res.text || (res.body as Buffer).toString('utf8');
    expect(svg).toMatch(/^<svg /);
    expect(svg).not.toMatch(/<text/);
    expect(svg.length).toBeLessThan(8000);
    await request(t.app).get(url).set('Cookie', w.apprentice.cookie).set('If-None-Match', res.headers.etag as string).expect(304);
  });
});
