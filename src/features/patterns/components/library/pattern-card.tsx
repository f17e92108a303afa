import { Link } from 'react-router-dom';
import type { PatternPage } from '@shared/schemas/library.ts';
import { Badge } from '@/components/ui/badge.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { kindLabel } from '../../kinds.ts';

type Item = PatternPage['items'][number];

/** "13 in" for one girth; "5 sizes, 10 in to 18 in" for a run. */
export function fitText(fit: Item['head']['fit']): string {
  if (fit.run) return `${fit.run.count} sizes, ${formatLength(fit.run.minGirthMm, fit.units)} to ${formatLength(fit.run.maxGirthMm, fit.units)}`;
  return formatLength(fit.girthMm, fit.units);
}

/**
 * One pattern in the library: the head revision's drawing (a small SVG the server renders
 * once per revision and the browser caches), its girth or size range, name, kind, tags and
 * who saved it last.
 */
export function PatternCard({ item, href }: { item: Item; href: string }) {
  return (
    <li className="group relative min-w-0 rounded-lg border border-hide-200 bg-white/80 p-4 shadow-sm shadow-hide-900/5 transition hover:border-hide-400 hover:shadow-md focus-within:border-hide-500">
      <div className="mb-3 flex h-14 items-center justify-center rounded-md bg-paper px-2">
        <img
          src={`/api/patterns/${item.id}/revisions/${item.headNumber}/thumbnail.svg`}
          alt=""
          loading="lazy"
          decoding="async"
          className="max-h-12 w-full object-contain"
          data-testid="pattern-thumbnail"
        />
      </div>
      <div className="flex items-start justify-between gap-3">
        <h3 className="font-semibold text-hide-900">
          {/* The whole card is the link's hit area; the name is its accessible text. */}
          <Link to={href} className="after:absolute after:inset-0 after:content-[''] focus-visible:outline-none">
            {item.name}
          </Link>
        </h3>
        <Badge tone="brass">{kindLabel(item.kind)}</Badge>
      </div>
      <p className="mt-1 text-sm font-medium tabular-nums text-hide-800" data-testid="pattern-fit">
        {item.head.fit.run ? '' : item.head.fit.closes ? 'Girth ' : 'Length '}
        {fitText(item.head.fit)}
      </p>
      <p className="mt-0.5 text-sm text-hide-600">
        Revision {item.headNumber} · saved {formatWhen(item.head.createdAt)}
        {item.head.author && <> by {item.head.author.name}</>}
      </p>
      {item.head.note && <p className="mt-2 line-clamp-2 text-sm text-hide-800">“{item.head.note}”</p>}
      {item.tags.length > 0 && (
        <ul className="mt-3 flex flex-wrap gap-1.5" aria-label="Tags">
          {item.tags.map((t) => (
            <li key={t}>
              <Badge>{t}</Badge>
            </li>
          ))}
        </ul>
      )}
      {item.archived && <p className="mt-2 text-xs font-semibold uppercase tracking-wider text-thread-500">Archived</p>}
    </li>
  );
}
