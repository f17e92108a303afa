// Shop pricing: read by every member (prices show on orders), replaced by owners.
import type { Knex } from 'knex';
import { writeTransaction } from '../../db/write-transaction.ts';
import type { AuthContext } from '../../http/session.ts';
import { createPricingRepository, type ShopPricing } from './pricing.repository.ts';

export function createPricingService(db: Knex, now: () => number) {
  const repo = createPricingRepository(db);
  return {
    repo,
    get: async (auth: AuthContext) => ({ pricing: await repo.get(auth.shop.id) }),
    async put(auth: AuthContext, doc: ShopPricing) {
      await writeTransaction(db, (trx) => repo.put(trx, auth.shop.id, doc, auth.user.id, now()));
      return { pricing: await repo.get(auth.shop.id) };
    },
  };
}
export type PricingService = ReturnType<typeof createPricingService>;
