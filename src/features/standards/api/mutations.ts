import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShopStandards, ShopStandardsView } from '@shared/schemas/shop-standards.ts';
import { apiRequest } from '@/lib/api-client.ts';
import { standardsKeys } from './queries.ts';

/** Replaces the shop's standards (owners); every start spec follows. */
export function useSaveStandards() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (standards: ShopStandards) => apiRequest<ShopStandardsView>('/api/shop/standards', { method: 'PUT', body: standards }).then((r) => r.data),
    onSuccess: (view) => {
      queryClient.setQueryData(standardsKeys.document(), view);
      return queryClient.invalidateQueries({ queryKey: standardsKeys.all });
    },
  });
}
