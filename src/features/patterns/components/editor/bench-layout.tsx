import { useLayoutEffect, useRef, useState, type CSSProperties, type ReactNode } from 'react';

export interface BenchLayoutProps {
  /** The bench card (drawing, summary, Print): sticky, always in view. */
  bench: ReactNode;
  /** The spec form (with its notices). */
  form: ReactNode;
  /** The print panel. */
  print: ReactNode;
  /** Save and share panels (makers and owners). */
  actions?: ReactNode;
  /** Size run, warnings, fit at each hole, rule against fit, cut list. */
  details: ReactNode;
  /** Apprentices: the print panel comes straight after the bench and the values fold away. */
  readOnly: boolean;
}

/**
 * The pattern page's bench layout. Desktop (lg, 1024 px and up): the form beside a column
 * whose bench card stays in view (sticky) over the panels below it. Narrower: one column in
 * which the bench card sticks to the top while the form scrolls under it; the right column
 * is `display: contents` there, so the bench's sticky box is the whole page column, not
 * only its own wrapper. A read-only reader gets the bench, Print, then the details; the
 * values themselves fold away at the end.
 */
export function BenchLayout({ bench, form, print, actions, details, readOnly }: BenchLayoutProps) {
  const benchRef = useRef<HTMLDivElement>(null);
  const [benchPx, setBenchPx] = useState(0);
  useLayoutEffect(() => {
    const el = benchRef.current;
    if (!el) return;
    const ro = new ResizeObserver(() => setBenchPx(el.offsetHeight));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  // Inputs and anchors scrolled into view land below the sticky bench, not under it.
  const style = { '--bench-h': `${benchPx + 12}px` } as CSSProperties;

  const printPanel = (cls: string) => (
    <div id="print" className={`min-w-0 scroll-mt-[var(--bench-h)] ${cls}`}>
      {print}
    </div>
  );
  return (
    <div style={style} className="flex min-w-0 flex-col gap-4 lg:grid lg:grid-cols-[minmax(320px,420px)_minmax(0,1fr)] lg:gap-6" data-testid="bench-layout">
      <div className="contents lg:col-start-2 lg:row-start-1 lg:flex lg:min-w-0 lg:flex-col lg:gap-4">
        <div ref={benchRef} className="sticky top-0 z-20 order-1 -mx-1 min-w-0 bg-paper px-1 py-1 lg:top-0 lg:pt-2">
          {bench}
        </div>
        {readOnly && printPanel('order-2')}
        {!readOnly && actions && <div className="order-4 grid min-w-0 items-start gap-4 lg:order-2 xl:grid-cols-2">{actions}</div>}
        {!readOnly && printPanel('order-5 lg:order-3')}
        {!readOnly && <div className="order-6 min-w-0 lg:order-4">{details}</div>}
      </div>
      <div className={`${readOnly ? 'order-7' : 'order-3'} grid min-w-0 content-start gap-4 lg:col-start-1 lg:row-start-1`}>
        {readOnly && details}
        <div className="grid gap-4 max-lg:[&_:is(input,select,textarea)]:scroll-mt-[var(--bench-h)]">{form}</div>
      </div>
    </div>
  );
}
