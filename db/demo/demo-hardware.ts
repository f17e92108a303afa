// Harrow & Finch's hardware stock with what each piece costs the shop (fictional, in US cents,
// plausible small-order prices for solid brass and stainless), saved as the shop's standards
// so demo prices show hardware beside leather and bench time. Not in db/seeds/: the Knex CLI
// runs every file there as a seed; 03-demo-orders.ts calls this.
import type { Knex } from 'knex';
import { ShopStandardsSchema, type HardwareItem } from '../../shared/schemas/shop-standards.ts';
import { inToMm as inch } from '../../shared/units/length.ts';
import { createStandardsRepository } from '../../server/modules/standards/standards.repository.ts';

/**
 * The demo shop's hardware. Ids of the built-in starter list are kept (its buckles and rings
 * are what the presets are drawn for) and priced; the rest is added. Rivets and snaps come in
 * post lengths so a two-layer collar (about 10 mm of stack and post) finds a long enough one.
 */
export const DEMO_HARDWARE: HardwareItem[] = [
  { id: 'buckle-1in-centre', kind: 'buckle', name: '1 in centre-bar buckle, solid brass', insideWidthMm: inch(1), tongueLengthMm: 24, tongueWireMm: 3, buckleStyle: 'centre-bar', unitCostCents: 650 },
  { id: 'buckle-1-1-2in-heel', kind: 'buckle', name: '1 1/2 in heel-bar buckle, solid brass', insideWidthMm: inch(1.5), tongueLengthMm: 40, tongueWireMm: 4, buckleStyle: 'heel-bar', unitCostCents: 1450 },
  { id: 'buckle-18mm-watch', kind: 'buckle', name: '18 mm watch buckle, brushed stainless', insideWidthMm: 18, tongueLengthMm: 14, tongueWireMm: 1.5, buckleStyle: 'heel-bar', unitCostCents: 380 },
  { id: 'buckle-20mm-watch', kind: 'buckle', name: '20 mm watch buckle, brushed stainless', insideWidthMm: 20, tongueLengthMm: 15, tongueWireMm: 1.5, buckleStyle: 'heel-bar', unitCostCents: 420 },
  { id: 'd-ring-1in', kind: 'd-ring', name: '1 in D-ring, solid brass', insideWidthMm: inch(1), wireDiameterMm: 4, unitCostCents: 185 },
  { id: 'd-ring-1-1-4in', kind: 'd-ring', name: '1 1/4 in D-ring, solid brass', insideWidthMm: inch(1.25), wireDiameterMm: 4, unitCostCents: 240 },
  { id: 'swivel-3-4in', kind: 'swivel', name: '3/4 in swivel snap, solid brass', insideWidthMm: inch(0.75), wireDiameterMm: 4, unitCostCents: 560 },
  { id: 'swivel-1in', kind: 'swivel', name: '1 in swivel snap, solid brass', insideWidthMm: inch(1), wireDiameterMm: 5, unitCostCents: 720 },
  { id: 'snap-line-20', kind: 'snap', name: 'Line 20 snap, brass', postLengthMm: 5, unitCostCents: 38 },
  { id: 'snap-line-24', kind: 'snap', name: 'Line 24 snap, brass', postLengthMm: 6, unitCostCents: 45 },
  { id: 'rivet-double-cap-short', kind: 'rivet', name: 'Double-cap rivet, short post (6 mm)', postLengthMm: 6, unitCostCents: 16 },
  { id: 'rivet-double-cap-medium', kind: 'rivet', name: 'Double-cap rivet, medium post (8 mm)', postLengthMm: 8, unitCostCents: 18 },
  { id: 'rivet-double-cap-long', kind: 'rivet', name: 'Double-cap rivet, long post (11 mm)', postLengthMm: 11, unitCostCents: 22 },
];

/**
 * Puts the demo hardware into the shop's standards through the standards repository: items of
 * the same id are replaced, the shop's others kept, so running it again changes nothing.
 */
export async function seedDemoHardware(db: Knex, shopId: number, ownerId: number, at: number): Promise<void> {
  const repo = createStandardsRepository(db);
  const { standards } = await repo.read(shopId);
  const demoIds = new Set(DEMO_HARDWARE.map((h) => h.id));
  const hardware = [...standards.hardware.filter((h) => !demoIds.has(h.id)), ...DEMO_HARDWARE];
  // The same check an owner's save passes (ids unique, kinds' buckles and rings in the list).
  await repo.save(shopId, ownerId, ShopStandardsSchema.parse({ ...standards, hardware }), at);
}
