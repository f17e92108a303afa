import type { ReactNode } from 'react';
import { NavLink } from 'react-router-dom';
import type { PatternView, RevisionView } from '@shared/schemas/library.ts';
import { Badge } from '@/components/ui/badge.tsx';
import { cx } from '@/components/ui/cx.ts';
import { formatWhen } from '@/lib/format-when.ts';
import { kindLabel } from '../kinds.ts';

export interface PatternHeaderProps {
  pattern: PatternView;
  head: Omit<RevisionView, 'spec'>;
  tabs: ReadonlyArray<{ to: string; label: string; end?: boolean }>;
  actions?: ReactNode;
}

/** Name, kind, tags and the head revision of a pattern, with its screens as tabs. */
export function PatternHeader({ pattern, head, tabs, actions }: PatternHeaderProps) {
  return (
    <header className="grid gap-4 border-b border-hide-200 pb-0">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <div className="flex flex-wrap items-center gap-2">
            <Badge tone="brass">{kindLabel(pattern.kind)}</Badge>
            {pattern.tags.map((t) => (
              <Badge key={t}>{t}</Badge>
            ))}
            {pattern.archived && <Badge tone="thread">Archived</Badge>}
          </div>
          <h1 className="mt-2 text-2xl font-semibold tracking-tight text-hide-900 sm:text-3xl">{pattern.name}</h1>
          <p className="mt-1 text-sm text-hide-600" data-testid="head-revision">
            Revision {head.number}, saved {formatWhen(head.createdAt)}
            {head.author && <> by {head.author.name}</>}
            {head.note && <>: “{head.note}”</>}
          </p>
        </div>
        {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
      </div>
      <nav aria-label="Pattern" className="-mb-px flex gap-1">
        {tabs.map((t) => (
          <NavLink
            key={t.to}
            to={t.to}
            end={t.end ?? false}
            className={({ isActive }) =>
              cx(
                'border-b-2 px-3 py-2 text-sm font-medium transition-colors',
                isActive ? 'border-hide-700 text-hide-900' : 'border-transparent text-hide-600 hover:border-hide-300 hover:text-hide-900',
              )
            }
          >
            {t.label}
          </NavLink>
        ))}
      </nav>
    </header>
  );
}
