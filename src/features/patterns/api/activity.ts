import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { patternKeys } from './queries.ts';
import type { ActivityItem } from '@shared/schemas/library-views.ts';

export const activityQueryOptions = (id: number) =>
  queryOptions({
    queryKey: patternKeys.activity(id),
    queryFn: ({ signal }) => api.get<{ items: ActivityItem[] }>(`/api/patterns/${id}/activity`, signal),
  });
