import { useNavigate, useParams, useSearchParams, type LoaderFunction } from 'react-router-dom';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { patternQueryOptions, revisionsQueryOptions } from '@/features/patterns/api/queries.ts';
import { compareQueryOptions } from '@/features/patterns/api/compare.ts';
import { PatternHeader } from '@/features/patterns/components/pattern-header.tsx';
import { ComparePicker } from '@/features/patterns/components/history/compare-picker.tsx';
import { CompareView } from '@/features/patterns/components/history/compare-view.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { paths } from '../../../paths.ts';
import { idFromParams, patternTabs } from './pattern-tabs.ts';

function pair(search: URLSearchParams): { from: number; to: number } {
  const from = Number(search.get('from'));
  const to = Number(search.get('to'));
  if (!Number.isInteger(from) || !Number.isInteger(to) || from < 1 || to < 1) throw new Response('Not found', { status: 404 });
  return { from, to };
}

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params, request }) => {
  if (!(await isSignedIn(queryClient))) return null;
  const id = idFromParams(params.id);
  const { from, to } = pair(new URL(request.url).searchParams);
  await Promise.all([
    queryClient.ensureQueryData(patternQueryOptions(id)),
    queryClient.ensureQueryData(revisionsQueryOptions(id)),
    queryClient.ensureQueryData(compareQueryOptions(id, from, to)),
  ]);
  return null;
};

/** Two revisions side by side: changed values with units, and the layout's moved features. */
export function Component() {
  const id = idFromParams(useParams().id);
  const [search] = useSearchParams();
  const { from, to } = pair(search);
  const navigate = useNavigate();
  const { data: detail } = useSuspenseQuery(patternQueryOptions(id));
  const { data: history } = useSuspenseQuery(revisionsQueryOptions(id));
  const { data: comparison } = useSuspenseQuery(compareQueryOptions(id, from, to));
  const unit = detail.head.spec?.units ?? 'mm';
  return (
    <div className="grid gap-6">
      <PatternHeader pattern={detail.pattern} head={detail.head} tabs={patternTabs(id)} />
      <Panel title={`Revision ${from} against ${to}`}>
        <ComparePicker
          key={`${from}-${to}`}
          numbers={history.items.map((r) => r.number).reverse()}
          initial={{ from, to }}
          onCompare={(a, b) => navigate(paths.patterns.compare.getHref(id, a, b))}
        />
      </Panel>
      <CompareView comparison={comparison} unit={unit} spec={detail.head.spec} />
    </div>
  );
}
