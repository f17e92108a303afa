import type { ReactNode } from 'react';
import { cx } from './cx.ts';

export type BadgeTone = 'hide' | 'brass' | 'moss' | 'thread';

const tones: Record<BadgeTone, string> = {
  hide: 'bg-hide-100 text-hide-800 ring-hide-200',
  brass: 'bg-brass-100 text-brass-700 ring-brass-300',
  moss: 'bg-moss-50 text-moss-700 ring-moss-500/30',
  thread: 'bg-thread-50 text-thread-700 ring-thread-500/30',
};

/** A small tag-shaped label (roles, kinds, tags, revision numbers). */
export function Badge({ tone = 'hide', children, className }: { tone?: BadgeTone; children: ReactNode; className?: string }) {
  return (
    <span className={cx('inline-flex items-center rounded-full px-2 py-0.5 text-xs font-medium ring-1 ring-inset', tones[tone], className)}>
      {children}
    </span>
  );
}
