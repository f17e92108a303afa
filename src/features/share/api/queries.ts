import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import type { SharedPattern } from '@shared/schemas/library-views.ts';

export const shareKeys = {
  all: ['share'] as const,
  detail: (token: string) => [...shareKeys.all, token] as const,
};

export const sharedPatternQueryOptions = (token: string) =>
  queryOptions({
    queryKey: shareKeys.detail(token),
    queryFn: ({ signal }) => api.get<SharedPattern>(`/api/s/${encodeURIComponent(token)}`, signal),
    retry: false,
  });
