// Demo patterns of Harrow & Finch, each with a short history. Runs after 01-demo-shop.ts,
// which deletes (and so resets) everything of the demo shop first.
import type { Knex } from 'knex';
import { computeLayout } from '../../shared/pattern/compute-layout.ts';
import { ENGINE_VERSION } from '../../shared/pattern/engine-version.ts';
import { parseSpec } from '../../shared/pattern/parse-spec.ts';
import { presetSpec } from '../../shared/pattern/presets/index.ts';
import type { StrapSpec } from '../../shared/schemas/strap-spec.ts';
import { DEMO_SHOP } from './01-demo-shop.ts';

const INCH_MM = 25.4;
const DAY_MS = 86_400_000;

interface DemoPattern {
  name: string;
  tags: string[];
  createdBy: string;
  revisions: Array<{ by: string; note: string; spec: StrapSpec; daysAgo: number }>;
}

function demoPatterns(): DemoPattern[] {
  const collar = presetSpec('collar');
  const belt = presetSpec('belt');
  const watch = presetSpec('watch-strap');
  return [
    {
      name: "Juniper's collar",
      tags: ['dog', 'juniper'],
      createdBy: 'tobias@harrowfinch.example',
      revisions: [
        { by: 'tobias@harrowfinch.example', note: 'First draft from the collar preset, loose neck 13 in.', spec: collar, daysAgo: 21 },
        { by: 'tobias@harrowfinch.example', note: 'Juniper measured again: 13 1/2 in loose.', spec: { ...collar, girthMm: 13.5 * INCH_MM }, daysAgo: 9 },
        { by: 'maren@harrowfinch.example', note: 'Lighter leather for summer: 8 oz.', spec: { ...collar, girthMm: 13.5 * INCH_MM, thickness: { unit: 'oz', value: 8 } }, daysAgo: 2 },
      ],
    },
    {
      name: 'Belt, order 1043 (Ed Marsh)',
      tags: ['belt', 'order-1043'],
      createdBy: 'maren@harrowfinch.example',
      revisions: [
        { by: 'maren@harrowfinch.example', note: 'Order 1043: 36 in waist, heel-bar buckle.', spec: { ...belt, name: 'Belt for Ed Marsh', girthMm: 36 * INCH_MM }, daysAgo: 6 },
        { by: 'tobias@harrowfinch.example', note: 'Customer asked for one size up.', spec: { ...belt, name: 'Belt for Ed Marsh', girthMm: 37 * INCH_MM }, daysAgo: 1 },
      ],
    },
    {
      name: 'Shop stock collars, XS to XL',
      tags: ['dog', 'stock'],
      createdBy: 'maren@harrowfinch.example',
      revisions: [
        {
          by: 'maren@harrowfinch.example',
          note: 'Graded run for the market stall: loose neck 10 to 18 in.',
          spec: {
            ...collar,
            name: 'Stock collar',
            sizes: ['XS', 'S', 'M', 'L', 'XL'].map((name, i) => ({ name, girthMm: (10 + 2 * i) * INCH_MM })),
          },
          daysAgo: 12,
        },
      ],
    },
    {
      name: 'Watch strap, 20 mm lugs',
      tags: ['watch'],
      createdBy: 'tobias@harrowfinch.example',
      revisions: [{ by: 'tobias@harrowfinch.example', note: 'Shop standard two-piece strap.', spec: watch, daysAgo: 4 }],
    },
  ];
}

export async function seed(knex: Knex): Promise<void> {
  const shop = await knex('shops').where({ name: DEMO_SHOP }).first<{ id: number } | undefined>();
  if (!shop) throw new Error(`run 01-demo-shop first: no shop "${DEMO_SHOP}"`);
  const users = new Map((await knex('users').select('id', 'email')).map((u: { id: number; email: string }) => [u.email, u.id]));
  const now = Date.now();
  await knex.transaction(async (trx) => {
    for (const p of demoPatterns()) {
      const last = p.revisions.at(-1)!;
      const [row] = await trx('patterns')
        .insert({
          shop_id: shop.id,
          name: p.name,
          kind: last.spec.kind,
          tags: JSON.stringify(p.tags),
          archived: false,
          head_number: p.revisions.length,
          created_by: users.get(p.createdBy),
          created_at: now - p.revisions[0]!.daysAgo * DAY_MS,
          updated_at: now - last.daysAgo * DAY_MS,
        })
        .returning<{ id: number }[]>('id');
      for (const [i, r] of p.revisions.entries()) {
        // Demo data must be what the app itself would accept: schema-valid and drawable.
        const spec = parseSpec(r.spec);
        computeLayout(spec);
        for (const size of spec.sizes) computeLayout({ ...spec, girthMm: size.girthMm });
        await trx('revisions').insert({
          pattern_id: row!.id,
          number: i + 1,
          spec: JSON.stringify(spec),
          engine_version: ENGINE_VERSION,
          author_id: users.get(r.by),
          note: r.note,
          restored_from: null,
          created_at: now - r.daysAgo * DAY_MS,
        });
      }
      const followers = new Set([p.createdBy, ...p.revisions.map((r) => r.by)]);
      for (const email of followers) await trx('pattern_follows').insert({ pattern_id: row!.id, user_id: users.get(email), created_at: now });
    }
  });
}
