// The order's job sheet: the template at the order's girth (not the pattern's own), then the
// job sheet pages; every print logged on the order with who, when and which paper. Text read
// back with pdftotext (poppler-utils).
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { OrderDetail } from '@shared/schemas/order-views.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, type ShopWorld } from '../helpers/shop-world.ts';
import { makeOrder } from '../helpers/order-world.ts';

let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('job sheet', () => {
  it("when an apprentice prints an order's job sheet on A4, then the PDF names the order at its girth with the cut list, steps and cautions, and the print is logged", async () => {
    const { order } = await makeOrder(t, w, w.maker, { leatherColour: 'Chestnut', thread: 'Natural 0.8 mm' });
    const res = await request(t.app).get(`/api/orders/${order.id}/job-sheet.pdf?paper=a4`).set('Cookie', w.apprentice.cookie).buffer(true).parse(binary).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="order-1001-/);
    mkdirSync('test-output/orders', { recursive: true });
    writeFileSync('test-output/orders/job-sheet.pdf', res.body as Buffer);
    const text = execFileSync('pdftotext', ['-layout', 'test-output/orders/job-sheet.pdf', '-']).toString();
    expect(text).toContain('Order 1001 at 14 in girth');
    expect(text).toMatch(/Cut list/i);
    expect(text).toContain('Order 1001 · due 2027-03-14 · Caution:');
    expect(text).toContain('breakaway for cats, off in crates · sizes are starting points'); // the footer's caution line stays whole
    expect(text).toMatch(/two fingers/i); // the collar's fit caution (shared/pattern/cautions.ts)
    const o = (await request(t.app).get(`/api/orders/${order.id}`).set('Cookie', w.maker.cookie)).body.order as OrderDetail;
    expect(o.prints).toHaveLength(1);
    expect(o.prints[0]).toMatchObject({ paper: 'a4', by: { id: w.apprentice.id, name: 'Ilse Park' } });
    expect(o.history[0]!.summary).toBe('Job sheet printed on A4 paper at 14 in girth.');
  });

  it('when the order has no girth yet, then the job sheet is refused (409) saying why, and nothing is logged', async () => {
    const { order } = await makeOrder(t, w, w.maker, { fit: { from: 'later' } });
    const res = await request(t.app).get(`/api/orders/${order.id}/job-sheet.pdf`).set('Cookie', w.apprentice.cookie).expect(409);
    expect(res.body.error.message).toMatch(/no girth yet/);
    expect(await t.db('order_prints').count<{ n: number }[]>('* as n')).toEqual([{ n: 0 }]);
  });
});
