// The order's job sheet: the template at the order's girth (not the pattern's own), then the
// job sheet pages; every print logged on the order with who, when and which paper. Text read
// back with pdftotext (poppler-utils).
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cautionsFor } from '@shared/pattern/cautions.ts';
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

  it.each(['a4', 'letter'] as const)("when a maker prints the job sheet of an order of two on %s, then its page gives the quantity, leather colour and finish, thread and notes, and the cautions stay whole", async (paper) => {
    const notes = 'Initials JB stamped by the buckle. Customer collects on a Saturday; ring before. '.repeat(12); // 1,000+ characters, the order form allows 2,000
    const { order } = await makeOrder(t, w, w.maker, { quantity: 2, leatherColour: 'Oxblood', leatherFinish: 'Matte, edges burnished', thread: 'Black waxed 0.8 mm', notes });
    const res = await request(t.app).get(`/api/orders/${order.id}/job-sheet.pdf?paper=${paper}`).set('Cookie', w.maker.cookie).buffer(true).parse(binary).expect(200);
    mkdirSync('test-output/orders', { recursive: true });
    const file = `test-output/orders/job-sheet-order-${paper}.pdf`;
    writeFileSync(file, res.body as Buffer);
    const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [file]).toString())?.[1]);
    // The job sheet is the last page; read it alone so a match cannot come from the template pages.
    const sheet = execFileSync('pdftotext', ['-f', String(pages), '-l', String(pages), file, '-']).toString().replace(/\s+/g, ' ');
    expect(sheet).toContain(`Order ${order.number}`);
    expect(sheet).toContain('For Pepper (dog), ordered by Odile Brann');
    expect(sheet).toContain('Quantity: 2 (cut, punch and set hardware for each)');
    expect(sheet).toContain('Colour: Oxblood · Finish: Matte, edges burnished');
    expect(sheet).toContain('Thread: Black waxed 0.8 mm');
    expect(sheet).toContain('Notes: Initials JB stamped by the buckle.');
    expect(sheet).toContain("(the rest is in the order's notes)"); // cut so the page holds it all
    // The cautions come last on the page: still there in full after the order's long notes.
    // Every caution of a collar (shared/pattern/cautions.ts), the last one included.
    const cautions = sheet.slice(sheet.indexOf('Cautions'));
    for (const c of cautionsFor('collar')) expect(cautions).toContain(c.replace(/\s+/g, ' '));
    expect(sheet).not.toMatch(/leather_colour|leatherColour|undefined|null/);
  });

  it('when the order has no girth yet, then the job sheet is refused (409) saying why, and nothing is logged', async () => {
    const { order } = await makeOrder(t, w, w.maker, { fit: { from: 'later' } });
    const res = await request(t.app).get(`/api/orders/${order.id}/job-sheet.pdf`).set('Cookie', w.apprentice.cookie).expect(409);
    expect(res.body.error.message).toMatch(/no girth yet/);
    expect(await t.db('order_prints').count<{ n: number }[]>('* as n')).toEqual([{ n: 0 }]);
  });
});
