import { queryOptions, useMutation } from '@tanstack/react-query';
import type { MeResponse } from '@shared/schemas/auth.ts';
import { api } from '@/lib/api-client.ts';
import type { InviteLookup } from '@shared/schemas/library-views.ts';

export const inviteKeys = {
  all: ['invites'] as const,
  detail: (token: string) => [...inviteKeys.all, 'detail', token] as const,
};

export const inviteQueryOptions = (token: string) =>
  queryOptions({
    queryKey: inviteKeys.detail(token),
    queryFn: ({ signal }) => api.get<InviteLookup>(`/api/invites/${encodeURIComponent(token)}`, signal),
    staleTime: 0,
  });

/** Accepts: joins the shop (and creates the account if needed); answers the new session's `me`. */
export function useAcceptInvite(token: string) {
  return useMutation({
    mutationFn: (body: { name?: string; password?: string }) => api.post<MeResponse>(`/api/invites/${encodeURIComponent(token)}/accept`, body),
  });
}
