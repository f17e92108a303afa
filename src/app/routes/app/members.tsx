import { type LoaderFunction } from 'react-router-dom';
import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { invitesQueryOptions, membersQueryOptions } from '@/features/shop/api/queries.ts';
import { MembersTable } from '@/features/shop/components/members-table.tsx';
import { InviteForm } from '@/features/shop/components/invite-form.tsx';
import { OpenInvites } from '@/features/shop/components/open-invites.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { NotificationSetting } from '@/features/settings/components/notification-setting.tsx';
import { ShopNav } from './shop-nav.tsx';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  // Child loaders run beside the layout's: signed out, fetch nothing (the layout redirects).
  if (!me) return null;
  await Promise.all([
    queryClient.ensureQueryData(membersQueryOptions()),
    can(me.role, 'invites.list') ? queryClient.ensureQueryData(invitesQueryOptions()) : null,
  ]);
  return null;
};

/** The shop's people: members with their roles, and (for owners) invites. */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: members } = useSuspenseQuery(membersQueryOptions());
  const isOwner = me ? can(me.role, 'invites.create') : false;
  const invites = useQuery({ ...invitesQueryOptions(), enabled: isOwner });
  if (!me) return null;
  return (
    <div className="grid max-w-5xl gap-6">
      <div className="grid gap-3">
        <div>
          <p className="text-sm font-medium uppercase tracking-widest text-hide-500">{me.shop.name}</p>
          <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">People in the shop</h1>
          <p className="mt-1 text-hide-700">Owners run the shop; makers draft and save; apprentices read the library and print.</p>
        </div>
        <ShopNav />
      </div>
      <Panel title="Your mail">
        <NotificationSetting />
      </Panel>
      <Panel title={`Members (${members.items.length})`}>
        <MembersTable members={members.items} canManage={can(me.role, 'members.update')} selfId={me.user.id} />
      </Panel>
      {isOwner && (
        <>
          <Panel title="Invite by e-mail">
            <InviteForm />
          </Panel>
          <Panel title="Open invites">{invites.data ? <OpenInvites invites={invites.data.items} /> : <p className="text-sm text-hide-600">Loading…</p>}</Panel>
        </>
      )}
    </div>
  );
}
