import { useState } from 'react';
import type { PatternView } from '@shared/schemas/library.ts';
import { Button, buttonClass } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useDuplicatePattern, useFollowPattern, useUpdatePattern } from '../api/mutations.ts';
import { PatternDetailsForm } from './pattern-details-form.tsx';

export interface PatternActionsProps {
  pattern: PatternView;
  headNumber: number;
  canEdit: boolean;
  onDuplicated: (id: number) => void;
}

/** What can be done to the pattern as a whole: follow, rename and tag, duplicate, export, archive. */
export function PatternActions({ pattern, headNumber, canEdit, onDuplicated }: PatternActionsProps) {
  const follow = useFollowPattern(pattern.id);
  const duplicate = useDuplicatePattern(pattern.id);
  const update = useUpdatePattern(pattern.id);
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string>();
  const fail = (e: Error) => setError(e.message);

  return (
    <div className="grid justify-items-end gap-2">
      <div className="flex flex-wrap justify-end gap-2">
        <Button size="sm" variant="secondary" aria-pressed={pattern.following} busy={follow.isPending} onClick={() => follow.mutate(!pattern.following, { onError: fail })}>
          {pattern.following ? 'Following: mail on save' : 'Follow'}
        </Button>
        {canEdit && (
          <>
            <Button size="sm" variant="ghost" aria-expanded={editing} onClick={() => setEditing((v) => !v)}>
              Name and tags
            </Button>
            <Button
              size="sm"
              variant="ghost"
              busy={duplicate.isPending}
              onClick={() => duplicate.mutate({ revision: headNumber }, { onSuccess: (d) => onDuplicated(d.pattern.id), onError: fail })}
            >
              Duplicate
            </Button>
            <a className={buttonClass('ghost', 'sm')} href={`/api/patterns/${pattern.id}/export`} download>
              Export file
            </a>
            <Button size="sm" variant="ghost" busy={update.isPending} onClick={() => update.mutate({ archived: !pattern.archived }, { onError: fail })}>
              {pattern.archived ? 'Bring back' : 'Archive'}
            </Button>
          </>
        )}
      </div>
      {error && (
        <Notice tone="danger" role="alert">
          {error}
        </Notice>
      )}
      {editing && canEdit && <PatternDetailsForm pattern={pattern} onDone={() => setEditing(false)} />}
    </div>
  );
}
