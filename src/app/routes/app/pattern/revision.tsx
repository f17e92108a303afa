import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { Link, useNavigate, useParams, type LoaderFunction } from 'react-router-dom';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { RevisionActions } from '@/features/patterns/components/history/revision-actions.tsx';
import { SharePanel } from '@/features/patterns/components/editor/share-panel.tsx';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { patternQueryOptions, revisionQueryOptions } from '@/features/patterns/api/queries.ts';
import { PatternHeader } from '@/features/patterns/components/pattern-header.tsx';
import { LivePreview } from '@/features/patterns/components/editor/live-preview.tsx';
import { Downloads } from '@/features/patterns/components/editor/downloads.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import { paths } from '../../../paths.ts';
import { idFromParams, patternTabs } from './pattern-tabs.ts';

function numberFromParams(raw: string | undefined): number {
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1) throw new Response('Not found', { status: 404 });
  return n;
}

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  if (!(await isSignedIn(queryClient))) return null;
  const id = idFromParams(params.id);
  const n = numberFromParams(params.n);
  await Promise.all([queryClient.ensureQueryData(patternQueryOptions(id)), queryClient.ensureQueryData(revisionQueryOptions(id, n))]);
  return null;
};

/** One old revision, read-only: its drawing as the engine draws it now, and its files. */
export function Component() {
  const params = useParams();
  const id = idFromParams(params.id);
  const n = numberFromParams(params.n);
  const { data: detail } = useSuspenseQuery(patternQueryOptions(id));
  const { data: revision } = useSuspenseQuery(revisionQueryOptions(id, n));
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const navigate = useNavigate();
  const revisionSpec = revision.spec as StrapSpec;
  const canEdit = me ? can(me.role, 'revisions.restore') : false;
  const canShare = me ? can(me.role, 'share.create') : false;
  return (
    <div className="grid gap-6">
      <PatternHeader pattern={detail.pattern} head={detail.head} tabs={patternTabs(id)} />
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <div>
          <h2 className="text-xl font-semibold text-hide-900">Revision {revision.number}</h2>
          <p className="text-sm text-hide-600">
            {formatWhen(revision.createdAt)}
            {revision.author && <> · {revision.author.name}</>}
            {revision.note && <> · {revision.note}</>}
          </p>
        </div>
        <Link to={paths.patterns.history.getHref(id)} className="text-sm font-medium text-hide-800 underline underline-offset-4">
          Back to history
        </Link>
      </div>
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_340px]">
        <LivePreview values={revision.spec} revisionLabel={String(revision.number)} />
        <div className="grid gap-4">
          {canEdit && (
            <Panel title="Use this revision">
              <RevisionActions
                patternId={id}
                number={n}
                headNumber={detail.head.number}
                headEtag={detail.etag}
                onRestored={() => navigate(paths.patterns.detail.getHref(id))}
                onDuplicated={(copy) => navigate(paths.patterns.detail.getHref(copy))}
              />
            </Panel>
          )}
          {canShare && (
            <Panel title="Share read-only">
              <SharePanel patternId={id} headNumber={n} />
            </Panel>
          )}
          <Panel title="Print and download">
            <Downloads
              base={`/api/patterns/${id}/revisions/${n}`}
              kind={detail.pattern.kind}
              revisionNumber={n}
              unit={revisionSpec.units}
              sizes={(revisionSpec.sizes ?? []).map((s) => s.name)}
            />
          </Panel>
        </div>
      </div>
    </div>
  );
}
