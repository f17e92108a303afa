// The shop's pricing settings: one JSON document per shop (shop_pricing), defaults until an
// owner saves one.
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { ShopPricingSchema } from '@shared/schemas/orders.ts';
import type { ShopPricingView } from '@shared/schemas/order-views.ts';
import { iso } from '../patterns/views.ts';

export type ShopPricing = z.output<typeof ShopPricingSchema>;

/** Before an owner sets prices: no leather priced, no bench rate; 30 % waste is common practice. */
export const DEFAULT_PRICING: ShopPricing = { currency: 'USD', wasteFactor: 1.3, hourlyRateCents: 0, leathers: [] };

export function createPricingRepository(db: Knex) {
  return {
    async get(shopId: number, q: Knex = db): Promise<ShopPricingView> {
      const row = await q('shop_pricing as s').leftJoin('users as u', 'u.id', 's.updated_by').where('s.shop_id', shopId).first<{ document: string; updated_at: number; updated_by: number | null; name: string | null } | undefined>('s.*', 'u.name');
      if (!row) return { ...DEFAULT_PRICING, updatedAt: null, updatedBy: null };
      return { ...(JSON.parse(row.document) as ShopPricing), updatedAt: iso(row.updated_at), updatedBy: row.updated_by !== null ? { id: row.updated_by, name: row.name ?? '' } : null };
    },
    async put(q: Knex, shopId: number, doc: ShopPricing, userId: number, now: number): Promise<void> {
      const row = { shop_id: shopId, document: JSON.stringify(doc), updated_by: userId, updated_at: now };
      await q('shop_pricing').insert(row).onConflict('shop_id').merge(['document', 'updated_by', 'updated_at']);
    },
  };
}
export type PricingRepository = ReturnType<typeof createPricingRepository>;
