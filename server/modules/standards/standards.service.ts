// Reads and replaces the shop's standards; builds the spec a new pattern of a kind starts from.
import type { Knex } from 'knex';
import { PRESET_NAMES, StrapSpecSchema, type PresetName, type StrapSpec } from '@shared/schemas/strap-spec.ts';
import type { ShopStandards, ShopStandardsView } from '@shared/schemas/shop-standards.ts';
import { specFromShopStandard } from '@shared/pattern/apply-shop-standard.ts';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { computeLayout } from '@shared/pattern/index.ts';
import { HttpError } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { createStandardsRepository, type StoredStandards } from './standards.repository.ts';

const view = (s: StoredStandards): ShopStandardsView => ({
  standards: s.standards,
  updatedAt: s.updatedAt === null ? null : new Date(s.updatedAt).toISOString(),
  updatedBy: s.updatedBy,
});

/** The spec a new `kind` starts from, and whether the shop's standard or the preset gave it. */
export interface StartSpec {
  spec: StrapSpec;
  source: 'shop-standard' | 'built-in';
  /** Set when the shop's standard could not be drawn and the built-in preset was used instead. */
  problem?: string;
}

export function createStandardsService(db: Knex, now: () => number = Date.now) {
  const repo = createStandardsRepository(db);
  return {
    read: async (auth: AuthContext) => view(await repo.read(auth.shop.id)),
    async replace(auth: AuthContext, standards: ShopStandards): Promise<ShopStandardsView> {
      await repo.save(auth.shop.id, auth.user.id, standards, now());
      return view(await repo.read(auth.shop.id));
    },
    async startSpec(auth: AuthContext, kind: string | undefined): Promise<StartSpec> {
      if (!kind || !(PRESET_NAMES as readonly string[]).includes(kind)) throw new HttpError(404, 'not_found', 'There is no such kind of strap.');
      const { standards } = await repo.read(auth.shop.id);
      const spec = specFromShopStandard(standards, kind as PresetName);
      // A standard that the engine cannot draw with the preset's other values must not stop a
      // maker from starting: fall back to the preset and say why.
      try {
        const parsed = StrapSpecSchema.parse(spec);
        computeLayout(parsed);
        return { spec: parsed, source: 'shop-standard' };
      } catch (err) {
        return { spec: presetSpec(kind as PresetName), source: 'built-in', problem: err instanceof Error ? err.message : String(err) };
      }
    },
  };
}
export type StandardsService = ReturnType<typeof createStandardsService>;
