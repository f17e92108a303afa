import { infiniteQueryOptions, queryOptions } from '@tanstack/react-query';
import type { PatternPage, PatternWithHead, RevisionView } from '@shared/schemas/library.ts';
import type { PresetName } from '@shared/schemas/strap-spec.ts';
import { api, apiRequest } from '@/lib/api-client.ts';

/** Filters of the library list, as they appear in the URL. */
export interface LibraryFilters {
  query?: string;
  kind?: PresetName;
  tag?: string;
  sort?: 'updated' | 'name';
  /** Include archived patterns. */
  archived?: boolean;
}

/** A pattern with its head, plus the head's strong ETag for `If-Match` on the next save. */
export interface PatternDetail extends PatternWithHead {
  etag: string;
}

/** The one key factory of the pattern library: generic to specific. */
export const patternKeys = {
  all: ['patterns'] as const,
  lists: () => [...patternKeys.all, 'list'] as const,
  list: (filters: LibraryFilters) => [...patternKeys.lists(), filters] as const,
  details: () => [...patternKeys.all, 'detail'] as const,
  detail: (id: number) => [...patternKeys.details(), id] as const,
  revisions: (id: number) => [...patternKeys.detail(id), 'revisions'] as const,
  revision: (id: number, n: number) => [...patternKeys.revisions(id), n] as const,
  compare: (id: number, from: number, to: number) => [...patternKeys.detail(id), 'compare', { from, to }] as const,
  shares: (id: number) => [...patternKeys.detail(id), 'shares'] as const,
  activity: (id: number) => [...patternKeys.detail(id), 'activity'] as const,
};

const PAGE_SIZE = 24;

function listUrl(filters: LibraryFilters, cursor: string | null): string {
  const q = new URLSearchParams();
  if (filters.query) q.set('query', filters.query);
  if (filters.kind) q.set('kind', filters.kind);
  if (filters.tag) q.set('tag', filters.tag);
  q.set('sort', filters.sort ?? 'updated');
  q.set('limit', String(PAGE_SIZE));
  if (filters.archived) q.set('archived', 'all');
  if (cursor) q.set('cursor', cursor);
  return `/api/patterns?${q.toString()}`;
}

/** The shop's library, a page at a time (cursor pagination). */
export const libraryQueryOptions = (filters: LibraryFilters) =>
  infiniteQueryOptions({
    queryKey: patternKeys.list(filters),
    queryFn: ({ pageParam, signal }) => api.get<PatternPage>(listUrl(filters, pageParam), signal),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });

/** One pattern with its head revision (spec included) and the ETag to save against. */
export const patternQueryOptions = (id: number) =>
  queryOptions({
    queryKey: patternKeys.detail(id),
    queryFn: async ({ signal }): Promise<PatternDetail> => {
      const res = await apiRequest<PatternWithHead>(`/api/patterns/${id}`, { signal });
      return { ...res.data, etag: res.headers.get('etag') ?? '' };
    },
    // The editor holds the form; a background refetch must not look like someone else saving.
    staleTime: 10_000,
  });

/** History, newest first as the server sends it. */
export const revisionsQueryOptions = (id: number) =>
  queryOptions({
    queryKey: patternKeys.revisions(id),
    queryFn: ({ signal }) => api.get<{ items: RevisionView[] }>(`/api/patterns/${id}/revisions`, signal),
  });

/** One revision with its spec. Revisions never change, so it never goes stale. */
export const revisionQueryOptions = (id: number, n: number) =>
  queryOptions({
    queryKey: patternKeys.revision(id, n),
    queryFn: async ({ signal }) => (await api.get<{ revision: RevisionView }>(`/api/patterns/${id}/revisions/${n}`, signal)).revision,
    staleTime: Infinity,
  });
