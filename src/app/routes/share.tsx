import { useMemo } from 'react';
import { useParams, type LoaderFunction } from 'react-router-dom';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { renderSvg } from '@shared/render/svg.ts';
import { sharedPatternQueryOptions } from '@/features/share/api/queries.ts';
import { DrawingView } from '@/components/pattern/drawing-view.tsx';
import { FitTable } from '@/components/pattern/fit-table.tsx';
import { CutListView } from '@/components/pattern/cut-list.tsx';
import { WarningsList } from '@/components/pattern/warnings-list.tsx';
import { Cautions } from '@/components/pattern/cautions.tsx';
import { Wordmark } from '@/components/ui/brand-mark.tsx';
import { Badge } from '@/components/ui/badge.tsx';
import { buttonClass } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { isApiError } from '@/lib/api-client.ts';
import { formatWhen } from '@/lib/format-when.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { kindLabel } from '@/features/patterns/kinds.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  // A revoked link is a page to show (404), not a crash: prefetch keeps the error for the component.
  await queryClient.prefetchQuery(sharedPatternQueryOptions(params.token ?? ''));
  return null;
};

/** The public page of a share link: one revision's drawing, fit and cut list, and its files. */
export function Component() {
  const token = useParams().token ?? '';
  const shared = useQuery(sharedPatternQueryOptions(token));
  const svg = useMemo(() => (shared.data ? renderSvg(shared.data.drawing, { window, document }, { titleBlock: false }) : ''), [shared.data]);

  let body;
  if (shared.isPending) body = <p role="status">Opening the pattern…</p>;
  else if (shared.isError) {
    body = (
      <Notice tone="danger" role="alert" title="This link does not open a pattern">
        {isApiError(shared.error, 404) ? 'It may have been revoked by the shop, or mistyped.' : shared.error.message}
      </Notice>
    );
  } else {
    const { data } = shared;
    const unit = data.layout.units;
    const strap = data.layout.pieces.find((p) => p.role === 'strap');
    body = (
      <div className="grid gap-6">
        <div>
          <p className="text-sm font-medium uppercase tracking-widest text-hide-500">Shared by {data.shopName} · for makers</p>
          <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">{data.pattern.name}</h1>
          <p className="mt-1 flex flex-wrap items-center gap-2 text-sm text-hide-600">
            <Badge tone="brass">{kindLabel(data.pattern.kind)}</Badge> Revision {data.revision.number}, {formatWhen(data.revision.createdAt)} · read-only
            {strap && <> · blank {formatLength(strap.blankLengthMm, unit)} × {formatLength(strap.widthMm, unit)}</>}
          </p>
        </div>
        <Notice tone="info" title="A pattern for makers">
          This page carries the full-size template and cutting files for someone who will make the piece. Waiting for an order? Your
          maker sends a separate link to see and approve it.
        </Notice>
        <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_340px]">
          <div className="grid grid-cols-[minmax(0,1fr)] gap-4">
            <Panel title="Drawing">
              <DrawingView svg={svg} label={`Drawing of ${data.pattern.name}`} />
            </Panel>
            <WarningsList warnings={data.layout.warnings} />
            {data.layout.fit && (
              <Panel title="Fit at each hole">
                <FitTable fit={data.layout.fit} unit={unit} />
              </Panel>
            )}
            <Panel title="Cut list">
              <CutListView list={data.layout.cutList} unit={unit} />
            </Panel>
          </div>
          <Panel title="Print and download">
            <div className="grid gap-3">
              <div className="flex flex-wrap gap-2">
                <a className={buttonClass('primary', 'sm')} href={data.downloads.pdf} download>
                  Template PDF
                </a>
                <a className={buttonClass('secondary', 'sm')} href={data.downloads.svg} download>
                  Full-size SVG
                </a>
                <a className={buttonClass('secondary', 'sm')} href={data.downloads.cutterSvg} download>
                  Cutter SVG
                </a>
              </div>
              <p className="text-xs text-hide-600">Print at 100 % (actual size) and check the calibration square.</p>
              <Cautions kind={data.pattern.kind} />
            </div>
          </Panel>
        </div>
      </div>
    );
  }

  return (
    <div className="min-h-screen">
      <header className="border-b border-hide-800 bg-hide-900">
        <div className="mx-auto flex h-14 max-w-7xl items-center px-4 sm:px-6">
          <Wordmark className="text-paper" />
        </div>
      </header>
      <main className="mx-auto max-w-7xl px-4 py-8 sm:px-6">{body}</main>
    </div>
  );
}
