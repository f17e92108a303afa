import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { patternKeys } from './queries.ts';
import type { CreatedShare, ShareView } from '@shared/schemas/library-views.ts';

export const sharesQueryOptions = (patternId: number) =>
  queryOptions({
    queryKey: patternKeys.shares(patternId),
    queryFn: ({ signal }) => api.get<{ items: ShareView[] }>(`/api/patterns/${patternId}/shares`, signal),
  });

export function useCreateShare(patternId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (revision: number | null) => (await api.post<{ share: CreatedShare }>(`/api/patterns/${patternId}/share`, { revision })).share,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: patternKeys.shares(patternId) }),
  });
}

export function useRevokeShare(patternId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (shareId: number) => api.delete<unknown>(`/api/share/${shareId}`),
    onSettled: () => queryClient.invalidateQueries({ queryKey: patternKeys.shares(patternId) }),
  });
}
