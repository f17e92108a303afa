// Order rows -> OrderSummary (board and table) and OrderDetail (the order screen), with the
// fitted piece's lengths and the price worked out from the shop's pricing and hardware list.
import type { Knex } from 'knex';
import type { PresetName } from '@shared/schemas/strap-spec.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import type { OrderStage, WearerKind } from '@shared/schemas/orders.ts';
import type { OrderDetail, OrderEvent, OrderSummary, PriceView, ProofStatus, ShopPricingView } from '@shared/schemas/order-views.ts';
import type { HardwareItem } from '@shared/schemas/shop-standards.ts';
import { iso } from '../patterns/views.ts';
import { createPricingRepository } from '../pricing/pricing.repository.ts';
import { matchHardware, priceOrder, type HardwareLine } from '../pricing/price-order.ts';
import { getShopStandards } from '../standards/standards.repository.ts';
import { fitPiece, fittedLengths, type FittedPiece } from './order-fit.ts';
import type { ListedOrderRow, OrderEventRow } from './orders.repository.ts';
import { todayOf } from './order-words.ts';

export interface PriceContext {
  pricing: ShopPricingView;
  hardwareItems: HardwareItem[];
}

/** The shop's pricing and hardware list (standards missing or unreadable = no hardware). */
export async function priceContext(db: Knex, shopId: number): Promise<PriceContext> {
  const pricing = await createPricingRepository(db).get(shopId);
  const hardwareItems: HardwareItem[] = await getShopStandards(db, shopId)
    .then((s) => s.hardware ?? [])
    .catch(() => []);
  return { pricing, hardwareItems };
}

/** Lengths to the micrometre, so 12 x 25.4 reads 304.8 wherever people see it. */
export const roundMm = (mm: number) => Math.round(mm * 1000) / 1000;

export const specOf = (row: ListedOrderRow) => JSON.parse(row.spec) as StrapSpec;

/** The order's revision fitted to its girth, or null while it waits for one. */
export function fittedOf(row: ListedOrderRow): FittedPiece | null {
  const spec = specOf(row);
  const key = `${row.pattern_id}/${row.revision_number}`;
  if (row.fit_from === 'size' && row.size_name) return fitPiece(key, spec, { sizeName: row.size_name });
  if (row.girth_mm !== null) return fitPiece(key, spec, { girthMm: Number(row.girth_mm) });
  return null;
}

export function priceOf(row: ListedOrderRow, fitted: FittedPiece | null, ctx: PriceContext): PriceView | null {
  if (!fitted) return null;
  const chosen = row.hardware ? (JSON.parse(row.hardware) as HardwareLine[]) : null;
  const matched = chosen ? { lines: chosen, missing: [] } : matchHardware(fitted.spec, fitted.layout, ctx.hardwareItems);
  return priceOrder({
    layout: fitted.layout,
    pricing: ctx.pricing,
    leatherId: row.leather_id,
    hardware: matched.lines,
    hardwareItems: ctx.hardwareItems,
    benchMinutes: row.bench_minutes,
    quantity: row.quantity,
    missing: matched.missing,
  });
}

/** A fitted piece, or null when the girth cannot be drawn any more (shown as no price, not a 500). */
function safeFitted(row: ListedOrderRow): FittedPiece | null {
  try {
    return fittedOf(row);
  } catch {
    return null;
  }
}

export function summaryOf(row: ListedOrderRow, ctx: PriceContext, nowMs: number, extra: { thumbId?: number; proof?: ProofStatus }): OrderSummary {
  const spec = specOf(row);
  const price = priceOf(row, safeFitted(row), ctx);
  const done = row.stage === 'finished' || row.stage === 'handed-over';
  return {
    id: row.id,
    number: row.number,
    stage: row.stage as OrderStage,
    customer: { id: row.customer_id, name: row.customer_name },
    wearer: { id: row.wearer_id, name: row.wearer_name, kind: row.wearer_kind as WearerKind },
    pattern: { id: row.pattern_id, name: row.pattern_name, kind: row.pattern_kind as PresetName },
    revision: row.revision_number,
    girthMm: row.girth_mm === null ? null : roundMm(Number(row.girth_mm)),
    sizeName: row.size_name,
    unit: spec.units,
    dueDate: row.due_date,
    overdue: !done && row.due_date < todayOf(nowMs),
    quantity: row.quantity,
    leatherColour: row.leather_colour,
    leatherFinish: row.leather_finish,
    priceCents: price && price.leather.pricePerSqFtCents !== null ? price.totalCents : null,
    currency: ctx.pricing.currency,
    thumbUrl: extra.thumbId ? `/api/orders/${row.id}/photos/${extra.thumbId}/thumb` : null,
    proofStatus: extra.proof ?? null,
    createdAt: iso(row.created_at),
    updatedAt: iso(row.updated_at),
  };
}

export const eventView = (e: OrderEventRow): OrderEvent => ({
  id: e.id,
  at: iso(e.at),
  by: e.user_id !== null ? { id: e.user_id, name: e.user_name ?? '' } : null,
  byLabel: e.user_id !== null ? (e.user_name ?? '') : e.by_label,
  kind: e.kind as OrderEvent['kind'],
  fromStage: e.from_stage as OrderStage | null,
  toStage: e.to_stage as OrderStage | null,
  summary: e.summary,
});

/** The parts of OrderDetail that come from the order row itself. */
export function detailCore(row: ListedOrderRow, ctx: PriceContext): Pick<OrderDetail, 'customerEmail' | 'wearerId' | 'fit' | 'leatherId' | 'thread' | 'notes' | 'benchMinutes' | 'hardware' | 'hardwareChosen' | 'fitted' | 'price' | 'createdBy'> {
  const fitted = safeFitted(row);
  const price = priceOf(row, fitted, ctx);
  const fit: OrderDetail['fit'] =
    row.fit_from === 'size' ? { from: 'size', sizeName: row.size_name ?? '' } : row.fit_from === 'measurement' && row.measurement_id !== null ? { from: 'measurement', measurementId: row.measurement_id } : { from: 'later' };
  const hardware = row.hardware ? (JSON.parse(row.hardware) as HardwareLine[]) : (price?.hardware.map((h) => ({ itemId: h.itemId, quantity: h.quantity })) ?? []);
  return {
    customerEmail: row.customer_email,
    wearerId: row.wearer_id,
    fit,
    leatherId: row.leather_id,
    thread: row.thread,
    notes: row.notes,
    benchMinutes: row.bench_minutes,
    hardware,
    hardwareChosen: row.hardware !== null,
    fitted: fitted ? fittedLengths(fitted.layout) : null,
    price,
    createdBy: row.created_by !== null ? { id: row.created_by, name: row.created_by_name ?? '' } : null,
  };
}
