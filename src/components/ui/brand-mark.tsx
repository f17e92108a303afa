import { cx } from './cx.ts';

/**
 * Latchet's mark: a short strap with a folded buckle end and three punched holes, drawn
 * in our own lines. Decorative, so hidden from assistive technology; the word beside it
 * carries the name.
 */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 40 24" className={cx('h-6 w-10', className)} aria-hidden="true" focusable="false">
      <path d="M4 6h26l6 6-6 6H4a2 2 0 0 1-2-2V8a2 2 0 0 1 2-2z" fill="currentColor" />
      <path d="M9 6v12" stroke="var(--color-paper)" strokeWidth="1.2" strokeDasharray="1.6 1.6" />
      <circle cx="17" cy="12" r="1.7" fill="var(--color-paper)" />
      <circle cx="22.5" cy="12" r="1.7" fill="var(--color-paper)" />
      <circle cx="28" cy="12" r="1.7" fill="var(--color-paper)" />
    </svg>
  );
}

export function Wordmark({ className }: { className?: string }) {
  return (
    <span className={cx('inline-flex items-center gap-2 font-semibold tracking-tight', className)}>
      <BrandMark className="text-hide-500" />
      <span>Latchet</span>
    </span>
  );
}
