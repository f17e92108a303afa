// Photos of orders and patterns: judged by their bytes (sharp), stored under generated
// names outside the web root with a thumbnail, served with nosniff and Content-Disposition
// to members only; refusals leave no file; deleting is recorded.
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import sharp from 'sharp';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, type ShopWorld } from '../helpers/shop-world.ts';
import { makeOrder, samplePng, uploadOrderPhoto } from '../helpers/order-world.ts';

let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  t = await createTestApp({ env: { PHOTO_MAX_KB: '64', PHOTOS_PER_ITEM_MAX: '2' } });
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

/** The images under the upload folder (the disk store keeps a ".type" file beside each). */
const storedImages = () => storedFiles().filter((f) => !f.endsWith('.type'));
/** Every file under the upload folder (recursively). */
function storedFiles(): string[] {
  const root = t.config.uploadDir;
  if (!existsSync(root)) return [];
  return readdirSync(root, { recursive: true, withFileTypes: true }).filter((d) => d.isFile()).map((d) => join(d.parentPath, d.name));
}

describe('uploads', () => {
  it('when a PNG is uploaded, then it is stored under a generated name with a JPEG thumbnail no larger than 320 px, and served with nosniff and Content-Disposition', async () => {
    const { order } = await makeOrder(t, w);
    const big = await sharp({ create: { width: 800, height: 600, channels: 3, background: '#6b3e26' } }).png().toBuffer();
    const res = await request(t.app).post(`/api/orders/${order.id}/photos`).set('Cookie', w.apprentice.cookie).field('caption', 'Buckle end').attach('file', big, '../../evil name.png').expect(201);
    expect(res.body.photo).toMatchObject({ caption: 'Buckle end', contentType: 'image/png', widthPx: 800, heightPx: 600 });
    const files = storedFiles();
    expect(files.some((f) => f.includes('evil'))).toBe(false);
    expect(files.filter((f) => /[0-9a-f]{32}(-thumb)?\.(png|jpg)$/.test(f))).toHaveLength(2);
    expect(t.config.uploadDir.startsWith(join(process.cwd(), 'dist'))).toBe(false);

    const full = await request(t.app).get(res.body.photo.url).set('Cookie', w.apprentice.cookie).buffer(true).expect(200);
    expect(full.headers['content-type']).toBe('image/png');
    expect(full.headers['x-content-type-options']).toBe('nosniff');
    expect(full.headers['content-disposition']).toBe(`inline; filename="photo-${res.body.photo.id}.png"`);
    const thumb = await request(t.app).get(res.body.photo.thumbUrl).set('Cookie', w.apprentice.cookie).buffer(true).expect(200);
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['jpeg', 320, 240]);
    await request(t.app).get(res.body.photo.url).expect(401);
    await request(t.app).get(res.body.photo.url).set('Cookie', w.outsider.cookie).expect(404);
  });

  it('when an upload carries no file, then the refusal asks for an image file in plain words (no form field names)', async () => {
    const { order } = await makeOrder(t, w, w.maker);
    const json = await request(t.app).post(`/api/orders/${order.id}/photos`).set('Cookie', w.maker.cookie).send({ caption: 'Pepper' }).expect(400);
    expect(json.body.error.fields.file).toBe('Photo is required: choose an image file to upload');
    const empty = await request(t.app).post(`/api/orders/${order.id}/photos`).set('Cookie', w.maker.cookie).field('caption', 'Pepper').expect(400);
    expect(empty.body.error.fields.file).toBe('Photo is required: choose an image file to upload');
  });

  it('when an HTML file is renamed .png, then it is refused with 415 and no file is left', async () => {
    const { order } = await makeOrder(t, w);
    const html = Buffer.from('<!doctype html><html><script>alert(1)</script></html>');
    const res = await request(t.app).post(`/api/orders/${order.id}/photos`).set('Cookie', w.maker.cookie).attach('file', html, { filename: 'collar.png', contentType: 'image/png' }).expect(415);
    expect(res.body.error.message).toBe('Photo must be a JPEG, PNG or WebP image; this file is something else.');
    expect(storedFiles()).toEqual([]);
    expect(await t.db('photos').count<{ n: number }[]>('* as n')).toEqual([{ n: 0 }]);
  });

  it('when a photo is larger than PHOTO_MAX_KB, then it is refused with 413 and no file is left', async () => {
    const { order } = await makeOrder(t, w);
    // Random pixels do not compress: about 190 KB of PNG, over the 64 KB limit of this test.
    const noisy = await sharp(Buffer.from(Array.from({ length: 256 * 256 * 3 }, (_, i) => (i * 7919) % 251)), { raw: { width: 256, height: 256, channels: 3 } }).png({ compressionLevel: 0 }).toBuffer();
    expect(noisy.length).toBeGreaterThan(64 * 1024);
    const res = await request(t.app).post(`/api/orders/${order.id}/photos`).set('Cookie', w.maker.cookie).attach('file', noisy, 'big.png').expect(413);
    expect(res.body.error.message).toBe('Photo must be at most 64 KB.');
    expect(storedFiles()).toEqual([]);
  });

  it('when an order already has the most photos allowed, then one more is refused with 409 saying so', async () => {
    const { order } = await makeOrder(t, w);
    await uploadOrderPhoto(t, order.id, w.maker);
    await uploadOrderPhoto(t, order.id, w.maker);
    const res = await request(t.app).post(`/api/orders/${order.id}/photos`).set('Cookie', w.maker.cookie).attach('file', await samplePng(), 'third.png').expect(409);
    expect(res.body.error.message).toMatch(/has 2 photos already/);
    expect(storedImages()).toHaveLength(4);
  });

  it('when an apprentice uploads to a pattern, then it is refused (403): pattern photos are for makers', async () => {
    await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/photos`).set('Cookie', w.apprentice.cookie).attach('file', await samplePng(), 'p.png').expect(403);
    await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/photos`).set('Cookie', w.maker.cookie).attach('file', await samplePng(), 'p.png').expect(201);
  });
});

describe('deleting', () => {
  it('when a photo is deleted, then its files are gone and the deletion is in the audit trail and the order history', async () => {
    const { order } = await makeOrder(t, w);
    const id = await uploadOrderPhoto(t, order.id, w.maker);
    expect(storedImages()).toHaveLength(2);
    await request(t.app).delete(`/api/orders/${order.id}/photos/${id}`).set('Cookie', w.apprentice.cookie).expect(204);
    expect(storedFiles()).toEqual([]);
    const audit = await t.db('audit_events').where({ action: 'photo.deleted' });
    expect(audit).toHaveLength(1);
    expect(audit[0].user_id).toBe(w.apprentice.id);
    const o = await request(t.app).get(`/api/orders/${order.id}`).set('Cookie', w.maker.cookie);
    expect(o.body.order.history[0].summary).toBe('Photo deleted.');
    await request(t.app).get(`/api/orders/${order.id}/photos/${id}`).set('Cookie', w.maker.cookie).expect(404);
  });
});
