// The customer's links: the measuring request (e-mail through the fake SMTP server, the
// public page, two readings in the range for the kind, once only, until it expires on an
// injected clock) and the proof link (what it shows, what it never carries, the answers).
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { MEASURE_KINDS } from '@shared/schemas/orders.ts';
import type { MeasurePage, OrderDetail, ProofPage } from '@shared/schemas/order-views.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, type ShopWorld } from '../helpers/shop-world.ts';
import { makeOrder, measureToken, proofLink, uploadOrderPhoto } from '../helpers/order-world.ts';

const START = Date.parse('2027-01-05T09:00:00Z');
const HOUR = 3_600_000;
let clock = START;
let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  clock = START;
  t = await createTestApp({ deps: { now: () => clock } });
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

/** An order of the collar for a dog without a girth yet (waiting for measurement). */
async function waitingOrder() {
  return (await makeOrder(t, w, w.apprentice, { fit: { from: 'later' } })).order;
}

describe('measuring link', () => {
  it('when a member sends it, then the customer gets an e-mail whose link opens a page with how to measure, the range, the agreement and the fit cautions', async () => {
    const order = await waitingOrder();
    const { token, mailText } = await measureToken(t, order.id, w.apprentice);
    const mail = t.mailbox.messages().find((m) => m.text === mailText)!;
    expect(mail.recipients).toEqual([order.customerEmail]);
    expect(mail.subject).toBe('Harrow & Finch Leatherworks: a measurement for Pepper');
    expect(mailText).toContain(`${t.config.publicOrigin}/measure/${token}`);
    expect(mailText).not.toMatch(/[a-z][A-Z][a-z]+Mm|girthMm|\bspec\b/);
    const page = (await request(t.app).get(`/api/measure/${token}`).expect(200)).body as MeasurePage;
    expect(page.where).toBe('neck');
    expect(page.howTo.join(' ')).toMatch(/snug but flat/);
    expect([page.minMm, page.maxMm, page.agreeMm]).toEqual([MEASURE_KINDS.collar.minMm, MEASURE_KINDS.collar.maxMm, 10]);
    expect(page.cautions.join(' ')).toMatch(/two fingers/);
    expect(page.cautions.join(' ')).not.toMatch(/blade|mallet/); // the maker's cautions stay on the job sheet
    expect(page.unit).toBe('in');
  });

  it('when the customer answers with two agreeing readings, then the wearer gets the measurement, the order its girth and the next stage, and the shop is mailed', async () => {
    const order = await waitingOrder();
    const { token } = await measureToken(t, order.id, w.apprentice);
    const before = t.mailbox.messages().length;
    // 14 in and 14 1/8 in: 3.175 mm apart, within the 10 mm a collar allows; the mean
    // (357.1875 mm) is kept to the half millimetre.
    const res = await request(t.app).post(`/api/measure/${token}`).send({ unit: 'in', girthMm: 355.6, confirmGirthMm: 358.775 }).expect(201);
    expect(res.body.girthMm).toBe(357);
    const after = (await request(t.app).get(`/api/orders/${order.id}`).set('Cookie', w.apprentice.cookie).expect(200)).body.order as OrderDetail;
    expect(after.girthMm).toBe(357);
    expect(after.stage).toBe('ready-to-cut');
    expect(after.measurement!.takenByLabel).toBe('Customer (measuring link)');
    expect(after.history.map((e) => e.kind).slice(0, 2)).toEqual(['stage', 'measured']);
    expect(after.history[1]!.summary).toBe(`${after.customer.name} measured Pepper: 14 in (readings 14 in and 14 1/8 in).`);
    await t.flushMail();
    await t.mailbox.waitFor((m) => m.id > before && m.subject.startsWith(`Order ${order.number}`));
    // The owner and the apprentice who took the order, one message each.
    const to = t.mailbox.messages().filter((m) => m.id > before && m.subject.startsWith(`Order ${order.number}`)).flatMap((m) => m.recipients);
    expect(to.sort()).toEqual(['ilse@harrowfinch.example', 'maren@harrowfinch.example']);
  });

  it('when a girth is out of range or the readings disagree, then it is refused naming the range in the unit typed, and nothing is saved', async () => {
    const order = await waitingOrder();
    const { token } = await measureToken(t, order.id, w.apprentice);
    // A collar accepts 150-900 mm: 15 cm to 90 cm; 5 3/4 in to 35 3/8 in (to the 1/8 in).
    const cm = await request(t.app).post(`/api/measure/${token}`).send({ unit: 'cm', girthMm: 1200, confirmGirthMm: 1200 }).expect(400);
    expect(cm.body.error.fields.girthMm).toBe('Girth must be between 15 cm and 90 cm');
    const inch = await request(t.app).post(`/api/measure/${token}`).send({ unit: 'in', girthMm: 101.6, confirmGirthMm: 101.6 }).expect(400);
    expect(inch.body.error.fields.girthMm).toBe('Girth must be between 5 7/8 in and 35 3/8 in');
    const apart = await request(t.app).post(`/api/measure/${token}`).send({ unit: 'cm', girthMm: 350, confirmGirthMm: 380 }).expect(400);
    expect(apart.body.error.fields.confirmGirthMm).toBe('The two readings differ by more than 1 cm; measure again');
    expect(await t.db('measurements').count<{ n: number }[]>('* as n')).toEqual([{ n: 1 }]); // only the bench one of makeOrder
    // The link still works after refusals.
    await request(t.app).post(`/api/measure/${token}`).send({ unit: 'cm', girthMm: 350, confirmGirthMm: 352 }).expect(201);
  });

  it('when the link is used a second time, then it is refused (410) and the first answer stands', async () => {
    const order = await waitingOrder();
    const { token } = await measureToken(t, order.id, w.apprentice);
    await request(t.app).post(`/api/measure/${token}`).send({ unit: 'cm', girthMm: 350, confirmGirthMm: 350 }).expect(201);
    const again = await request(t.app).post(`/api/measure/${token}`).send({ unit: 'cm', girthMm: 400, confirmGirthMm: 400 }).expect(410);
    expect(again.body.error.code).toBe('link_used');
    expect((await request(t.app).get(`/api/measure/${token}`).expect(410)).body.error.code).toBe('link_used');
    const o = (await request(t.app).get(`/api/orders/${order.id}`).set('Cookie', w.maker.cookie)).body.order as OrderDetail;
    expect(o.girthMm).toBe(350);
  });

  it('when the clock passes the expiry (14 days by default), then the link is refused (410) though it worked a minute before', async () => {
    const order = await waitingOrder();
    const { token } = await measureToken(t, order.id, w.apprentice);
    clock = START + 14 * 24 * HOUR - 60_000;
    await request(t.app).get(`/api/measure/${token}`).expect(200);
    clock = START + 14 * 24 * HOUR;
    const res = await request(t.app).post(`/api/measure/${token}`).send({ unit: 'cm', girthMm: 350, confirmGirthMm: 350 }).expect(410);
    expect(res.body.error.code).toBe('link_expired');
    const o = (await request(t.app).get(`/api/orders/${order.id}`).set('Cookie', w.maker.cookie)).body.order as OrderDetail;
    expect(o.measurementRequests[0]!.expired).toBe(true);
    await request(t.app).get(`/api/measure/${'x'.repeat(43)}`).expect(404);
  });

  it('when the customer has no e-mail, then the request is refused saying so', async () => {
    const c = await request(t.app).post('/api/customers').set('Cookie', w.maker.cookie).send({ name: 'Bram Oyelaran' }).expect(201);
    const d = await request(t.app).post(`/api/customers/${c.body.customer.id}/wearers`).set('Cookie', w.maker.cookie).send({ name: 'Tansy', kind: 'dog' }).expect(201);
    const o = await request(t.app).post('/api/orders').set('Cookie', w.maker.cookie).send({ wearerId: d.body.wearer.id, patternId: w.collar.pattern.id, fit: { from: 'later' }, dueDate: '2027-02-01' }).expect(201);
    const res = await request(t.app).post(`/api/orders/${o.body.order.id}/measurement-request`).set('Cookie', w.maker.cookie).send({}).expect(409);
    expect(res.body.error.message).toBe('Bram Oyelaran has no e-mail address yet: add it to the customer first.');
  });
});

describe('proof link', () => {
  it('when the customer opens it, then it shows the outline, finished length, fit range, photos, price and due date, and no template, cutter, cut list or punch size', async () => {
    const { order } = await makeOrder(t, w);
    await uploadOrderPhoto(t, order.id, w.maker);
    const { token } = await proofLink(t, order.id, w.apprentice);
    const res = await request(t.app).get(`/api/proof/${token}`).expect(200);
    const page = res.body as ProofPage;
    expect(page.girthMm).toBe(355.6);
    expect(page.finishedLengthMm).toBeGreaterThan(355.6);
    expect(page.fitRangeMm![0]).toBeLessThan(page.fitRangeMm![1]);
    expect(page.dueDate).toBe('2027-03-14');
    expect(page.photos).toHaveLength(1);
    expect(page.photos[0]!.url).toBe(`/api/proof/${token}/photos/${page.photos[0]!.id}`);
    expect(page.drawingSvg).toMatch(/^<svg/);
    expect(page.drawingSvg).not.toMatch(/<circle|<text/); // no holes to copy, no labels with sizes
    const text = res.text;
    for (const forbidden of ['/pdf', 'cutter', '.svg', '/revisions/', '/api/s/', '/api/patterns', 'punch', 'cutList', 'blank', 'spec']) {
      expect(text, forbidden).not.toContain(forbidden);
    }
    await request(t.app).get(page.photos[0]!.thumbUrl).expect(200).expect('Content-Type', 'image/jpeg');
  });

  it("when a proof link asks for a photo of another order, then it gets 404", async () => {
    const a = await makeOrder(t, w);
    const b = await makeOrder(t, w);
    const other = await uploadOrderPhoto(t, b.order.id, w.maker);
    const { token } = await proofLink(t, a.order.id, w.maker);
    await request(t.app).get(`/api/proof/${token}/photos/${other}`).expect(404);
  });

  it('when the customer asks for a change and then approves, then both are on the order with their words, the shop is mailed, and a withdrawn link answers 404', async () => {
    const { order } = await makeOrder(t, w);
    const { token, id } = await proofLink(t, order.id, w.apprentice);
    const before = t.mailbox.messages().length;
    await request(t.app).post(`/api/proof/${token}/change`).send({ message: '' }).expect(400);
    const change = await request(t.app).post(`/api/proof/${token}/change`).send({ message: 'A brass buckle, please.' }).expect(200);
    expect(change.body.status).toBe('change-requested');
    await request(t.app).post(`/api/proof/${token}/approve`).send({ name: 'Odile' }).expect(200);
    const o = (await request(t.app).get(`/api/orders/${order.id}`).set('Cookie', w.maker.cookie)).body.order as OrderDetail;
    expect(o.history.slice(0, 2).map((e) => e.summary)).toEqual(['Odile approved the proof.', `${o.customer.name} asked for a change: A brass buckle, please.`]);
    expect(o.proofStatus).toBe('approved');
    await t.flushMail();
    await t.mailbox.waitFor((m) => m.id > before && m.subject === `Order ${order.number}: change asked for`);
    await request(t.app).delete(`/api/proofs/${id}`).set('Cookie', w.maker.cookie).expect(204);
    await request(t.app).get(`/api/proof/${token}`).expect(404);
  });
});

describe('measuring link after cutting', () => {
  it('when the customer answers after the leather is cut, then the wearer gets the measurement but the order keeps its girth and the history says to check', async () => {
    const { order } = await makeOrder(t, w);
    const { token } = await measureToken(t, order.id, w.apprentice);
    await request(t.app).post(`/api/orders/${order.id}/stage`).set('Cookie', w.apprentice.cookie).send({ stage: 'cut' }).expect(200);
    await request(t.app).post(`/api/measure/${token}`).send({ unit: 'cm', girthMm: 380, confirmGirthMm: 380 }).expect(201);
    const o = (await request(t.app).get(`/api/orders/${order.id}`).set('Cookie', w.maker.cookie)).body.order as OrderDetail;
    expect(o.girthMm).toBe(355.6);
    expect(o.stage).toBe('cut');
    expect(o.history[0]!.summary).toMatch(/38 cm .*at Cut already, so its girth stays as it was: check with the customer\.$/);
  });
});
