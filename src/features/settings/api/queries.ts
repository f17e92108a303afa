import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { Settings } from '@shared/schemas/library.ts';
import { api } from '@/lib/api-client.ts';

export const settingsKeys = { all: ['settings'] as const, mine: () => [...settingsKeys.all, 'me'] as const };

/** The signed-in user's own preferences. */
export const settingsQueryOptions = () =>
  queryOptions({
    queryKey: settingsKeys.mine(),
    queryFn: async ({ signal }) => (await api.get<{ settings: Settings }>('/api/me/settings', signal)).settings,
  });

export function useSaveSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (settings: Settings) => (await api.patch<{ settings: Settings }>('/api/me/settings', settings)).settings,
    onSuccess: (saved) => queryClient.setQueryData(settingsKeys.mine(), saved),
    onSettled: () => queryClient.invalidateQueries({ queryKey: settingsKeys.mine() }),
  });
}
