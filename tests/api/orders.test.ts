// Orders API: the lifecycle of one order (taken, measured, moved through every stage,
// handed over) with its history; girths from a size of the run or a measurement fitted
// without a new revision; the board's filters; refusals in the person's words.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { ORDER_STAGES, ORDER_STAGE_LABELS } from '@shared/schemas/orders.ts';
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

const get = (path: string, cookie = w.apprentice.cookie) => request(t.app).get(path).set('Cookie', cookie);
const post = (path: string, body: object, cookie = w.apprentice.cookie) => request(t.app).post(path).set('Cookie', cookie).send(body);

describe('order lifecycle', () => {
  it('when an apprentice takes an order for a new customer and moves it to handed over, then every step is in its history with who and when, and no revision is made', async () => {
    const revisionsBefore = await t.db('revisions').count<{ n: number }[]>('* as n');
    const c = await post('/api/customers', { name: 'Odile Brann', email: 'odile@customers.example' }).expect(201);
    const dog = await post(`/api/customers/${c.body.customer.id}/wearers`, { name: 'Pepper', kind: 'dog' }).expect(201);
    const made = await post('/api/orders', { wearerId: dog.body.wearer.id, patternId: w.collar.pattern.id, fit: { from: 'later' }, dueDate: '2027-03-14', leatherColour: 'Chestnut' }).expect(201);
    let order = made.body.order as OrderDetail;
    expect(order.number).toBe(1001);
    expect(order.stage).toBe('waiting-for-measurement');
    expect(order.girthMm).toBeNull();

    // Moving on without a girth is refused in words.
    const early = await post(`/api/orders/${order.id}/stage`, { stage: 'cut' }).expect(409);
    expect(early.body.error.code).toBe('girth_missing');
    expect(early.body.error.message).toMatch(/no girth yet/);

    // 14 in measured at the bench; the order takes it and moves on by itself.
    await post(`/api/wearers/${dog.body.wearer.id}/measurements`, { girthMm: 355.6, unit: 'in', part: 'neck', method: 'soft-tape' }).expect(201);
    order = (await request(t.app).patch(`/api/orders/${order.id}`).set('Cookie', w.apprentice.cookie).send({ fit: { from: 'measurement' } }).expect(200)).body.order;
    expect(order.girthMm).toBe(355.6);
    expect(order.stage).toBe('ready-to-cut');

    for (const stage of ORDER_STAGES.slice(2)) {
      order = (await post(`/api/orders/${order.id}/stage`, { stage, note: stage === 'handed-over' ? 'Collected by Odile' : '' }).expect(200)).body.order;
      expect(order.stage).toBe(stage);
    }
    const moves = order.history.filter((e) => e.kind === 'stage').reverse();
    expect(moves.map((e) => e.toStage)).toEqual(['ready-to-cut', 'cut', 'punched', 'assembled', 'finished', 'handed-over']);
    expect(moves.every((e) => e.by?.name === 'Ilse Park' && !Number.isNaN(Date.parse(e.at)))).toBe(true);
    expect(moves.at(-1)!.summary).toBe(`Moved from ${ORDER_STAGE_LABELS.finished} to ${ORDER_STAGE_LABELS['handed-over']}. Collected by Odile`);
    expect(order.history.at(-1)!.kind).toBe('created');
    expect(order.history.at(-1)!.summary).toBe("Order 1001 taken for Pepper: Juniper's collar, revision 1, no girth yet.");
    // A history sentence never shows a field path or a camelCase name.
    expect(order.history.map((e) => e.summary).join(' ')).not.toMatch(/[a-z][A-Z]|\w+\.\w+\.\d/);
    expect(await t.db('revisions').count<{ n: number }[]>('* as n')).toEqual(revisionsBefore);
  });

  it('when an order takes a size of the revision run, then its girth is that size and the piece is fitted (the blank grows with the girth)', async () => {
    const f = await makeOrder(t, w, w.apprentice);
    const spec = { ...presetSpec('collar'), sizes: [{ name: 'S', girthMm: 304.8 }, { name: 'L', girthMm: 406.4 }] };
    const saved = await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec, note: 'run' }).expect(201);
    // The order keeps the revision it was taken from (1, without a run).
    const old = await request(t.app).patch(`/api/orders/${f.order.id}`).set('Cookie', w.apprentice.cookie).send({ fit: { from: 'size', sizeName: 'S' } }).expect(400);
    expect(old.body.error.fields['fit.sizeName']).toBe('Size: this revision has no size run; use a measurement');
    const o2 = await post('/api/orders', { wearerId: f.wearerId, patternId: w.collar.pattern.id, revision: saved.body.revision.number, fit: { from: 'size', sizeName: 'L' }, dueDate: '2027-05-01' }).expect(201);
    const large = o2.body.order as OrderDetail;
    expect(large.girthMm).toBe(406.4);
    expect(large.sizeName).toBe('L');
    const s = await post('/api/orders', { wearerId: f.wearerId, patternId: w.collar.pattern.id, revision: 2, fit: { from: 'size', sizeName: 'S' }, dueDate: '2027-05-01' }).expect(201);
    // 4 in more girth, 4 in more blank (common practice: the fitted strap grows by the girth difference).
    expect(large.fitted!.blankLengthMm - s.body.order.fitted.blankLengthMm).toBeCloseTo(101.6, 1);
    const bad = await post('/api/orders', { wearerId: f.wearerId, patternId: w.collar.pattern.id, revision: 2, fit: { from: 'size', sizeName: 'XL' }, dueDate: '2027-05-01' }).expect(400);
    expect(bad.body.error.fields['fit.sizeName']).toBe('Size must be one of S, L');
  });

  it('when a wearer has no neck measurement, then an order from the latest measurement is refused naming the wearer and the part', async () => {
    const c = await post('/api/customers', { name: 'Hollis Tarrant' }).expect(201);
    const cat = await post(`/api/customers/${c.body.customer.id}/wearers`, { name: 'Mab', kind: 'cat' }).expect(201);
    await post(`/api/wearers/${cat.body.wearer.id}/measurements`, { girthMm: 420, unit: 'cm', part: 'chest', method: 'soft-tape' }).expect(201);
    const res = await post('/api/orders', { wearerId: cat.body.wearer.id, patternId: w.collar.pattern.id, fit: { from: 'measurement' }, dueDate: '2027-05-01' }).expect(400);
    expect(res.body.error.fields.fit).toBe('Mab has no neck measurement yet: add one, or ask the customer for it later');
  });

  it("when an order names another wearer's measurement, then it is refused naming this wearer, not an id", async () => {
    const mine = await makeOrder(t, w, w.maker);
    const other = await makeOrder(t, w, w.maker);
    const res = await post('/api/orders', { wearerId: mine.wearerId, patternId: w.collar.pattern.id, fit: { from: 'measurement', measurementId: other.measurementId }, dueDate: '2027-05-01' }).expect(400);
    expect(res.body.error.fields.fit).toBe("That measurement is not one of Pepper's");
  });

  it('when fields are wrong, then each message names the field by its label (no paths, no camelCase)', async () => {
    const res = await post('/api/orders', { wearerId: 1, patternId: 1, fit: { from: 'later' }, dueDate: '14/03/2027', quantity: 0, benchMinutes: 'soon' }).expect(400);
    expect(res.body.error.fields).toEqual({ dueDate: 'Due date must be a date such as 2027-03-14', quantity: 'Quantity must be at least 1', benchMinutes: 'Bench time must be a whole number' });
    const m = await post('/api/customers', { name: '  ', email: 'not-mail' }).expect(400);
    expect(m.body.error.fields).toEqual({ name: 'Customer name is required', email: 'E-mail must be an e-mail address such as maren@example.com' });
    const g = await post('/api/wearers/1/measurements', { girthMm: 5000, unit: 'in', part: 'neck', method: 'soft-tape' }).expect(400);
    expect(g.body.error.fields.girthMm).toBe('Girth must be between 3/4 in and 118 1/8 in');
  });

  it("when another shop asks for this shop's order, customer or wearer, then it gets 404", async () => {
    const f = await makeOrder(t, w);
    for (const path of [`/api/orders/${f.order.id}`, `/api/customers/${f.customerId}`, `/api/wearers/${f.wearerId}/measurements`]) {
      await get(path, w.outsider.cookie).expect(404);
    }
    await post('/api/orders', { wearerId: f.wearerId, patternId: w.collar.pattern.id, fit: { from: 'later' }, dueDate: '2027-05-01' }, w.outsider.cookie).expect(404);
  });
});

describe('board and table', () => {
  it('when orders are filtered by stage, due dates, customer and words, then only the matching ones come back, soonest due first', async () => {
    const a = await makeOrder(t, w, w.maker, { dueDate: '2027-01-10' });
    const b = await makeOrder(t, w, w.maker, { dueDate: '2027-02-20' });
    const c = await makeOrder(t, w, w.maker, { dueDate: '2027-03-30' });
    await post(`/api/orders/${b.order.id}/stage`, { stage: 'cut' }).expect(200);
    await post(`/api/orders/${c.order.id}/stage`, { stage: 'handed-over' }).expect(200);
    const ids = async (q: string) => ((await get(`/api/orders${q}`).expect(200)).body.items as { id: number }[]).map((o) => o.id);
    expect(await ids('')).toEqual([a.order.id, b.order.id, c.order.id]);
    expect(await ids('?stage=cut')).toEqual([b.order.id]);
    expect(await ids('?stage=ready-to-cut,cut')).toEqual([a.order.id, b.order.id]);
    expect(await ids('?active=true')).toEqual([a.order.id, b.order.id]);
    expect(await ids('?dueFrom=2027-02-01&dueTo=2027-03-31')).toEqual([b.order.id, c.order.id]);
    expect(await ids(`?customerId=${a.customerId}`)).toEqual([a.order.id]);
    expect(await ids(`?query=${encodeURIComponent(a.order.customer.name)}`)).toEqual([a.order.id]);
    expect(await ids(`?query=${b.order.number}`)).toEqual([b.order.id]);
    expect(await ids('?sort=number')).toEqual([c.order.id, b.order.id, a.order.id]);
    const bad = await get('/api/orders?stage=glued').expect(400);
    expect(bad.body.error.message).toMatch(/^Stage must be one of: Waiting for measurement, Ready to cut/);
  });

  it("when a customer is read, then its wearers come with their measurements oldest first and its orders", async () => {
    const f = await makeOrder(t, w);
    await post(`/api/wearers/${f.wearerId}/measurements`, { girthMm: 368.3, unit: 'in', part: 'neck', method: 'soft-tape', takenAt: '2027-01-01T10:00:00Z' }).expect(201);
    const res = await get(`/api/customers/${f.customerId}`).expect(200);
    expect(res.body.customer.wearerCount).toBe(1);
    expect(res.body.customer.openOrderCount).toBe(1);
    const girths = res.body.wearers[0].measurements.map((m: { girthMm: number }) => m.girthMm);
    expect(girths).toHaveLength(2);
    expect(res.body.wearers[0].measurements[0].takenBy.name).toBe('Tobias Harrow');
    expect(res.body.orders.map((o: { id: number }) => o.id)).toEqual([f.order.id]);
  });
});
