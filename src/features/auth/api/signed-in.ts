import type { QueryClient } from '@tanstack/react-query';
import { meQueryOptions } from './queries.ts';

/**
 * For loaders under the signed-in layout. React Router runs child loaders beside the
 * layout's, so a signed-out visit must not fetch shop data (it would answer 401 and throw
 * before the layout can send the visitor to sign in).
 */
export async function isSignedIn(queryClient: QueryClient): Promise<boolean> {
  return (await queryClient.ensureQueryData(meQueryOptions())) !== null;
}
