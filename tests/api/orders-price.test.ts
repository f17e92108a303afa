// An order's price: leather (blank area x the shop's waste factor, in square feet, at the
// leather's price per square foot) + hardware (the shop's unit costs) + bench time (the
// hourly rate), per piece, times the quantity; integer cents. The sum is worked by hand here.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { specAtGirth } from '@shared/pattern/spec-at-girth.ts';
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

const PRICING = { currency: 'GBP', wasteFactor: 1.25, hourlyRateCents: 3000, leathers: [{ id: 'bridle-chestnut', name: 'Bridle, chestnut', pricePerSqFtCents: 1200 }] };
const HARDWARE = [
  { id: 'buckle-1in', kind: 'buckle', name: '1 in roller buckle', insideWidthMm: 25.4, unitCostCents: 450 },
  { id: 'dring-1in', kind: 'd-ring', name: '1 in D-ring', insideWidthMm: 25.4, unitCostCents: 120 },
  { id: 'rivet-8', kind: 'rivet', name: 'Double cap rivet, 8 mm post', postLengthMm: 8, unitCostCents: 15 },
];

describe('price', () => {
  it('when the shop has prices, then the order price is leather + hardware + bench, per piece, times the quantity (worked by hand)', async () => {
    await request(t.app).put('/api/shop/pricing').set('Cookie', w.owner.cookie).send(PRICING).expect(200);
    await request(t.app).put('/api/shop/standards').set('Cookie', w.owner.cookie).send({ units: 'in', hardware: HARDWARE }).expect(200);
    const { order } = await makeOrder(t, w, w.apprentice, { leatherId: 'bridle-chestnut', benchMinutes: 90, quantity: 2, hardware: [{ itemId: 'buckle-1in', quantity: 1 }, { itemId: 'dring-1in', quantity: 1 }, { itemId: 'rivet-8', quantity: 2 }] });
    const p = (order as OrderDetail).price!;
    // The blanks of the collar preset at 14 in (355.6 mm), from the engine's cut list.
    const blanks = computeLayout(specAtGirth(presetSpec('collar'), { girthMm: 355.6 })).cutList.blanks;
    const area = blanks.reduce((a, b) => a + b.lengthMm * b.widthMm * b.count, 0);
    expect(p.leather.blankAreaMm2).toBe(Math.round(area));
    // By hand: 1 sq ft = 304.8 mm x 304.8 mm = 92 903.04 mm².
    const leatherCents = Math.round(((area * 1.25) / 92903.04) * 1200);
    expect(p.leather.cents).toBe(leatherCents);
    // Hardware: 450 + 120 + 2 x 15 = 600 cents. Bench: 90 min x 3000 / 60 = 4500 cents.
    expect(p.hardware.map((h) => h.cents)).toEqual([450, 120, 30]);
    expect(p.bench.cents).toBe(4500);
    expect(p.pieceCents).toBe(leatherCents + 600 + 4500);
    expect(p.totalCents).toBe(2 * (leatherCents + 600 + 4500));
    expect(p.missing).toEqual([]);
    expect(order.priceCents).toBe(p.totalCents);
    expect(order.currency).toBe('GBP');
  });

  it('when the collar is 1 in x 18 in of blank, then its leather at 1.25 waste and 12.00 a sq ft is 1.88 (a figure checked on paper)', async () => {
    // 25.4 x 457.2 = 11 612.88 mm²; x 1.25 = 14 516.1 mm² = 0.15625 sq ft; x 1200 = 187.5 -> 188 cents.
    const { priceOrder } = await import('../../server/modules/pricing/price-order.ts');
    const layout = { cutList: { blanks: [{ pieceId: 'strap', name: 'Strap', count: 1, lengthMm: 457.2, widthMm: 25.4, thicknessMm: 4 }], hardware: [], fasteners: [], punches: [], threadMm: 0 } };
    const p = priceOrder({ layout: layout as never, pricing: PRICING, leatherId: 'bridle-chestnut', hardware: [], hardwareItems: [], benchMinutes: 0, quantity: 1 });
    expect(p.leather.areaSqFt).toBe(0.156);
    expect(p.leather.cents).toBe(188);
    expect(p.totalCents).toBe(188);
  });

  it("when hardware chosen on an order leaves the shop's list, then the price says so in words, never by the item's id", async () => {
    await request(t.app).put('/api/shop/standards').set('Cookie', w.owner.cookie).send({ units: 'in', hardware: HARDWARE }).expect(200);
    const { order } = await makeOrder(t, w, w.maker, { hardware: [{ itemId: 'buckle-1in', quantity: 1 }] });
    await request(t.app).put('/api/shop/standards').set('Cookie', w.owner.cookie).send({ units: 'in', hardware: HARDWARE.slice(1) }).expect(200);
    const p = ((await request(t.app).get(`/api/orders/${order.id}`).set('Cookie', w.maker.cookie).expect(200)).body.order as OrderDetail).price!;
    expect(p.missing).toContain("A hardware item of this order is no longer in the shop's hardware list: choose its hardware again");
    expect(p.hardware).toEqual([{ itemId: 'buckle-1in', name: 'Hardware no longer in the list', quantity: 1, unitCostCents: 0, cents: 0 }]);
    expect(JSON.stringify([p.missing, p.hardware.map((h) => h.name)])).not.toContain('buckle-1in');
  });

  it('when the leather has no price, then the order says what is missing and shows no price on the board', async () => {
    const { order } = await makeOrder(t, w, w.maker, { leatherId: 'shell-cordovan' });
    expect(order.priceCents).toBeNull();
    expect(order.price!.missing).toContain('This leather has no price in the shop pricing');
  });

  it('when a maker tries to change the prices, then it is refused (owners only), and refusals name the field by its label', async () => {
    await request(t.app).put('/api/shop/pricing').set('Cookie', w.maker.cookie).send(PRICING).expect(403);
    const bad = await request(t.app).put('/api/shop/pricing').set('Cookie', w.owner.cookie).send({ ...PRICING, wasteFactor: 0.5, currency: 'pounds' }).expect(400);
    expect(bad.body.error.fields).toEqual({ currency: 'Currency must be a three-letter code such as USD', wasteFactor: 'Waste factor must be at least 1' });
  });
});
