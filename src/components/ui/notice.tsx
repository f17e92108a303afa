import type { ReactNode } from 'react';
import { cx } from './cx.ts';

export type NoticeTone = 'info' | 'warning' | 'danger' | 'success';

const tones: Record<NoticeTone, string> = {
  info: 'border-hide-300 bg-hide-50 text-hide-900',
  warning: 'border-brass-500 bg-brass-100 text-hide-900',
  danger: 'border-thread-500 bg-thread-50 text-thread-700',
  success: 'border-moss-500 bg-moss-50 text-moss-700',
};

export interface NoticeProps {
  tone?: NoticeTone;
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
  /** Use "alert" for messages that appear in answer to an action so they are announced. */
  role?: 'alert' | 'status' | 'note';
}

/** A boxed message: server errors, warnings from the engine, cautions. */
export function Notice({ tone = 'info', title, children, className, role }: NoticeProps) {
  return (
    <div role={role} className={cx('rounded-md border-l-4 px-4 py-3 text-sm', tones[tone], className)}>
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={cx(title ? 'mt-1' : undefined, 'leading-relaxed')}>{children}</div>}
    </div>
  );
}
