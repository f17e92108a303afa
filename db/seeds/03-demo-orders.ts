// Demo customers, their dogs and people, measurements over time and orders at every stage
// for Harrow & Finch (all fictional), plus the shop's pricing and its hardware's unit costs. Runs after 02-demo-patterns.ts;
// 01-demo-shop.ts deletes the demo shop first, and everything here goes with it, so running
// the seeds again gives the same demo.
import type { Knex } from 'knex';
import { computeLayout } from '../../shared/pattern/compute-layout.ts';
import { specAtGirth } from '../../shared/pattern/spec-at-girth.ts';
import type { OrderStage } from '../../shared/schemas/orders.ts';
import { ORDER_STAGES, ORDER_STAGE_LABELS } from '../../shared/schemas/orders.ts';
import type { StrapSpec } from '../../shared/schemas/strap-spec.ts';
import { formatLength } from '../../shared/units/format-length.ts';
import { seedDemoHardware } from '../demo/demo-hardware.ts';
import { DEMO_SHOP } from './01-demo-shop.ts';

const IN = 25.4;
const DAY = 86_400_000;

const PRICING = {
  currency: 'USD',
  wasteFactor: 1.3,
  hourlyRateCents: 3500,
  leathers: [
    { id: 'bridle-chestnut', name: 'Bridle, chestnut', pricePerSqFtCents: 1250 },
    { id: 'veg-tan-natural', name: 'Vegetable-tanned, natural', pricePerSqFtCents: 950 },
    { id: 'latigo-black', name: 'Latigo, black', pricePerSqFtCents: 1100 },
  ],
};

interface DemoOrder {
  pattern: string;
  size?: string;
  stage: OrderStage;
  dueInDays: number;
  leatherId: string;
  colour: string;
  finish: string;
  thread: string;
  notes: string;
  benchMinutes: number;
  quantity?: number;
}
interface DemoCustomer {
  name: string;
  email: string;
  phone: string;
  notes: string;
  wearer: { name: string; kind: string; notes: string };
  /** [days ago, girth mm, part] oldest first. */
  measurements: Array<[number, number, string]>;
  orders: DemoOrder[];
}

const CUSTOMERS: DemoCustomer[] = [
  {
    name: 'Wren Castellane',
    email: 'wren.castellane@example.com',
    phone: '+1 555 0142',
    notes: 'Prefers a text before collection.',
    wearer: { name: 'Juniper', kind: 'dog', notes: 'Lurcher, pulls when she sees squirrels.' },
    measurements: [[60, 13 * IN, 'neck'], [12, 13.5 * IN, 'neck']],
    orders: [
      { pattern: "Juniper's collar", stage: 'handed-over', dueInDays: -20, leatherId: 'bridle-chestnut', colour: 'Chestnut', finish: 'Burnished edges', thread: 'Natural linen 0.8 mm', notes: 'Initials J on the keeper.', benchMinutes: 75 },
      { pattern: "Juniper's collar", stage: 'assembled', dueInDays: 4, leatherId: 'latigo-black', colour: 'Black', finish: 'Painted edges', thread: 'Black polyester 0.8 mm', notes: 'Spare collar for the beach.', benchMinutes: 75 },
    ],
  },
  {
    name: 'Ed Marsh',
    email: 'ed.marsh@example.com',
    phone: '+1 555 0187',
    notes: '',
    wearer: { name: 'Ed Marsh', kind: 'person', notes: 'Wears it with jeans.' },
    measurements: [[8, 37 * IN, 'waist']],
    orders: [{ pattern: 'Belt, order 1043 (Ed Marsh)', stage: 'cut', dueInDays: 9, leatherId: 'veg-tan-natural', colour: 'Natural, to darken', finish: 'Neatsfoot oil', thread: 'Saddle tan 1 mm', notes: 'Heel-bar buckle from stock.', benchMinutes: 120 }],
  },
  {
    name: 'Hollis Tarrant',
    email: 'hollis.tarrant@example.com',
    phone: '',
    notes: 'Market stall regular.',
    wearer: { name: 'Biscuit', kind: 'dog', notes: 'Corgi puppy: growing, recheck the fit monthly.' },
    // A growing puppy: the chart on the customer screen climbs.
    measurements: [[90, 10.5 * IN, 'neck'], [60, 11.5 * IN, 'neck'], [30, 12.25 * IN, 'neck'], [3, 13 * IN, 'neck']],
    orders: [
      { pattern: 'Shop stock collars, XS to XL', size: 'S', stage: 'punched', dueInDays: 2, leatherId: 'bridle-chestnut', colour: 'Chestnut', finish: 'Burnished edges', thread: 'Natural linen 0.8 mm', notes: '', benchMinutes: 45 },
      { pattern: 'Shop stock collars, XS to XL', size: 'M', stage: 'ready-to-cut', dueInDays: 40, leatherId: 'bridle-chestnut', colour: 'Chestnut', finish: 'Burnished edges', thread: 'Natural linen 0.8 mm', notes: 'The next size up, for when Biscuit grows.', benchMinutes: 45 },
    ],
  },
  {
    name: 'Priya Anand',
    email: 'priya.anand@example.com',
    phone: '+1 555 0119',
    notes: '',
    wearer: { name: 'Priya Anand', kind: 'person', notes: '' },
    measurements: [[5, 165, 'wrist']],
    orders: [{ pattern: 'Watch strap, 20 mm lugs', stage: 'finished', dueInDays: 1, leatherId: 'veg-tan-natural', colour: 'Tan', finish: 'Wax', thread: 'Cream 0.6 mm', notes: 'Gift: wrap it.', benchMinutes: 90 }],
  },
  {
    name: 'Rosalind Achebe',
    email: 'rosalind.achebe@example.com',
    phone: '+1 555 0163',
    notes: 'Found us through Wren.',
    wearer: { name: 'Tam', kind: 'dog', notes: 'Greyhound: narrow head, collar must not slip.' },
    measurements: [],
    orders: [{ pattern: "Juniper's collar", stage: 'waiting-for-measurement', dueInDays: 21, leatherId: 'bridle-chestnut', colour: 'Oxblood', finish: 'Burnished edges', thread: 'Natural linen 0.8 mm', notes: 'Measuring link to send.', benchMinutes: 75 }],
  },
];

const PART_OF: Record<string, string> = { collar: 'neck', belt: 'waist', 'watch-strap': 'wrist' };

export async function seed(knex: Knex): Promise<void> {
  const shop = await knex('shops').where({ name: DEMO_SHOP }).first<{ id: number } | undefined>();
  if (!shop) throw new Error(`run 01-demo-shop first: no shop "${DEMO_SHOP}"`);
  const users = new Map((await knex('users').select('id', 'email')).map((u: { id: number; email: string }) => [u.email, u.id]));
  const maker = users.get('tobias@harrowfinch.example')!;
  const apprentice = users.get('ilse@harrowfinch.example')!;
  const owner = users.get('maren@harrowfinch.example')!;
  const now = Date.now();
  const day = (offset: number) => new Date(now + offset * DAY).toISOString().slice(0, 10);
  await knex.transaction(async (trx) => {
    await trx('shop_pricing').insert({ shop_id: shop.id, document: JSON.stringify(PRICING), updated_by: owner, updated_at: now - 30 * DAY });
    await seedDemoHardware(trx, shop.id, owner, now - 30 * DAY);
    let number = 1040;
    for (const c of CUSTOMERS) {
      const [cust] = await trx('customers').insert({ shop_id: shop.id, name: c.name, email: c.email, phone: c.phone, notes: c.notes, created_by: apprentice, created_at: now - 100 * DAY, updated_at: now - 100 * DAY }).returning<{ id: number }[]>('id');
      const [wearer] = await trx('wearers').insert({ shop_id: shop.id, customer_id: cust!.id, ...c.wearer, created_at: now - 100 * DAY }).returning<{ id: number }[]>('id');
      const measured: Array<{ id: number; girth: number; part: string }> = [];
      for (const [daysAgo, girth, part] of c.measurements) {
        const [m] = await trx('measurements')
          .insert({ shop_id: shop.id, wearer_id: wearer!.id, girth_mm: girth, unit: part === 'wrist' ? 'cm' : 'in', part, method: 'soft-tape', note: '', taken_at: now - daysAgo * DAY, taken_by: maker, taken_by_label: '', created_at: now - daysAgo * DAY })
          .returning<{ id: number }[]>('id');
        measured.push({ id: m!.id, girth, part });
      }
      for (const o of c.orders) {
        const pattern = await trx('patterns').where({ shop_id: shop.id, name: o.pattern }).first<{ id: number; kind: string; head_number: number }>();
        const rev = await trx('revisions').where({ pattern_id: pattern.id, number: pattern.head_number }).first<{ spec: string }>();
        const spec = JSON.parse(rev.spec) as StrapSpec;
        const latest = measured.filter((m) => m.part === PART_OF[pattern.kind]).at(-1);
        const girth = o.size ? spec.sizes.find((s) => s.name === o.size)!.girthMm : (latest?.girth ?? null);
        // Demo data must be what the app itself accepts: drawable at the order's girth.
        if (girth !== null) computeLayout(specAtGirth(spec, o.size ? { sizeName: o.size } : { girthMm: girth }));
        number += 1;
        const taken = now - (30 + number - 1040) * DAY;
        const [order] = await trx('orders')
          .insert({
            shop_id: shop.id, number, customer_id: cust!.id, wearer_id: wearer!.id, pattern_id: pattern.id, revision_number: pattern.head_number,
            fit_from: o.size ? 'size' : girth !== null ? 'measurement' : 'later', size_name: o.size ?? null, measurement_id: o.size || girth === null ? null : latest!.id, girth_mm: girth,
            stage: o.stage, due_date: day(o.dueInDays), quantity: o.quantity ?? 1, leather_id: o.leatherId, leather_colour: o.colour, leather_finish: o.finish, thread: o.thread, notes: o.notes,
            bench_minutes: o.benchMinutes, hardware: null, created_by: apprentice, created_at: taken, updated_at: now - DAY,
          })
          .returning<{ id: number }[]>('id');
        const girthText = girth === null ? 'no girth yet' : `${formatLength(girth, spec.units)} girth`;
        const first: OrderStage = girth === null ? 'waiting-for-measurement' : 'ready-to-cut';
        await trx('order_events').insert({ order_id: order!.id, user_id: apprentice, by_label: '', kind: 'created', to_stage: first, summary: `Order ${number} taken for ${c.wearer.name}: ${o.pattern}, revision ${pattern.head_number}, ${girthText}${o.size ? ` (size ${o.size})` : ''}.`, detail: '{}', at: taken });
        // One move per stage up to where the order is now, a day apart.
        const path = ORDER_STAGES.slice(ORDER_STAGES.indexOf(first), ORDER_STAGES.indexOf(o.stage) + 1);
        for (const [i, to] of path.slice(1).entries()) {
          const from = path[i]!;
          await trx('order_events').insert({ order_id: order!.id, user_id: i % 2 ? maker : apprentice, by_label: '', kind: 'stage', from_stage: from, to_stage: to, summary: `Moved from ${ORDER_STAGE_LABELS[from]} to ${ORDER_STAGE_LABELS[to]}.`, detail: '{}', at: taken + (i + 1) * DAY });
        }
      }
    }
  });
}
