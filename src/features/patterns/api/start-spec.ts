import { queryOptions } from '@tanstack/react-query';
import type { ShopStandardsView } from '@shared/schemas/shop-standards.ts';
import type { PresetName, StrapSpec } from '@shared/schemas/strap-spec.ts';
import { api } from '@/lib/api-client.ts';

/** What a pattern of `kind` starts from: the shop's standard laid over the built-in preset. */
export interface StartSpec {
  spec: StrapSpec;
  /** `built-in` when the shop has no standard of its own for the kind, or its standard would not draw. */
  source: 'shop-standard' | 'built-in';
  problem?: string;
}

/**
 * Asked fresh each time (no cache): an owner may have just changed the standard, and a new
 * pattern or a reload must start from what the shop holds now.
 */
export const fetchStartSpec = (kind: PresetName) => api.get<StartSpec>(`/api/shop/standards/start/${kind}`);

/** The shop's hardware, punches and per-kind standards, for the editor's picks and new rows. */
export const shopListsQueryOptions = () =>
  queryOptions({
    queryKey: ['patterns', 'shop-lists'] as const,
    queryFn: ({ signal }) => api.get<ShopStandardsView>('/api/shop/standards', signal).then((v) => ({ hardware: v.standards.hardware, punches: v.standards.punches, kinds: v.standards.kinds })),
  });
