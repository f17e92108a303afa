import { memo, useState, type ReactNode } from 'react';
import type { Draft } from '@/components/pattern/draft.ts';
import { ZoomDrawing } from '@/components/pattern/zoom-drawing.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { BenchSummary } from './bench-summary.tsx';

export interface BenchCardProps {
  /** The form's values drawn in the keystroke's own render ({@link useLiveDraft}). */
  draft: Draft;
  /** The last drawing that worked, shown faded while the draft is stopped. */
  lastSvg: string | null;
  /** Buttons at the card's foot (Print, and for makers the save state). */
  actions?: ReactNode;
}

/**
 * The bench: the drawing (zoom, pan, true size) and the summary, kept in view (sticky) while
 * the form scrolls. On a phone the drawing folds away to leave the summary and the actions.
 * Memoized: it renders when the draft (or the actions) change, not for the details' render.
 */
export const BenchCard = memo(function BenchCard({ draft, lastSvg, actions }: BenchCardProps) {
  const [open, setOpen] = useState(true);
  return (
    <section aria-label="Preview" className="grid min-w-0 gap-2 rounded-lg border border-hide-200 bg-white p-3 shadow-md shadow-hide-900/10 sm:p-4" data-testid="bench-card">
      <header className="flex items-center justify-between gap-3">
        <h2 className="text-[0.95rem] font-semibold text-hide-900">Preview</h2>
        <button type="button" className="text-xs font-medium text-hide-700 underline underline-offset-2 lg:hidden" aria-expanded={open} onClick={() => setOpen((o) => !o)}>
          {open ? 'Fold the drawing away' : 'Show the drawing'}
        </button>
      </header>
      {draft.status === 'drawn' ? (
        <>
          {open && <ZoomDrawing svg={draft.svg} label={`Drawing of ${draft.layout.name || 'the pattern'}`} boxClassName="h-32 sm:h-44 lg:h-60" />}
          <BenchSummary layout={draft.layout} spec={draft.spec} />
        </>
      ) : (
        <>
          <Notice tone="danger" title="The drawing stopped at a value it cannot draw" role="status">
            <ul className="list-disc pl-5" data-testid="draft-problems">
              {draft.problems.map((p) => (
                <li key={p.field + p.message}>{p.message}</li>
              ))}
            </ul>
          </Notice>
          {open && lastSvg && (
            <div className="opacity-45 grayscale" aria-label="The last drawing that worked">
              <ZoomDrawing svg={lastSvg} label="The last drawing before the value that stopped it" boxClassName="h-28 sm:h-40" />
            </div>
          )}
        </>
      )}
      {actions && <div className="flex flex-wrap items-center gap-2 border-t border-hide-100 pt-2">{actions}</div>}
    </section>
  );
});
