import { useState } from 'react';
import type { Role } from '@shared/schemas/auth.ts';
import type { MemberView } from '@shared/schemas/library.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import { useChangeRole, useRemoveMember } from '../api/mutations.ts';
import { ROLE_OPTIONS } from './role-options.ts';

/** The shop's people; an owner changes roles or removes someone (two clicks, never one). */
export function MembersTable({ members, canManage, selfId }: { members: readonly MemberView[]; canManage: boolean; selfId: number }) {
  const changeRole = useChangeRole();
  const remove = useRemoveMember();
  const [confirming, setConfirming] = useState<number | null>(null);
  const [error, setError] = useState<string>();
  const fail = (err: unknown) => setError(err instanceof Error ? err.message : 'That change did not go through.');

  return (
    <div className="grid gap-3">
      {error && (
        <Notice tone="danger" role="alert">
          {error}
        </Notice>
      )}
      <table className="w-full text-sm" data-testid="members-table">
        <thead>
          <tr className="border-b border-hide-200 text-left text-xs uppercase tracking-wider text-hide-600">
            <th scope="col" className="py-2 pr-3 font-semibold">Name</th>
            <th scope="col" className="py-2 pr-3 font-semibold">E-mail</th>
            <th scope="col" className="py-2 pr-3 font-semibold">Role</th>
            <th scope="col" className="py-2 pr-3 font-semibold">Joined</th>
            {canManage && <th scope="col" className="py-2 font-semibold"><span className="sr-only">Actions</span></th>}
          </tr>
        </thead>
        <tbody>
          {members.map((m) => (
            <tr key={m.userId} className="border-b border-hide-100 align-middle">
              <th scope="row" className="py-2 pr-3 text-left font-medium text-hide-900">
                {m.name}
                {m.userId === selfId && <span className="ml-1 font-normal text-hide-600">(you)</span>}
              </th>
              <td className="py-2 pr-3 text-hide-700">{m.email}</td>
              <td className="py-2 pr-3">
                {canManage ? (
                  <select
                    aria-label={`Role of ${m.name}`}
                    className="h-8 rounded-md border border-hide-300 bg-white px-2"
                    value={m.role}
                    disabled={changeRole.isPending}
                    onChange={(e) => {
                      setError(undefined);
                      changeRole.mutate({ userId: m.userId, role: e.target.value as Role }, { onError: fail });
                    }}
                  >
                    {ROLE_OPTIONS.map((r) => (
                      <option key={r.value} value={r.value}>
                        {r.label}
                      </option>
                    ))}
                  </select>
                ) : (
                  ROLE_OPTIONS.find((r) => r.value === m.role)?.label
                )}
              </td>
              <td className="py-2 pr-3 text-hide-600">{formatWhen(m.joinedAt)}</td>
              {canManage && (
                <td className="py-2 text-right">
                  {confirming === m.userId ? (
                    <span className="inline-flex gap-2">
                      <Button
                        size="sm"
                        variant="danger"
                        busy={remove.isPending}
                        onClick={() => remove.mutate(m.userId, { onError: fail, onSettled: () => setConfirming(null) })}
                      >
                        Remove {m.name}
                      </Button>
                      <Button size="sm" variant="ghost" onClick={() => setConfirming(null)}>
                        Keep
                      </Button>
                    </span>
                  ) : (
                    <Button size="sm" variant="ghost" onClick={() => { setError(undefined); setConfirming(m.userId); }}>
                      Remove…
                    </Button>
                  )}
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
