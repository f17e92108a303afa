// Share links and print downloads: one revision read-only for anyone with the token.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
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

const pid = () => w.collar.pattern.id;
const binary = (req: request.Test) => req.buffer(true).parse((res, cb) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
});

describe('share links', () => {
  it('when a maker shares revision 1 and a newer revision exists, then the public view shows revision 1 without notes or authors', async () => {
    await request(t.app).post(`/api/patterns/${pid()}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec: collarWithGirth(345), note: 'private shop note' }).expect(201);
    const made = await request(t.app).post(`/api/patterns/${pid()}/share`).set('Cookie', w.maker.cookie).send({ revision: 1 }).expect(201);
    expect(made.body.share.url).toBe(`${t.config.publicOrigin}/s/${made.body.share.token}`);
    const view = await request(t.app).get(`/api/s/${made.body.share.token}`).expect(200);
    expect(view.body.revision.number).toBe(1);
    expect(view.body.revision.spec.girthMm).toBe(w.collar.head.spec!.girthMm);
    expect(view.body.layout.pieces.length).toBeGreaterThan(0);
    expect(view.body.drawing.pieces.length).toBe(view.body.layout.pieces.length);
    const text = JSON.stringify(view.body);
    expect(text).not.toContain('private shop note');
    expect(text).not.toContain('Tobias');
    expect(text).not.toContain('First cut for Juniper');
    // Piece ids ("strap") are part of the spec; no database id of the shop may appear.
    expect(text).not.toMatch(/"(id|patternId|shopId|userId)":\d/);
  });

  it('when the link names no revision, then it follows the head', async () => {
    const made = await request(t.app).post(`/api/patterns/${pid()}/share`).set('Cookie', w.owner.cookie).send({}).expect(201);
    await request(t.app).post(`/api/patterns/${pid()}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec: collarWithGirth(345) }).expect(201);
    const view = await request(t.app).get(`/api/s/${made.body.share.token}`).expect(200);
    expect(view.body.revision).toMatchObject({ number: 2, spec: { girthMm: 345 } });
  });

  it('when a share link is revoked, then its view and downloads answer 404', async () => {
    const made = await request(t.app).post(`/api/patterns/${pid()}/share`).set('Cookie', w.maker.cookie).send({}).expect(201);
    const token = made.body.share.token as string;
    await request(t.app).get(`/api/s/${token}`).expect(200);
    await request(t.app).delete(`/api/share/${made.body.share.id}`).set('Cookie', w.maker.cookie).expect(204);
    await request(t.app).get(`/api/s/${token}`).expect(404);
    await request(t.app).get(`/api/s/${token}/svg`).expect(404);
    await request(t.app).delete(`/api/share/${made.body.share.id}`).set('Cookie', w.maker.cookie).expect(404);
  });

  it('when another shop tries to revoke a link, then 404 and the link keeps working', async () => {
    const made = await request(t.app).post(`/api/patterns/${pid()}/share`).set('Cookie', w.maker.cookie).send({}).expect(201);
    await request(t.app).delete(`/api/share/${made.body.share.id}`).set('Cookie', w.outsider.cookie).expect(404);
    await request(t.app).get(`/api/s/${made.body.share.token}`).expect(200);
  });

  it('when a share names a revision that does not exist, then 400 names revision', async () => {
    const res = await request(t.app).post(`/api/patterns/${pid()}/share`).set('Cookie', w.maker.cookie).send({ revision: 7 }).expect(400);
    expect(res.body.error.fields).toHaveProperty('revision');
  });

  it('when the database is stolen, then it holds only SHA-256 hashes of share tokens', async () => {
    const made = await request(t.app).post(`/api/patterns/${pid()}/share`).set('Cookie', w.maker.cookie).send({}).expect(201);
    const row = await t.db('share_links').where({ id: made.body.share.id }).first();
    expect(row.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(JSON.stringify(row)).not.toContain(made.body.share.token);
  });
});

describe('print downloads', () => {
  it('when an apprentice downloads the PDF of revision 1, then it is a PDF attachment named after the pattern', async () => {
    const res = await binary(request(t.app).get(`/api/patterns/${pid()}/revisions/1/pdf?paper=a4`).set('Cookie', w.apprentice.cookie)).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="juniper-s-collar-r1-a4\.pdf"$/);
    expect((res.body as Buffer).subarray(0, 5).toString('latin1')).toBe('%PDF-'); // ISO 32000-1, 7.5.2 file header
  });

  it('when the SVG and cutter SVG are downloaded through a share link, then both are SVG documents', async () => {
    const made = await request(t.app).post(`/api/patterns/${pid()}/share`).set('Cookie', w.maker.cookie).send({}).expect(201);
    for (const kind of ['svg', 'cutter.svg']) {
      const res = await binary(request(t.app).get(`/api/s/${made.body.share.token}/${kind}`)).expect(200);
      expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
      expect((res.body as Buffer).toString('utf8')).toMatch(/<svg[\s\S]*<\/svg>\s*$/);
    }
  });

  it('when the print options are bad, then 400 names the option', async () => {
    const res = await request(t.app).get(`/api/patterns/${pid()}/revisions/1/pdf?paper=napkin`).set('Cookie', w.apprentice.cookie).expect(400);
    expect(res.body.error.fields).toHaveProperty('paper');
  });
});
