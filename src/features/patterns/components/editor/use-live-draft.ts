import { useDeferredValue, useLayoutEffect, useMemo, useRef } from 'react';
import { draftFrom, type Draft } from '@/components/pattern/draft.ts';
import { gradeRun, type SizeRunResult } from '@/components/pattern/grade-run.ts';

export interface LiveDraft {
  /** The form's values drawn in the same render as the keystroke: the bench card shows it. */
  draft: Draft;
  /** The last drawing that worked, kept faded in view while a value is being fixed. */
  lastSvg: string | null;
}

/**
 * The engine run in the browser on every change of the form, once for the bench card and the
 * details. The drawing is computed in the keystroke's own render (a collar lays out and draws
 * in well under a millisecond), so the preview changes in the next frame; the details take it
 * through {@link useSettledDraft}.
 */
export function useLiveDraft(values: unknown, revisionLabel?: string): LiveDraft {
  const draft = useMemo(() => draftFrom(values, revisionLabel ? { revision: revisionLabel } : {}), [values, revisionLabel]);
  // The last committed drawing: read only while the draft is stopped, so no render waits on it.
  const lastDrawn = useRef<string | null>(null);
  useLayoutEffect(() => {
    if (draft.status === 'drawn') lastDrawn.current = draft.svg;
  }, [draft]);
  const lastSvg = draft.status === 'drawn' ? draft.svg : lastDrawn.current;
  return { draft, lastSvg };
}

export interface SettledDraft {
  /** `draft` once React has a moment: a keystroke behind while typing is fast. */
  settled: Draft;
  /** The size run of `settled` graded, when its spec has one. */
  run: SizeRunResult | null;
}

/**
 * The draft for what may follow a frame later (warnings, fit, cut list) and the size run's
 * grading (one layout per size, up to 12): deferred, so typing never waits for them. Used
 * inside the details component, so the deferred render is that component alone.
 */
export function useSettledDraft(draft: Draft): SettledDraft {
  const settled = useDeferredValue(draft);
  const run = useMemo(() => (settled.status === 'drawn' ? gradeRun(settled.spec) : null), [settled]);
  return { settled, run };
}
