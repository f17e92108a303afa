import { useCallback } from 'react';
import { Link, useNavigate, useSearchParams, type LoaderFunction } from 'react-router-dom';
import { useSuspenseInfiniteQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { filtersFromSearch } from '@/features/patterns/api/filters.ts';
import { libraryQueryOptions, type LibraryFilters } from '@/features/patterns/api/queries.ts';
import { LibraryFiltersBar } from '@/features/patterns/components/library/library-filters.tsx';
import { useImportPatternControl } from '@/features/patterns/components/library/import-pattern.tsx';
import { PatternCard } from '@/features/patterns/components/library/pattern-card.tsx';
import { Button, buttonClass } from '@/components/ui/button.tsx';
import { paths } from '../../paths.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ request }) => {
  if (!(await isSignedIn(queryClient))) return null;
  const filters = filtersFromSearch(new URL(request.url).searchParams);
  await queryClient.ensureInfiniteQueryData(libraryQueryOptions(filters));
  return null;
};

function toSearch(filters: LibraryFilters): URLSearchParams {
  const q = new URLSearchParams();
  if (filters.query) q.set('query', filters.query);
  if (filters.kind) q.set('kind', filters.kind);
  if (filters.tag) q.set('tag', filters.tag);
  if (filters.sort && filters.sort !== 'updated') q.set('sort', filters.sort);
  if (filters.archived) q.set('archived', 'all');
  return q;
}

/** The shop's library: every proven pattern, searchable, newest saves first. */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const importer = useImportPatternControl((id) => navigate(paths.patterns.detail.getHref(id)));
  const filters = filtersFromSearch(params);
  const list = useSuspenseInfiniteQuery(libraryQueryOptions(filters));
  const items = list.data.pages.flatMap((p) => p.items);
  const filtered = Boolean(filters.query || filters.kind || filters.tag);
  const onChange = useCallback((next: LibraryFilters) => setParams(toSearch(next), { replace: true }), [setParams]);
  const mayCreate = me ? can(me.role, 'patterns.create') : false;

  return (
    <div className="grid gap-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm font-medium uppercase tracking-widest text-hide-500">{me?.shop.name}</p>
          <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">Pattern library</h1>
        </div>
        {mayCreate && (
          <div className="flex items-start gap-2">
            {importer.button}
            <Link to={paths.patterns.new.getHref()} className={buttonClass('primary')}>
              New pattern
            </Link>
          </div>
        )}
      </div>
      {importer.notice}
      <LibraryFiltersBar filters={filters} onChange={onChange} />
      {items.length === 0 ? (
        <div className="stitched rounded-lg bg-hide-50 px-6 py-12 text-center">
          <p className="font-semibold text-hide-900">{filtered ? 'No pattern matches these filters.' : 'The library is empty.'}</p>
          <p className="mt-1 text-sm text-hide-700">
            {filtered ? 'Clear a filter or search for part of a name.' : mayCreate ? 'Start one from a preset: a collar, a belt, a watch strap…' : 'A maker or the owner adds the first pattern.'}
          </p>
        </div>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" aria-label="Patterns" data-testid="pattern-list">
          {items.map((item) => (
            <PatternCard key={item.id} item={item} href={paths.patterns.detail.getHref(item.id)} />
          ))}
        </ul>
      )}
      {list.hasNextPage && (
        <div className="flex justify-center">
          <Button variant="secondary" busy={list.isFetchingNextPage} onClick={() => void list.fetchNextPage()}>
            Show more patterns
          </Button>
        </div>
      )}
    </div>
  );
}
