// An order's cost, in integer cents of the shop's currency: leather (the blanks' area with
// the shop's waste factor, at the leather's price per square foot) + hardware (the shop's
// unit costs) + bench time (the shop's hourly rate), per piece, times the quantity.
import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import type { PriceView, ShopPricingView } from '@shared/schemas/order-views.ts';
import type { HardwareItem } from '@shared/schemas/shop-standards.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { MM_PER_IN } from '@shared/units/length.ts';

/** 1 sq ft = (12 x 25.4 mm)² = 92 903.04 mm² exactly (1959 inch). */
export const MM2_PER_SQ_FT = (12 * MM_PER_IN) ** 2;

export interface HardwareLine {
  itemId: string;
  quantity: number;
}

/** The hardware item of `kind` whose inside width (or post length) is the smallest that fits `sizeMm`; else the first. */
function pick(items: HardwareItem[], kind: HardwareItem['kind'], sizeMm: number | undefined, field: 'insideWidthMm' | 'postLengthMm'): HardwareItem | undefined {
  const ofKind = items.filter((i) => i.kind === kind);
  if (sizeMm === undefined) return ofKind[0];
  const fits = ofKind.filter((i) => (i[field] ?? Infinity) >= sizeMm - 0.5).sort((a, b) => (a[field] ?? Infinity) - (b[field] ?? Infinity));
  return fits[0] ?? ofKind[0];
}

/** Hardware of one piece matched from the pattern: its buckle, D-rings, rivets and snaps. */
export function matchHardware(spec: StrapSpec, layout: PatternLayout, items: HardwareItem[]): { lines: HardwareLine[]; missing: string[] } {
  const lines: HardwareLine[] = [];
  const missing: string[] = [];
  const want = (kind: HardwareItem['kind'], words: string, count: number, sizeMm: number | undefined, field: 'insideWidthMm' | 'postLengthMm' = 'insideWidthMm') => {
    if (count <= 0) return;
    const item = pick(items, kind, sizeMm, field);
    if (item) lines.push({ itemId: item.id, quantity: count });
    else missing.push(`No ${words} in the shop's hardware list`);
  };
  if (spec.hardware.buckle.style !== 'none') want('buckle', 'buckle', 1, spec.hardware.buckle.insideWidthMm);
  want('d-ring', 'D-ring', spec.hardware.dRings.count, spec.hardware.dRings.insideWidthMm);
  for (const f of layout.cutList.fasteners) {
    if (f.kind === 'rivet') want('rivet', 'rivet', f.count, f.postLengthMm, 'postLengthMm');
    if (f.kind === 'snap') want('snap', 'snap', f.count, f.postLengthMm, 'postLengthMm');
  }
  // One line per item: two rivet sets of the same item add up.
  const merged = new Map<string, number>();
  for (const l of lines) merged.set(l.itemId, (merged.get(l.itemId) ?? 0) + l.quantity);
  return { lines: [...merged].map(([itemId, quantity]) => ({ itemId, quantity })), missing };
}

export interface PriceInput {
  layout: PatternLayout;
  pricing: Pick<ShopPricingView, 'currency' | 'wasteFactor' | 'hourlyRateCents' | 'leathers'>;
  leatherId: string | null;
  hardware: HardwareLine[];
  hardwareItems: HardwareItem[];
  benchMinutes: number;
  quantity: number;
  /** What could not be matched before pricing (e.g. hardware not in the list). */
  missing?: string[];
}

export function priceOrder(p: PriceInput): PriceView {
  const missing = [...(p.missing ?? [])];
  const blankAreaMm2 = p.layout.cutList.blanks.reduce((a, b) => a + b.lengthMm * b.widthMm * b.count, 0);
  const areaSqFt = (blankAreaMm2 * p.pricing.wasteFactor) / MM2_PER_SQ_FT;
  const leather = p.leatherId ? p.pricing.leathers.find((l) => l.id === p.leatherId) : undefined;
  if (!p.leatherId) missing.push('No leather chosen for this order');
  else if (!leather) missing.push('This leather has no price in the shop pricing');
  const leatherCents = leather ? Math.round(areaSqFt * leather.pricePerSqFtCents) : 0;
  const hardware = p.hardware.map((h) => {
    const item = p.hardwareItems.find((i) => i.id === h.itemId);
    // The id is our key, not a word people read: a removed item is named for what happened to it.
    if (!item) missing.push("A hardware item of this order is no longer in the shop's hardware list: choose its hardware again");
    const unit = item?.unitCostCents ?? 0;
    return { itemId: h.itemId, name: item?.name ?? 'Hardware no longer in the list', quantity: h.quantity, unitCostCents: unit, cents: unit * h.quantity };
  });
  const benchCents = Math.round((p.benchMinutes * p.pricing.hourlyRateCents) / 60);
  const pieceCents = leatherCents + hardware.reduce((a, h) => a + h.cents, 0) + benchCents;
  return {
    currency: p.pricing.currency,
    leather: {
      leatherId: p.leatherId,
      name: leather?.name ?? null,
      blankAreaMm2: Math.round(blankAreaMm2),
      wasteFactor: p.pricing.wasteFactor,
      areaSqFt: Math.round(areaSqFt * 1000) / 1000,
      pricePerSqFtCents: leather?.pricePerSqFtCents ?? null,
      cents: leatherCents,
    },
    hardware,
    bench: { minutes: p.benchMinutes, hourlyRateCents: p.pricing.hourlyRateCents, cents: benchCents },
    pieceCents,
    quantity: p.quantity,
    totalCents: pieceCents * p.quantity,
    missing,
  };
}
