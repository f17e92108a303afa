import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client.ts';

/** Client errors (4xx) will not change on a retry; network blips and 5xx may. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** Builds the app's one QueryClient. A factory so tests and the router can own a fresh one. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        // Patterns change when someone saves, not by the second: 30 s keeps lists calm.
        staleTime: 30_000,
        gcTime: 5 * 60_000,
        retry: shouldRetry,
        // A refetch on focus would reset nothing in forms (they hold their own state), but it
        // surprises a maker flipping to a PDF viewer and back; invalidation does the real work.
        refetchOnWindowFocus: false,
      },
      mutations: { retry: false },
    },
  });
}

/** The browser app's client; loaders and components share it. */
export const queryClient = createQueryClient();
