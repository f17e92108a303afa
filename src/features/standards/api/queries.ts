import { queryOptions } from '@tanstack/react-query';
import type { ShopStandardsView } from '@shared/schemas/shop-standards.ts';
import { api } from '@/lib/api-client.ts';

/** Keys of the shop's standards, generic to specific. */
export const standardsKeys = {
  all: ['standards'] as const,
  document: () => [...standardsKeys.all, 'document'] as const,
};

/** The shop's standards (built-in defaults until an owner saves). Every member reads them. */
export const standardsQueryOptions = () =>
  queryOptions({
    queryKey: standardsKeys.document(),
    queryFn: ({ signal }) => api.get<ShopStandardsView>('/api/shop/standards', signal),
  });
