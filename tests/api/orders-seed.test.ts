// The demo orders seed: fictional customers, dogs and people, measurements over time and
// orders at every stage for Harrow & Finch; running the seeds again gives the same demo.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ORDER_STAGES } from '@shared/schemas/orders.ts';
import type { OrderSummary } from '@shared/schemas/order-views.ts';
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
});
