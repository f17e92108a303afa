import { useNavigate, useParams, type LoaderFunction } from 'react-router-dom';
import { useSuspenseQuery, useQuery, type QueryClient } from '@tanstack/react-query';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { useAdoptSession, useSignOut } from '@/features/auth/api/mutations.ts';
import { inviteQueryOptions } from '@/features/invites/api/queries.ts';
import { AcceptInviteForm } from '@/features/invites/components/accept-invite-form.tsx';
import { TemplateSketch } from '@/features/auth/components/template-sketch.tsx';
import { Wordmark } from '@/components/ui/brand-mark.tsx';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { isApiError } from '@/lib/api-client.ts';
import { formatWhen } from '@/lib/format-when.ts';
import { paths } from '../paths.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  await Promise.all([
    queryClient.ensureQueryData(meQueryOptions()),
    // A used or expired link is an answer to show, not a crash: the component reads the error.
    queryClient.prefetchQuery(inviteQueryOptions(params.token ?? '')),
  ]);
  return null;
};

const ROLE_WORDS = { owner: 'an owner', maker: 'a maker', apprentice: 'an apprentice' } as const;

/** The page an invite e-mail links to: who invites you where, and joining in one step. */
export function Component() {
  const token = useParams().token ?? '';
  const navigate = useNavigate();
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const lookup = useQuery({ ...inviteQueryOptions(token), retry: false });
  const adopt = useAdoptSession();
  const signOut = useSignOut();

  let body;
  if (lookup.isPending) body = <p role="status">Opening the invite…</p>;
  else if (lookup.isError) {
    const gone = isApiError(lookup.error, 410) || isApiError(lookup.error, 404);
    body = (
      <Notice tone="danger" role="alert" title={gone ? 'This invite cannot be used' : 'The invite did not open'}>
        {isApiError(lookup.error, 404) ? 'No invite has this link. It may have been revoked.' : lookup.error.message}
      </Notice>
    );
  } else {
    const { invite } = lookup.data;
    const otherAccount = me && me.user.email !== invite.email;
    body = (
      <div className="grid gap-6">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight text-hide-900">Join {invite.shopName}</h1>
          <p className="mt-1 text-hide-700">
            {invite.invitedBy ?? 'The owner'} invites you as {ROLE_WORDS[invite.role]}. The link works once, until {formatWhen(invite.expiresAt)}.
          </p>
        </div>
        {otherAccount ? (
          <Notice tone="warning" title={`You are signed in as ${me.user.email}`}>
            <p>This invite is for {invite.email}. Sign out, then open the link again.</p>
            <Button size="sm" className="mt-2" busy={signOut.isPending} onClick={() => signOut.mutate()}>
              Sign out
            </Button>
          </Notice>
        ) : (
          <AcceptInviteForm
            token={token}
            lookup={lookup.data}
            signedInAsInvitee={Boolean(me)}
            onJoined={async (joined) => {
              await adopt(joined);
              navigate(paths.library.getHref(), { replace: true });
            }}
          />
        )}
      </div>
    );
  }

  return (
    <div className="grid min-h-screen place-items-center bg-paper px-6 py-12">
      <div className="w-full max-w-md">
        <Wordmark className="text-xl text-hide-900" />
        <TemplateSketch className="my-6 w-full text-hide-300" />
        {body}
      </div>
    </div>
  );
}
