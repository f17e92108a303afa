import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import type { CreatedShare } from '@shared/schemas/library-views.ts';
import { sharesQueryOptions, useCreateShare, useRevokeShare } from '../../api/shares.ts';

/**
 * Read-only links for people outside the shop (a customer, a supplier). A link shows one
 * revision, or the head at the time it is opened; the address is shown once, at creation.
 */
export function SharePanel({ patternId, headNumber }: { patternId: number; headNumber: number }) {
  const list = useQuery(sharesQueryOptions(patternId));
  const create = useCreateShare(patternId);
  const revoke = useRevokeShare(patternId);
  const [created, setCreated] = useState<CreatedShare | null>(null);
  const [copied, setCopied] = useState(false);
  const [error, setError] = useState<string>();

  const make = (revision: number | null) => {
    setError(undefined);
    setCopied(false);
    create.mutate(revision, { onSuccess: setCreated, onError: (e) => setError(e.message) });
  };

  return (
    <div className="grid gap-3">
      <div className="flex flex-wrap gap-2">
        <Button size="sm" variant="secondary" busy={create.isPending && create.variables === headNumber} onClick={() => make(headNumber)}>
          Link to revision {headNumber}
        </Button>
        <Button size="sm" variant="ghost" busy={create.isPending && create.variables === null} onClick={() => make(null)}>
          Link that follows the latest
        </Button>
      </div>
      {error && (
        <Notice tone="danger" role="alert">
          {error}
        </Notice>
      )}
      {created && (
        <Notice tone="success" role="status" title="Copy the link now: it is shown only once">
          <div className="flex items-center gap-2">
            <input aria-label="Share link" readOnly value={created.url} className="h-8 w-full rounded border border-hide-300 bg-white px-2 font-mono text-xs" onFocus={(e) => e.currentTarget.select()} data-testid="share-url" />
            <Button
              size="sm"
              onClick={async () => {
                await navigator.clipboard?.writeText(created.url).catch(() => undefined);
                setCopied(true);
              }}
            >
              {copied ? 'Copied' : 'Copy'}
            </Button>
          </div>
        </Notice>
      )}
      {list.data && list.data.items.length > 0 && (
        <ul className="divide-y divide-hide-100 text-sm" aria-label="Share links">
          {list.data.items.map((s) => (
            <li key={s.id} className="flex items-center justify-between gap-2 py-1.5">
              <span>
                {s.revision === null ? 'Latest revision' : `Revision ${s.revision}`}
                <span className="text-hide-600">
                  {' '}
                  · {formatWhen(s.createdAt)}
                  {s.createdBy && <> · {s.createdBy}</>}
                </span>
              </span>
              <Button size="sm" variant="ghost" busy={revoke.isPending && revoke.variables === s.id} onClick={() => revoke.mutate(s.id)}>
                Revoke
              </Button>
            </li>
          ))}
        </ul>
      )}
      {list.data?.items.length === 0 && <p className="text-xs text-hide-600">No links yet. Anyone with a link sees that pattern only, read-only.</p>}
    </div>
  );
}
