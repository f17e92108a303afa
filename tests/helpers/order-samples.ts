// Sample requests of the orders and customers routes for the permission matrix
// (tests/api/permissions.test.ts): one request per action that succeeds for an allowed actor.
// 'pattern' scope = an object of the main shop (another shop's owner gets 404); 'shop' = the
// asker's own shop; 'public' = a customer's link (the token is the permission).
import type { Action } from '@shared/schemas/permissions.ts';
import type { TestApp } from './test-app.ts';
import type { Member, ShopWorld } from './shop-world.ts';
import { makeOrder, measureToken, proofLink, samplePng, uploadOrderPhoto, uploadPatternPhoto, type OrderFixture } from './order-world.ts';

type Scope = 'pattern' | 'shop' | 'public';
interface Sample {
  path: string;
  body?: unknown;
  headers?: Record<string, string>;
  attach?: { field: string; content: string | Buffer; filename: string };
}
type Ctx = { t: TestApp; w: ShopWorld; who: string; me: Member | null };
type OrderAction = Extract<Action, `customers.${string}` | `wearers.${string}` | `measurements.${string}` | `orders.${string}` | `patterns.photos.${string}` | `pricing.${string}` | `measure.${string}` | `proof.${string}`>;

/** One order per test app, made by the maker (shared by the samples that only read or edit it). */
const fixtures = new WeakMap<TestApp, Promise<OrderFixture>>();
const fixture = ({ t, w }: Ctx) => {
  let f = fixtures.get(t);
  if (!f) {
    f = makeOrder(t, w);
    fixtures.set(t, f);
  }
  return f;
};
const orderId = async (c: Ctx) => (await fixture(c)).order.id;
const photoOf = new WeakMap<TestApp, Promise<number>>();
const orderPhoto = async (c: Ctx) => {
  let p = photoOf.get(c.t);
  if (!p) {
    p = orderId(c).then((id) => uploadOrderPhoto(c.t, id, c.w.maker));
    photoOf.set(c.t, p);
  }
  return p;
};
const patternPhotoOf = new WeakMap<TestApp, Promise<number>>();
const patternPhoto = async (c: Ctx) => {
  let p = patternPhotoOf.get(c.t);
  if (!p) {
    p = uploadPatternPhoto(c.t, c.w.collar.pattern.id, c.w.maker);
    patternPhotoOf.set(c.t, p);
  }
  return p;
};
const pid = (c: Ctx) => c.w.collar.pattern.id;

export const ORDER_SAMPLES: Record<OrderAction, { scope: Scope; make: (c: Ctx) => Promise<Sample> }> = {
  'customers.list': { scope: 'shop', make: async () => ({ path: '/api/customers' }) },
  'customers.create': { scope: 'shop', make: async () => ({ path: '/api/customers', body: { name: 'Hollis Tarrant', email: 'hollis@customers.example' } }) },
  'customers.read': { scope: 'pattern', make: async (c) => ({ path: `/api/customers/${(await fixture(c)).customerId}` }) },
  'customers.update': { scope: 'pattern', make: async (c) => ({ path: `/api/customers/${(await fixture(c)).customerId}`, body: { phone: '+44 1632 960999' } }) },
  'wearers.create': { scope: 'pattern', make: async (c) => ({ path: `/api/customers/${(await fixture(c)).customerId}/wearers`, body: { name: 'Biscuit', kind: 'dog' } }) },
  'wearers.update': { scope: 'pattern', make: async (c) => ({ path: `/api/wearers/${(await fixture(c)).wearerId}`, body: { notes: 'Pulls on the lead' } }) },
  'measurements.list': { scope: 'pattern', make: async (c) => ({ path: `/api/wearers/${(await fixture(c)).wearerId}/measurements` }) },
  'measurements.create': {
    scope: 'pattern',
    make: async (c) => ({ path: `/api/wearers/${(await fixture(c)).wearerId}/measurements`, body: { girthMm: 360, unit: 'cm', part: 'neck', method: 'string-and-ruler' } }),
  },
  'orders.list': { scope: 'shop', make: async () => ({ path: '/api/orders?active=true' }) },
  'orders.create': {
    scope: 'pattern',
    make: async (c) => ({ path: '/api/orders', body: { wearerId: (await fixture(c)).wearerId, patternId: pid(c), fit: { from: 'later' }, dueDate: '2027-04-01' } }),
  },
  'orders.read': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}` }) },
  'orders.update': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}`, body: { notes: 'Initials on the keeper' } }) },
  'orders.move': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/stage`, body: { stage: 'cut' } }) },
  'orders.jobSheet': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/job-sheet.pdf?paper=a4` }) },
  'orders.requestMeasurement': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/measurement-request`, body: {} }) },
  'orders.measurementRequestRevoke': { scope: 'pattern', make: async (c) => ({ path: `/api/measurement-requests/${(await measureToken(c.t, await orderId(c), c.w.maker)).id}` }) },
  'orders.proof': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/proof`, body: {} }) },
  'orders.proofRevoke': { scope: 'pattern', make: async (c) => ({ path: `/api/proofs/${(await proofLink(c.t, await orderId(c), c.w.maker)).id}` }) },
  'orders.photos.list': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/photos` }) },
  'orders.photos.upload': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/photos`, attach: { field: 'file', content: await samplePng(), filename: 'fit.png' } }) },
  'orders.photos.file': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/photos/${await orderPhoto(c)}` }) },
  'orders.photos.thumb': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/photos/${await orderPhoto(c)}/thumb` }) },
  'orders.photos.delete': { scope: 'pattern', make: async (c) => ({ path: `/api/orders/${await orderId(c)}/photos/${await uploadOrderPhoto(c.t, await orderId(c), c.w.maker)}` }) },
  'patterns.photos.list': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/photos` }) },
  'patterns.photos.upload': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/photos`, attach: { field: 'file', content: await samplePng(), filename: 'collar.png' } }) },
  'patterns.photos.file': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/photos/${await patternPhoto(c)}` }) },
  'patterns.photos.thumb': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/photos/${await patternPhoto(c)}/thumb` }) },
  'patterns.photos.delete': { scope: 'pattern', make: async (c) => ({ path: `/api/patterns/${pid(c)}/photos/${await uploadPatternPhoto(c.t, pid(c), c.w.maker)}` }) },
  'pricing.read': { scope: 'shop', make: async () => ({ path: '/api/shop/pricing' }) },
  'pricing.update': {
    scope: 'shop',
    make: async () => ({ path: '/api/shop/pricing', body: { currency: 'GBP', wasteFactor: 1.3, hourlyRateCents: 3200, leathers: [{ id: 'bridle-chestnut', name: 'Bridle, chestnut', pricePerSqFtCents: 1150 }] } }),
  },
  'measure.view': { scope: 'public', make: async (c) => ({ path: `/api/measure/${(await measureToken(c.t, await orderId(c), c.w.maker)).token}` }) },
  'measure.answer': {
    scope: 'public',
    make: async (c) => ({ path: `/api/measure/${(await measureToken(c.t, await orderId(c), c.w.maker)).token}`, body: { unit: 'in', girthMm: 355.6, confirmGirthMm: 358.8 } }),
  },
  'proof.view': { scope: 'public', make: async (c) => ({ path: `/api/proof/${(await proofLink(c.t, await orderId(c), c.w.maker)).token}` }) },
  'proof.approve': { scope: 'public', make: async (c) => ({ path: `/api/proof/${(await proofLink(c.t, await orderId(c), c.w.maker)).token}/approve`, body: {} }) },
  'proof.change': {
    scope: 'public',
    make: async (c) => ({ path: `/api/proof/${(await proofLink(c.t, await orderId(c), c.w.maker)).token}/change`, body: { message: 'Could the keeper be a little wider?' } }),
  },
  'proof.photo': { scope: 'public', make: async (c) => ({ path: `/api/proof/${(await proofLink(c.t, await orderId(c), c.w.maker)).token}/photos/${await orderPhoto(c)}` }) },
  'proof.thumb': { scope: 'public', make: async (c) => ({ path: `/api/proof/${(await proofLink(c.t, await orderId(c), c.w.maker)).token}/photos/${await orderPhoto(c)}/thumb` }) },
};
