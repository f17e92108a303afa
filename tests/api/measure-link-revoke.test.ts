// Withdrawing a measuring request (DELETE /api/measurement-requests/:requestId): the roles that
// may send one may withdraw it, within their own shop; the customer's page then answers as a
// link that has run out, and the order view says "revoked". Times come from an injected clock.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { OrderDetail } from '@shared/schemas/order-views.ts';
import { can } from '@shared/schemas/permissions.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, type Member, type ShopWorld } from '../helpers/shop-world.ts';
import { makeOrder, measureToken } from '../helpers/order-world.ts';

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

/** An order waiting for a measurement, and an open measuring request of it. */
async function openRequest(by: Member = w.maker) {
  const { order } = await makeOrder(t, w, by, { fit: { from: 'later' } });
  const link = await measureToken(t, order.id, by);
  return { order, ...link };
}
const orderOf = async (id: number, by: Member = w.maker) => (await request(t.app).get(`/api/orders/${id}`).set('Cookie', by.cookie).expect(200)).body.order as OrderDetail;
const answer = { unit: 'cm', girthMm: 350, confirmGirthMm: 351 };

describe('withdrawing a measuring request', () => {
  it('when a maker revokes an open request, then the customer page and the answer are refused like a run-out link, nothing of the order shows, nothing is saved, and the order says revoked', async () => {
    const { order, token, id } = await openRequest();
    expect((await orderOf(order.id)).measurementRequests[0]).toMatchObject({ id, revoked: false, expired: false, answeredAt: null });
    await request(t.app).get(`/api/measure/${token}`).expect(200);

    clock = START + 2 * HOUR;
    await request(t.app).delete(`/api/measurement-requests/${id}`).set('Cookie', w.maker.cookie).expect(204);

    const page = await request(t.app).get(`/api/measure/${token}`).expect(410);
    expect(page.body).toEqual({ error: { code: 'link_expired', message: 'This measuring link has been withdrawn by the shop; ask them for a new one.' } });
    for (const leak of [order.customer.name, 'Pepper', 'Harrow', 'neck', 'collar']) expect(page.text).not.toContain(leak);
    const post = await request(t.app).post(`/api/measure/${token}`).send(answer).expect(410);
    expect(post.body.error.code).toBe('link_expired');
    expect(post.body.error.message).toBe('This measuring link has been withdrawn by the shop; ask them for a new one.');

    const after = await orderOf(order.id);
    expect(after.measurementRequests[0]).toMatchObject({ id, revoked: true, answeredAt: null });
    expect(after.stage).toBe('waiting-for-measurement');
    expect(after.girthMm).toBeNull();
    expect(await t.db('measurements').where({ wearer_id: after.wearerId }).count<{ n: number }[]>('* as n')).toEqual([{ n: 1 }]); // the bench one of makeOrder
    expect(after.history[0]).toMatchObject({ kind: 'measurement-requested', summary: `Measuring link to ${order.customerEmail} withdrawn.`, by: { name: w.maker.name }, at: new Date(START + 2 * HOUR).toISOString() });
    // The row keeps the injected clock's time.
    expect(Number((await t.db('measure_links').where({ id }).first()).revoked_at)).toBe(START + 2 * HOUR);
  });

  it('when it is revoked twice, then the second call changes nothing and the history has one entry', async () => {
    const { order, id } = await openRequest();
    await request(t.app).delete(`/api/measurement-requests/${id}`).set('Cookie', w.owner.cookie).expect(204);
    clock += HOUR;
    await request(t.app).delete(`/api/measurement-requests/${id}`).set('Cookie', w.owner.cookie).expect(204);
    const o = await orderOf(order.id);
    expect(o.history.filter((e) => /withdrawn/.test(e.summary))).toHaveLength(1);
    expect(Number((await t.db('measure_links').where({ id }).first()).revoked_at)).toBe(START);
  });

  it('when the owner of another shop revokes it, then it answers 404 and the customer can still answer', async () => {
    const { order, token, id } = await openRequest();
    const res = await request(t.app).delete(`/api/measurement-requests/${id}`).set('Cookie', w.outsider.cookie).expect(404);
    expect(res.body.error.code).toBe('not_found');
    expect((await orderOf(order.id)).measurementRequests[0]!.revoked).toBe(false);
    await request(t.app).post(`/api/measure/${token}`).send(answer).expect(201);
  });

  it('when an apprentice revokes a request, then it is allowed exactly as sending one is (both follow the permission table)', async () => {
    expect(can('apprentice', 'orders.measurementRequestRevoke')).toBe(can('apprentice', 'orders.requestMeasurement'));
    const { order, token, id } = await openRequest(w.apprentice);
    const want = can('apprentice', 'orders.measurementRequestRevoke') ? 204 : 403;
    await request(t.app).delete(`/api/measurement-requests/${id}`).set('Cookie', w.apprentice.cookie).expect(want);
    expect((await orderOf(order.id)).measurementRequests[0]!.revoked).toBe(want === 204);
    await request(t.app).get(`/api/measure/${token}`).expect(want === 204 ? 410 : 200);
  });

  it('when nobody is signed in, then revoking answers 401 and the link still works', async () => {
    const { token, id } = await openRequest();
    await request(t.app).delete(`/api/measurement-requests/${id}`).expect(401);
    await request(t.app).get(`/api/measure/${token}`).expect(200);
  });

  it('when the customer has answered already, then revoking is refused (409) and the answer stands', async () => {
    const { order, token, id } = await openRequest();
    await request(t.app).post(`/api/measure/${token}`).send(answer).expect(201);
    const res = await request(t.app).delete(`/api/measurement-requests/${id}`).set('Cookie', w.maker.cookie).expect(409);
    expect(res.body.error).toMatchObject({ code: 'request_answered', message: 'The customer has answered this request already, so there is nothing to withdraw.' });
    const o = await orderOf(order.id);
    expect(o.measurementRequests[0]).toMatchObject({ revoked: false, answeredAt: new Date(START).toISOString() });
    expect(o.girthMm).toBe(350.5);
  });

  it('when the id is not a number or does not exist, then it answers 404', async () => {
    await request(t.app).delete('/api/measurement-requests/abc').set('Cookie', w.maker.cookie).expect(404);
    await request(t.app).delete('/api/measurement-requests/99999').set('Cookie', w.maker.cookie).expect(404);
  });

  it('when a request runs out and is then revoked, then the order says both expired and revoked and the page still answers 410', async () => {
    const { order, token, id } = await openRequest();
    clock = START + 14 * 24 * HOUR;
    await request(t.app).delete(`/api/measurement-requests/${id}`).set('Cookie', w.maker.cookie).expect(204);
    expect((await orderOf(order.id)).measurementRequests[0]).toMatchObject({ expired: true, revoked: true });
    expect((await request(t.app).get(`/api/measure/${token}`).expect(410)).body.error.code).toBe('link_expired');
  });
});
