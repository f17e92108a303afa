// Orders fixtures for API tests, made through the API as a shop member would: a customer
// with a dog measured at the bench, an order of the world's collar at that girth, photos,
// proof links and measuring links.
import request from 'supertest';
import sharp from 'sharp';
import type { OrderDetail } from '@shared/schemas/order-views.ts';
import type { TestApp } from './test-app.ts';
import type { Member, ShopWorld } from './shop-world.ts';

export interface OrderFixture {
  customerId: number;
  wearerId: number;
  measurementId: number;
  order: OrderDetail;
}

let customers = 0;

/** A customer (with an e-mail), their dog measured 355.6 mm (14 in) at the neck, and an order of the collar. */
export async function makeOrder(t: TestApp, w: ShopWorld, by: Member = w.maker, over: Record<string, unknown> = {}): Promise<OrderFixture> {
  customers += 1;
  const c = await request(t.app)
    .post('/api/customers')
    .set('Cookie', by.cookie)
    .send({ name: `Odile Brann ${customers}`, email: `odile${customers}@customers.example`, phone: '+44 1632 960123' })
    .expect(201);
  const customerId = c.body.customer.id as number;
  const wr = await request(t.app).post(`/api/customers/${customerId}/wearers`).set('Cookie', by.cookie).send({ name: 'Pepper', kind: 'dog' }).expect(201);
  const wearerId = wr.body.wearer.id as number;
  const m = await request(t.app)
    .post(`/api/wearers/${wearerId}/measurements`)
    .set('Cookie', by.cookie)
    .send({ girthMm: 355.6, unit: 'in', part: 'neck', method: 'soft-tape' })
    .expect(201);
  const o = await request(t.app)
    .post('/api/orders')
    .set('Cookie', by.cookie)
    .send({ wearerId, patternId: w.collar.pattern.id, fit: { from: 'measurement' }, dueDate: '2027-03-14', leatherColour: 'Chestnut', leatherFinish: 'Burnished edges', thread: 'Natural 0.8 mm', ...over })
    .expect(201);
  return { customerId, wearerId, measurementId: m.body.measurement.id, order: o.body.order };
}

let png: Promise<Buffer> | undefined;
/** A small real PNG (64 x 48, saddle brown). */
export function samplePng(): Promise<Buffer> {
  png ??= sharp({ create: { width: 64, height: 48, channels: 3, background: '#8b4513' } }).png().toBuffer();
  return png;
}

/** Uploads the sample PNG to an order; returns the photo id. */
export async function uploadOrderPhoto(t: TestApp, orderId: number, by: Member): Promise<number> {
  const res = await request(t.app).post(`/api/orders/${orderId}/photos`).set('Cookie', by.cookie).attach('file', await samplePng(), 'pepper.png').expect(201);
  return res.body.photo.id;
}

/** Uploads the sample PNG to a pattern; returns the photo id. */
export async function uploadPatternPhoto(t: TestApp, patternId: number, by: Member): Promise<number> {
  const res = await request(t.app).post(`/api/patterns/${patternId}/photos`).set('Cookie', by.cookie).attach('file', await samplePng(), 'collar.png').expect(201);
  return res.body.photo.id;
}

/** A new proof link of the order; its token and id. */
export async function proofLink(t: TestApp, orderId: number, by: Member): Promise<{ token: string; id: number }> {
  const res = await request(t.app).post(`/api/orders/${orderId}/proof`).set('Cookie', by.cookie).send({}).expect(201);
  return { token: res.body.token, id: res.body.proof.id };
}

/** Sends a measuring request for the order and reads its token from the fake mailbox (and the request's id from the answer). */
export async function measureToken(t: TestApp, orderId: number, by: Member): Promise<{ token: string; mailText: string; id: number }> {
  const before = t.mailbox.messages().length;
  const res = await request(t.app).post(`/api/orders/${orderId}/measurement-request`).set('Cookie', by.cookie).send({}).expect(201);
  const mail = await t.mailbox.waitFor((m) => m.id > before && /\/measure\//.test(m.text));
  return { token: /\/measure\/([A-Za-z0-9_-]{43})/.exec(mail.text)![1]!, mailText: mail.text, id: res.body.request.id };
}
