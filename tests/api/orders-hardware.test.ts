// An order's hardware lines through the API: the order view says whether the lines were chosen
// (the edit form opens on "Choose lines") or matched from the pattern (stored null), and a bad
// line is refused at its own path with a message naming the field by its label.
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
  await request(t.app)
    .put('/api/shop/standards')
    .set('Cookie', w.owner.cookie)
    .send({
      units: 'in',
      hardware: [
        { id: 'buckle-1in', kind: 'buckle', name: '1 in roller buckle', insideWidthMm: 25.4, unitCostCents: 450 },
        { id: 'plate', kind: 'other', name: 'Brass name plate', unitCostCents: 975 },
      ],
    })
    .expect(200);
});
afterEach(async () => {
  await t.close();
});

const patch = (id: number, body: Record<string, unknown>) => request(t.app).patch(`/api/orders/${id}`).set('Cookie', w.maker.cookie).send(body);

describe('order hardware lines', () => {
  it('when an order is made without lines, then its view carries the matched lines and says they were not chosen', async () => {
    const { order } = await makeOrder(t, w, w.maker);
    expect(order.hardwareChosen).toBe(false);
    expect(order.hardware).toContainEqual({ itemId: 'buckle-1in', quantity: 1 });
  });

  it('when lines are chosen and then put back to the pattern, then the view, the price and the stored value follow', async () => {
    const { order } = await makeOrder(t, w, w.maker);
    const chosen = (await patch(order.id, { hardware: [{ itemId: 'plate', quantity: '2' }] }).expect(200)).body.order as OrderDetail;
    expect(chosen.hardwareChosen).toBe(true);
    expect(chosen.hardware).toEqual([{ itemId: 'plate', quantity: 2 }]);
    expect(chosen.price!.hardware).toEqual([{ itemId: 'plate', name: 'Brass name plate', quantity: 2, unitCostCents: 975, cents: 1950 }]);
    const back = (await patch(order.id, { hardware: null }).expect(200)).body.order as OrderDetail;
    expect(back.hardwareChosen).toBe(false);
    expect(back.price!.hardware.map((h) => h.itemId)).toEqual(['buckle-1in']);
    expect((await t.db('orders').where({ id: order.id }).first('hardware')).hardware).toBeNull();
  });

  it('when a line has no item or a quantity of 51, then each is refused at its own line by its label', async () => {
    const { order } = await makeOrder(t, w, w.maker);
    const res = await patch(order.id, { hardware: [{ itemId: '', quantity: 1 }, { itemId: 'plate', quantity: 51 }] }).expect(400);
    expect(res.body.error.fields).toEqual({ 'hardware.0.itemId': 'Hardware item is required', 'hardware.1.quantity': 'Hardware quantity must be at most 50' });
  });
});
