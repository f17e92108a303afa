import { Link } from 'react-router-dom';
import type { PatternPage } from '@shared/schemas/library.ts';
import { Badge } from '@/components/ui/badge.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import { kindLabel } from '../../kinds.ts';

type Item = PatternPage['items'][number];

/** One pattern in the library: name, kind, tags and who saved it last. */
export function PatternCard({ item, href }: { item: Item; href: string }) {
  return (
    <li className="group relative rounded-lg border border-hide-200 bg-white/80 p-4 shadow-sm shadow-hide-900/5 transition hover:border-hide-400 hover:shadow-md focus-within:border-hide-500">
      <div className="flex items-start justify-between gap-3">
        <h3 className="font-semibold text-hide-900">
          {/* The whole card is the link's hit area; the name is its accessible text. */}
          <Link to={href} className="after:absolute after:inset-0 after:content-[''] focus-visible:outline-none">
            {item.name}
          </Link>
        </h3>
        <Badge tone="brass">{kindLabel(item.kind)}</Badge>
      </div>
      <p className="mt-1 text-sm text-hide-600">
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
