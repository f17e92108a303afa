import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeResponse, SignInInput, SignUpInput } from '@shared/schemas/auth.ts';
import { api } from '@/lib/api-client.ts';
import { authKeys, meQueryOptions } from './queries.ts';

/**
 * A change of who is signed in: forget every answer cached for the last person, keep the
 * new `me` the server just sent, and let the query refetch it in the background.
 */
export function useAdoptSession() {
  const queryClient = useQueryClient();
  return async (me: MeResponse) => {
    queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
    queryClient.setQueryData(meQueryOptions().queryKey, me);
    await queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
  };
}

export function useSignIn() {
  const adopt = useAdoptSession();
  return useMutation({
    mutationFn: (body: SignInInput) => api.post<MeResponse>('/api/auth/sign-in', body),
    onSuccess: adopt,
  });
}

export function useSignUp() {
  const adopt = useAdoptSession();
  return useMutation({
    mutationFn: (body: SignUpInput) => api.post<MeResponse>('/api/auth/sign-up', body),
    onSuccess: adopt,
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<unknown>('/api/auth/sign-out'),
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, null);
    },
  });
}
