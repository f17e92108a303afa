import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useDuplicatePattern, useRestoreRevision } from '../../api/mutations.ts';

export interface RevisionActionsProps {
  patternId: number;
  number: number;
  headNumber: number;
  headEtag: string;
  onDuplicated: (id: number) => void;
  onRestored: () => void;
}

/** For makers on an old revision: make it the head again, or start a new pattern from it. */
export function RevisionActions({ patternId, number, headNumber, headEtag, onDuplicated, onRestored }: RevisionActionsProps) {
  const restore = useRestoreRevision(patternId);
  const duplicate = useDuplicatePattern(patternId);
  const [error, setError] = useState<string>();
  const fail = (e: Error) => setError(e.message);
  return (
    <div className="grid gap-2">
      <div className="flex flex-wrap gap-2">
        {number !== headNumber && (
          <Button size="sm" variant="secondary" busy={restore.isPending} onClick={() => restore.mutate({ n: number, etag: headEtag }, { onSuccess: onRestored, onError: fail })}>
            Restore as revision {headNumber + 1}
          </Button>
        )}
        <Button size="sm" variant="ghost" busy={duplicate.isPending} onClick={() => duplicate.mutate({ revision: number }, { onSuccess: (d) => onDuplicated(d.pattern.id), onError: fail })}>
          New pattern from revision {number}
        </Button>
      </div>
      {error && (
        <Notice tone="danger" role="alert">
          {error}
        </Notice>
      )}
    </div>
  );
}
