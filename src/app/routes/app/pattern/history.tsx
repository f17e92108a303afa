import { useState } from 'react';
import { useNavigate, useParams, type LoaderFunction } from 'react-router-dom';
import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { activityQueryOptions } from '@/features/patterns/api/activity.ts';
import { ActivityList } from '@/features/patterns/components/history/activity-list.tsx';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { patternQueryOptions, revisionsQueryOptions } from '@/features/patterns/api/queries.ts';
import { useRestoreRevision } from '@/features/patterns/api/mutations.ts';
import { PatternHeader } from '@/features/patterns/components/pattern-header.tsx';
import { RevisionList } from '@/features/patterns/components/history/revision-list.tsx';
import { ComparePicker } from '@/features/patterns/components/history/compare-picker.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { isApiError } from '@/lib/api-client.ts';
import { paths } from '../../../paths.ts';
import { idFromParams, patternTabs } from './pattern-tabs.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  if (!(await isSignedIn(queryClient))) return null;
  const id = idFromParams(params.id);
  await Promise.all([queryClient.ensureQueryData(patternQueryOptions(id)), queryClient.ensureQueryData(revisionsQueryOptions(id))]);
  return null;
};

/** A pattern's history: every revision, compare any two, restore an old one as the new head. */
export function Component() {
  const id = idFromParams(useParams().id);
  const navigate = useNavigate();
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: detail } = useSuspenseQuery(patternQueryOptions(id));
  const { data: history } = useSuspenseQuery(revisionsQueryOptions(id));
  const restore = useRestoreRevision(id);
  const activity = useQuery(activityQueryOptions(id));
  const [restoring, setRestoring] = useState<number | null>(null);
  const [message, setMessage] = useState<{ tone: 'success' | 'danger'; text: string }>();
  const numbers = history.items.map((r) => r.number);
  const head = detail.head.number;

  const onRestore = async (n: number) => {
    setRestoring(n);
    setMessage(undefined);
    try {
      const restored = await restore.mutateAsync({ n, etag: detail.etag });
      setMessage({ tone: 'success', text: `Revision ${n} is restored as revision ${restored.head.number}. Nothing was deleted.` });
    } catch (err) {
      setMessage({ tone: 'danger', text: isApiError(err, 412) ? 'Someone saved a newer revision a moment ago; look at it before restoring.' : err instanceof Error ? err.message : 'The restore did not go through.' });
    } finally {
      setRestoring(null);
    }
  };

  return (
    <div className="grid gap-6">
      <PatternHeader pattern={detail.pattern} head={detail.head} tabs={patternTabs(id)} />
      {message && (
        <Notice tone={message.tone} role={message.tone === 'danger' ? 'alert' : 'status'}>
          {message.text}
        </Notice>
      )}
      {numbers.length > 1 && (
        <Panel title="Compare">
          <ComparePicker
            key={head}
            numbers={[...numbers].reverse()}
            initial={{ from: numbers[1] ?? 1, to: head }}
            onCompare={(from, to) => navigate(paths.patterns.compare.getHref(id, from, to))}
          />
        </Panel>
      )}
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_320px]">
        <RevisionList
          revisions={history.items}
          headNumber={head}
          canRestore={me ? can(me.role, 'revisions.restore') : false}
          restoring={restoring}
          hrefOf={(n) => paths.patterns.revision.getHref(id, n)}
          compareHref={(from, to) => paths.patterns.compare.getHref(id, from, to)}
          onRestore={(n) => void onRestore(n)}
        />
        <Panel title="Activity">{activity.data ? <ActivityList items={activity.data.items} /> : <p className="text-sm text-hide-600">Loading…</p>}</Panel>
      </div>
    </div>
  );
}
