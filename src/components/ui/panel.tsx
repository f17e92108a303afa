import type { ReactNode } from 'react';
import { cx } from './cx.ts';

export interface PanelProps {
  title?: ReactNode;
  /** Right-hand side of the title row (actions, counts). */
  aside?: ReactNode;
  children: ReactNode;
  className?: string;
  as?: 'section' | 'div' | 'aside';
}

/** A card on the bench: white stock, a hairline edge and an optional title row. */
export function Panel({ title, aside, children, className, as: Tag = 'section' }: PanelProps) {
  return (
    <Tag className={cx('rounded-lg border border-hide-200 bg-white/70 shadow-sm shadow-hide-900/5', className)}>
      {(title || aside) && (
        <header className="flex items-center justify-between gap-3 border-b border-hide-100 px-5 py-3">
          {title && <h2 className="text-[0.95rem] font-semibold text-hide-900">{title}</h2>}
          {aside}
        </header>
      )}
      <div className="px-5 py-4">{children}</div>
    </Tag>
  );
}
