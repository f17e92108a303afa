import { queryOptions } from '@tanstack/react-query';
import type { MemberView } from '@shared/schemas/library.ts';
import { api } from '@/lib/api-client.ts';
import type { InviteView } from '@shared/schemas/library-views.ts';

/** Keys of the shop's people, generic to specific. */
export const shopKeys = {
  all: ['shop'] as const,
  members: () => [...shopKeys.all, 'members'] as const,
  invites: () => [...shopKeys.all, 'invites'] as const,
};

export const membersQueryOptions = () =>
  queryOptions({
    queryKey: shopKeys.members(),
    queryFn: ({ signal }) => api.get<{ items: MemberView[] }>('/api/shop/members', signal),
  });

/** Open invites; only owners may read them. */
export const invitesQueryOptions = () =>
  queryOptions({
    queryKey: shopKeys.invites(),
    queryFn: ({ signal }) => api.get<{ items: InviteView[] }>('/api/shop/invites', signal),
  });
