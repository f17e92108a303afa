import { Link } from 'react-router-dom';
import type { RevisionView } from '@shared/schemas/library.ts';
import { Badge } from '@/components/ui/badge.tsx';
import { Button, buttonClass } from '@/components/ui/button.tsx';
import { formatWhen } from '@/lib/format-when.ts';

export interface RevisionListProps {
  revisions: readonly RevisionView[];
  headNumber: number;
  canRestore: boolean;
  restoring: number | null;
  hrefOf: (n: number) => string;
  compareHref: (from: number, to: number) => string;
  onRestore: (n: number) => void;
}

/** Every saved revision, newest first. Nothing here changes history: restore adds a new head. */
export function RevisionList({ revisions, headNumber, canRestore, restoring, hrefOf, compareHref, onRestore }: RevisionListProps) {
  return (
    <ol className="grid gap-3" aria-label="Revisions" data-testid="revision-list">
      {revisions.map((r) => (
        <li key={r.number} className="flex flex-wrap items-start justify-between gap-4 rounded-lg border border-hide-200 bg-white/80 px-4 py-3">
          <div className="min-w-0">
            <p className="flex flex-wrap items-center gap-2">
              <Link to={hrefOf(r.number)} data-testid="revision-link" className="font-semibold text-hide-900 underline decoration-hide-300 underline-offset-4 hover:decoration-hide-700">
                Revision {r.number}
              </Link>
              {r.number === headNumber && <Badge tone="moss">current</Badge>}
              {r.restoredFrom !== null && <Badge>restored from {r.restoredFrom}</Badge>}
            </p>
            <p className="mt-0.5 text-sm text-hide-600">
              {formatWhen(r.createdAt)}
              {r.author && <> · {r.author.name}</>} · engine {r.engineVersion}
            </p>
            {r.note && <p className="mt-1 text-sm text-hide-800">{r.note}</p>}
          </div>
          <div className="flex flex-wrap gap-2">
            {r.number > 1 && (
              <Link to={compareHref(r.number - 1, r.number)} className={buttonClass('ghost', 'sm')}>
                Changes from {r.number - 1}
              </Link>
            )}
            {canRestore && r.number !== headNumber && (
              <Button size="sm" variant="secondary" busy={restoring === r.number} disabled={restoring !== null} onClick={() => onRestore(r.number)}>
                Restore as new revision
              </Button>
            )}
          </div>
        </li>
      ))}
    </ol>
  );
}
