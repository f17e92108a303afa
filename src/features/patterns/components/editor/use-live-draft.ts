import { useDeferredValue, useEffect, useMemo, useState } from 'react';
import { draftFrom, type Draft } from '@/components/pattern/draft.ts';
import { gradeRun, type SizeRunResult } from '@/components/pattern/grade-run.ts';

export interface LiveDraft {
  draft: Draft;
  /** The last drawing that worked, kept faded in view while a value is being fixed. */
  lastSvg: string | null;
  /** The size run graded, when the spec has one. */
  run: SizeRunResult | null;
}

/**
 * The engine run in the browser on every change of the form. Deferred so typing never
 * waits for a draw; one run feeds the bench (drawing and summary) and the details below.
 */
export function useLiveDraft(values: unknown, revisionLabel?: string): LiveDraft {
  const deferred = useDeferredValue(values);
  const draft = useMemo(() => draftFrom(deferred, revisionLabel ? { revision: revisionLabel } : {}), [deferred, revisionLabel]);
  const [lastSvg, setLastSvg] = useState<string | null>(null);
  // One layout per size: graded only when the drawn spec changes.
  const run = useMemo(() => (draft.status === 'drawn' ? gradeRun(draft.spec) : null), [draft]);
  useEffect(() => {
    if (draft.status === 'drawn') setLastSvg(draft.svg);
  }, [draft]);
  return { draft, lastSvg, run };
}
