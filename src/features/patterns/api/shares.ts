import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { patternKeys } from './queries.ts';

/** A share link as listed; `revision` null means "whatever the head is when opened". */
export interface ShareView {
  id: number;
  revision: number | null;
  createdAt: string;
  createdBy: string | null;
}

/** Only the creating answer carries the token and URL: the server keeps just a hash. */
export interface CreatedShare extends ShareView {
  token: string;
  url: string;
}

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
