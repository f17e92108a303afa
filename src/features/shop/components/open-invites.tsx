import type { InviteView } from '@shared/schemas/library-views.ts';
import { useRevokeInvite } from '../api/mutations.ts';
import { Badge } from '@/components/ui/badge.tsx';
import { Button } from '@/components/ui/button.tsx';
import { formatWhen } from '@/lib/format-when.ts';

/** Invites not yet accepted; revoking one makes its link answer "no such invite". */
export function OpenInvites({ invites }: { invites: readonly InviteView[] }) {
  const revoke = useRevokeInvite();
  if (invites.length === 0) return <p className="text-sm text-hide-600">No open invites.</p>;
  return (
    <ul className="divide-y divide-hide-100" data-testid="open-invites">
      {invites.map((i) => (
        <li key={i.id} className="flex flex-wrap items-center justify-between gap-3 py-2">
          <div>
            <p className="font-medium text-hide-900">
              {i.email} <Badge className="ml-1">{i.role}</Badge> {i.expired && <Badge tone="thread">expired</Badge>}
            </p>
            <p className="text-xs text-hide-600">
              Sent {formatWhen(i.createdAt)}
              {i.invitedBy && <> by {i.invitedBy}</>} · runs out {formatWhen(i.expiresAt)}
            </p>
          </div>
          <Button size="sm" variant="ghost" busy={revoke.isPending && revoke.variables === i.id} onClick={() => revoke.mutate(i.id)}>
            Revoke
          </Button>
        </li>
      ))}
    </ul>
  );
}
