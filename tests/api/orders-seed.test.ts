// The demo orders seed: fictional customers, dogs and people, measurements over time and
// orders at every stage for Harrow & Finch; running the seeds again gives the same demo.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ORDER_STAGES } from '@shared/schemas/orders.ts';
import type { OrderDetail, OrderSummary } from '@shared/schemas/order-views.ts';
import { DEMO_HARDWARE, seedDemoHardware } from '../../db/demo/demo-hardware.ts';
import { getShopStandards } from '../../server/modules/standards/standards.repository.ts';
import { DEMO_PASSWORD, seed as seedShop } from '../../db/seeds/01-demo-shop.ts';
import { seed as seedPatterns } from '../../db/seeds/02-demo-patterns.ts';
import { seed as seedOrders } from '../../db/seeds/03-demo-orders.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(async () => {
  await t.close();
});

describe('demo orders', () => {
  it('when the seeds run twice, then the demo orders exist once, one at every stage, and the board lists them with prices', async () => {
    for (let i = 0; i < 2; i += 1) {
      await seedShop(t.db);
      await seedPatterns(t.db);
      await seedOrders(t.db);
    }
    expect(await t.db('orders').count<{ n: number }[]>('* as n')).toEqual([{ n: 7 }]);
    const agent = request.agent(t.app);
    await agent.post('/api/auth/sign-in').send({ email: 'ilse@harrowfinch.example', password: DEMO_PASSWORD }).expect(200);
    const items = (await agent.get('/api/orders').expect(200)).body.items as OrderSummary[];
    expect(new Set(items.map((o) => o.stage))).toEqual(new Set(ORDER_STAGES));
    // Every order with a girth has a price (the demo shop prices its leathers).
    expect(items.filter((o) => o.girthMm !== null).every((o) => typeof o.priceCents === 'number' && o.priceCents > 0)).toBe(true);
    const biscuit = (await agent.get(`/api/customers/${items.find((o) => o.wearer.name === 'Biscuit')!.customer.id}`).expect(200)).body;
    const girths = biscuit.wearers[0].measurements.map((m: { girthMm: number }) => m.girthMm);
    expect(girths).toEqual([266.7, 292.1, 311.15, 330.2]); // a growing puppy, oldest first
  });

  it("when the demo is seeded, then Juniper's collar is priced with its hardware: 650 + 2 x 185 + 2 x 22 cents (worked by hand) beside leather and bench time", async () => {
    await seedShop(t.db);
    await seedPatterns(t.db);
    await seedOrders(t.db);
    const agent = request.agent(t.app);
    await agent.post('/api/auth/sign-in').send({ email: 'ilse@harrowfinch.example', password: DEMO_PASSWORD }).expect(200);
    const items = (await agent.get('/api/orders').expect(200)).body.items as OrderSummary[];
    const done = items.find((o) => o.pattern.name === "Juniper's collar" && o.stage === 'handed-over')!;
    const p = ((await agent.get(`/api/orders/${done.id}`).expect(200)).body.order as OrderDetail).price!;
    // The collar's 1 in buckle and two 1 in D-rings, and its two rivets through two layers of
    // 10 oz (post about 10 mm, common practice) take the 11 mm post, not the 8 mm.
    expect(p.hardware.map((h) => [h.name, h.quantity, h.cents])).toEqual([
      ['1 in centre-bar buckle, solid brass', 1, 650],
      ['1 in D-ring, solid brass', 2, 370],
      ['Double-cap rivet, long post (11 mm)', 2, 44],
    ]);
    // Leather by hand: blank area x 1.3 waste / 92 903.04 mm² per sq ft x 12.50 a sq ft (bridle).
    expect(p.leather.cents).toBe(Math.round(((p.leather.blankAreaMm2 * 1.3) / 92903.04) * 1250));
    // Bench: 75 min x 35.00 an hour = 43.75.
    expect(p.bench.cents).toBe(4375);
    expect(p.pieceCents).toBe(p.leather.cents + 650 + 370 + 44 + 4375);
    expect(p.missing).toEqual([]);
    expect(done.priceCents).toBe(p.pieceCents);
  });

  it("when the demo hardware is seeded again over an owner's own item, then each demo item is there once and the owner's item stays", async () => {
    await seedShop(t.db);
    const shop = await t.db('shops').where({ name: 'Harrow & Finch Leatherworks' }).first<{ id: number }>();
    const owner = await t.db('users').where({ email: 'maren@harrowfinch.example' }).first<{ id: number }>();
    await seedDemoHardware(t.db, shop.id, owner.id, 1);
    const before = await getShopStandards(t.db, shop.id);
    const own = { id: 'conway-buckle', kind: 'buckle' as const, name: 'Conway buckle, nickel', insideWidthMm: 25.4, unitCostCents: 310 };
    await t.db('shop_standards').where({ shop_id: shop.id }).update({ document: JSON.stringify({ ...before, hardware: [own, ...before.hardware] }) });
    await seedDemoHardware(t.db, shop.id, owner.id, 2);
    const after = (await getShopStandards(t.db, shop.id)).hardware;
    expect(after.map((h) => h.id)).toEqual(['conway-buckle', ...DEMO_HARDWARE.map((h) => h.id)]);
    expect(after.every((h) => h.unitCostCents > 0)).toBe(true);
  });
});
