// The shop's standards document (table shop_standards). Readers get the built-in defaults
// when the shop has saved none, and every kind a saved document leaves out filled in.
import type { Knex } from 'knex';
import { ShopStandardsSchema, type ShopStandards } from '@shared/schemas/shop-standards.ts';
import { builtInShopStandards, withBuiltInKinds } from '@shared/pattern/shop-standard-defaults.ts';

interface Row {
  shop_id: number;
  document: string;
  updated_at: number;
  updated_by: number | null;
  updated_by_name: string | null;
}

/** A stored document read back; one that no longer parses (an older shape) falls back to the defaults. */
function parseDocument(json: string): ShopStandards {
  const parsed = ShopStandardsSchema.safeParse(JSON.parse(json));
  return parsed.success ? withBuiltInKinds(parsed.data) : builtInShopStandards();
}

const readRow = (db: Knex, shopId: number) =>
  db('shop_standards as s')
    .leftJoin('users as u', 'u.id', 's.updated_by')
    .where('s.shop_id', shopId)
    .first<Row | undefined>('s.shop_id', 's.document', 's.updated_at', 's.updated_by', 'u.name as updated_by_name');

/** The shop's standards (built-in defaults when none saved). Pricing reads hardware costs here. */
export async function getShopStandards(db: Knex, shopId: number): Promise<ShopStandards> {
  const row = await readRow(db, shopId);
  return row ? parseDocument(row.document) : builtInShopStandards();
}

export interface StoredStandards {
  standards: ShopStandards;
  updatedAt: number | null;
  updatedBy: { id: number; name: string } | null;
}

export function createStandardsRepository(db: Knex) {
  return {
    async read(shopId: number): Promise<StoredStandards> {
      const row = await readRow(db, shopId);
      if (!row) return { standards: builtInShopStandards(), updatedAt: null, updatedBy: null };
      return {
        standards: parseDocument(row.document),
        updatedAt: Number(row.updated_at),
        updatedBy: row.updated_by !== null && row.updated_by_name !== null ? { id: row.updated_by, name: row.updated_by_name } : null,
      };
    },
    async save(shopId: number, userId: number, standards: ShopStandards, now: number): Promise<void> {
      await db('shop_standards')
        .insert({ shop_id: shopId, document: JSON.stringify(standards), updated_at: now, updated_by: userId })
        .onConflict('shop_id')
        .merge(['document', 'updated_at', 'updated_by']);
    },
  };
}
export type StandardsRepository = ReturnType<typeof createStandardsRepository>;
