import { queryOptions } from '@tanstack/react-query';
import type { MeResponse } from '@shared/schemas/auth.ts';
import { api, isApiError } from '@/lib/api-client.ts';

/** Keys for everything about the signed-in session, generic to specific. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};

/** Signed out is an answer, not a failure: 401 becomes `null` so guards can redirect. */
async function fetchMe(signal: AbortSignal): Promise<MeResponse | null> {
  try {
    return await api.get<MeResponse>('/api/me', signal);
  } catch (err) {
    if (isApiError(err, 401)) return null;
    throw err;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => fetchMe(signal),
    staleTime: 5 * 60_000,
  });
