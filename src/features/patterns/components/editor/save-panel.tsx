import { useState } from 'react';
import { NOTE_MAX_CHARS } from '@shared/schemas/library.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextAreaField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';

export interface Conflict {
  number: number;
  author: string | null;
  note: string;
}

export interface SavePanelProps {
  dirty: boolean;
  /** The form does not parse or the engine stopped: nothing to save yet. */
  blocked: boolean;
  saving: boolean;
  baseNumber: number;
  savedNumber: number | null;
  error: string | undefined;
  conflict: Conflict | null;
  onSave: (note: string) => Promise<boolean>;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

/** A note and the save button; after someone else saved first, the two ways forward. */
export function SavePanel({ dirty, blocked, saving, baseNumber, savedNumber, error, conflict, onSave, onKeepMine, onTakeTheirs }: SavePanelProps) {
  const [note, setNote] = useState('');
  return (
    <form
      className="grid gap-3"
      aria-label="Save a revision"
      onSubmit={async (e) => {
        e.preventDefault();
        if (await onSave(note)) setNote('');
      }}
    >
      {conflict && (
        <Notice tone="warning" role="alert" title={`Revision ${conflict.number} was saved while you were editing`}>
          <p>
            {conflict.author ?? 'Someone'} saved it{conflict.note ? `: “${conflict.note}”` : '.'} Your changes are still in the form and
            nothing of yours was saved.
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button size="sm" onClick={onKeepMine}>
              Keep my changes, save on top of {conflict.number}
            </Button>
            <Button size="sm" variant="secondary" onClick={onTakeTheirs}>
              Load revision {conflict.number} instead
            </Button>
          </div>
        </Notice>
      )}
      {error && !conflict && (
        <Notice tone="danger" role="alert">
          {error}
        </Notice>
      )}
      {savedNumber !== null && !dirty && !conflict && (
        <Notice tone="success" role="status">
          Saved as revision {savedNumber}.
        </Notice>
      )}
      <TextAreaField
        label="Note for this revision"
        hint={`What changed and why, for whoever cuts it next (up to ${NOTE_MAX_CHARS} characters).`}
        value={note}
        maxLength={NOTE_MAX_CHARS}
        onChange={(e) => setNote(e.target.value)}
        rows={2}
      />
      <div className="flex items-center gap-3">
        <Button type="submit" busy={saving} disabled={!dirty || blocked || conflict !== null}>
          Save revision {baseNumber + 1}
        </Button>
        <span className="text-xs text-hide-600">
          {dirty ? (blocked ? 'Fix the values the preview names first.' : `Changes since revision ${baseNumber}.`) : 'No changes yet.'}
        </span>
      </div>
    </form>
  );
}
