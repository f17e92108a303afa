import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { patternKeys } from './queries.ts';

/** One row of the pattern's audit trail (who did what, when). */
export interface ActivityItem {
  id: number;
  action: string;
  detail: Record<string, unknown>;
  at: string;
  by: { id: number; name: string } | null;
}

export const activityQueryOptions = (id: number) =>
  queryOptions({
    queryKey: patternKeys.activity(id),
    queryFn: ({ signal }) => api.get<{ items: ActivityItem[] }>(`/api/patterns/${id}/activity`, signal),
  });
