import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { patternKeys } from './queries.ts';
import type { Comparison } from '@shared/schemas/library-views.ts';

/** Two revisions compared by the server (both revisions are immutable, so never stale). */
export const compareQueryOptions = (id: number, from: number, to: number) =>
  queryOptions({
    queryKey: patternKeys.compare(id, from, to),
    queryFn: ({ signal }) => api.get<Comparison>(`/api/patterns/${id}/compare?from=${from}&to=${to}`, signal),
    staleTime: Infinity,
  });
