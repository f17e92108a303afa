import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreatePatternInput, PatternWithHead, SaveRevisionInput, UpdatePatternInput } from '@shared/schemas/library.ts';
import { api, apiRequest } from '@/lib/api-client.ts';
import { patternKeys, type PatternDetail } from './queries.ts';

function withEtag(res: { data: PatternWithHead; headers: Headers }): PatternDetail {
  return { ...res.data, etag: res.headers.get('etag') ?? '' };
}

/** `POST /api/patterns`: a new pattern with revision 1. */
export function useCreatePattern() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: CreatePatternInput) => withEtag(await apiRequest<PatternWithHead>('/api/patterns', { method: 'POST', body })),
    onSuccess: async (created) => {
      queryClient.setQueryData(patternKeys.detail(created.pattern.id), created);
      await queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
    },
  });
}

/** The pattern as it is now, straight from the server (bypassing the cache). */
async function freshDetail(id: number): Promise<PatternDetail> {
  return withEtag(await apiRequest<PatternWithHead>(`/api/patterns/${id}`));
}

/**
 * `POST /api/patterns/:id/revisions` with `If-Match`: the save only lands on the head it
 * was based on. A 412 (someone else saved first) rejects with the ApiError, whose body
 * carries the current head; the caller decides how to offer it.
 */
export function useSaveRevision(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ etag, ...body }: SaveRevisionInput & { etag: string }) => {
      await apiRequest<unknown>(`/api/patterns/${id}/revisions`, { method: 'POST', body, headers: { 'If-Match': etag } });
      // Read the new head back with its ETag: the next save must be based on exactly it.
      return freshDetail(id);
    },
    onSuccess: async (saved) => {
      queryClient.setQueryData(patternKeys.detail(id), saved);
      await queryClient.invalidateQueries({ queryKey: patternKeys.revisions(id) });
      await queryClient.invalidateQueries({ queryKey: patternKeys.activity(id) });
      await queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
    },
  });
}

/** `POST /api/patterns/:id/revisions/:n/restore`: a new head equal to revision n. */
export function useRestoreRevision(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // The ETag of the head the maker was looking at: a restore must not bury a save they never saw.
    mutationFn: async ({ n, etag }: { n: number; etag?: string }) => {
      await apiRequest<unknown>(`/api/patterns/${id}/revisions/${n}/restore`, { method: 'POST', ...(etag ? { headers: { 'If-Match': etag } } : {}) });
      return freshDetail(id);
    },
    onSuccess: async (restored) => {
      queryClient.setQueryData(patternKeys.detail(id), restored);
      await queryClient.invalidateQueries({ queryKey: patternKeys.revisions(id) });
      await queryClient.invalidateQueries({ queryKey: patternKeys.activity(id) });
      await queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
    },
  });
}

/** `PATCH /api/patterns/:id`: name, tags, archived. */
/** Re-reads a pattern after a 412 so the editor can show what the other person saved. */
export function useFetchLatest(id: number) {
  const queryClient = useQueryClient();
  return async () => {
    const latest = await freshDetail(id);
    queryClient.setQueryData(patternKeys.detail(id), latest);
    await queryClient.invalidateQueries({ queryKey: patternKeys.revisions(id) });
    return latest;
  };
}

export function useUpdatePattern(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdatePatternInput) => api.patch<unknown>(`/api/patterns/${id}`, body),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: patternKeys.detail(id), exact: true });
      await queryClient.invalidateQueries({ queryKey: patternKeys.activity(id) });
      await queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
    },
  });
}

/** `POST /api/patterns/:id/duplicate`: a new pattern from any revision. */
export function useDuplicatePattern(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { revision?: number; name?: string }) => api.post<PatternWithHead>(`/api/patterns/${id}/duplicate`, body),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
    },
  });
}

/** `PUT`/`DELETE /api/patterns/:id/follow`: e-mail me each new revision of this pattern. */
export function useFollowPattern(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (on: boolean) => apiRequest<{ following: boolean }>(`/api/patterns/${id}/follow`, { method: on ? 'PUT' : 'DELETE' }).then((r) => r.data),
    onSuccess: ({ following }) => {
      queryClient.setQueryData<PatternDetail>(patternKeys.detail(id), (old) => (old ? { ...old, pattern: { ...old.pattern, following } } : old));
    },
  });
}

/** `POST /api/patterns/import`: a pattern file (our own JSON format) as a multipart upload. */
export function useImportPattern() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (file: File) => {
      const body = new FormData();
      body.append('file', file);
      return withEtag(await apiRequest<PatternWithHead>('/api/patterns/import', { method: 'POST', body }));
    },
    onSuccess: async (created) => {
      queryClient.setQueryData(patternKeys.detail(created.pattern.id), created);
      await queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
    },
  });
}
