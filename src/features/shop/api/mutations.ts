import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@shared/schemas/auth.ts';
import { api } from '@/lib/api-client.ts';
import type { InviteView } from '@shared/schemas/library-views.ts';
import { shopKeys } from './queries.ts';

export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: Role }) => api.patch<unknown>(`/api/shop/members/${userId}`, { role }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: shopKeys.members() }),
  });
}

export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => api.delete<unknown>(`/api/shop/members/${userId}`),
    onSettled: () => queryClient.invalidateQueries({ queryKey: shopKeys.members() }),
  });
}

/** Sends the invite e-mail; answers with the invite and the mail's delivery state. */
export function useCreateInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { email: string; role: Role }) => api.post<{ invite: InviteView; mail: string }>('/api/shop/invites', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shopKeys.invites() }),
  });
}

export function useRevokeInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: number) => api.delete<unknown>(`/api/shop/invites/${inviteId}`),
    onSettled: () => queryClient.invalidateQueries({ queryKey: shopKeys.invites() }),
  });
}
