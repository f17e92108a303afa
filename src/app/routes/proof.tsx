import { useParams, type LoaderFunction } from 'react-router-dom';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { formatLength } from '@shared/units/format-length.ts';
import { proofPageQueryOptions } from '@/features/customer-links/api/queries.ts';
import { ProofAnswer } from '@/features/customer-links/components/proof-answer.tsx';
import { ProofDrawing } from '@/features/customer-links/components/proof-drawing.tsx';
import { PublicFrame } from '@/features/customer-links/components/public-frame.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { isApiError } from '@/lib/api-client.ts';
import { formatMoney } from '@/lib/format-money.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  await queryClient.prefetchQuery(proofPageQueryOptions(params.token ?? ''));
  return null;
};

function day(d: string): string {
  const t = new Date(`${d}T12:00:00Z`);
  return Number.isNaN(t.getTime()) ? d : new Intl.DateTimeFormat(undefined, { dateStyle: 'long', timeZone: 'UTC' }).format(t);
}

/**
 * The customer's proof: the piece as drawn with its finished length and fit, photos, price
 * and due date, and Approve / Ask for a change. Never the template or cutting files.
 */
export function Component() {
  const token = useParams().token ?? '';
  const proof = useQuery(proofPageQueryOptions(token));
  if (proof.isPending)
    return (
      <PublicFrame>
        <p role="status">Opening your proof…</p>
      </PublicFrame>
    );
  if (proof.isError)
    return (
      <PublicFrame>
        <Notice tone="danger" role="alert" title="This link does not open a proof">
          {isApiError(proof.error, 404) ? 'The shop may have replaced it with a newer one. Ask them for the latest link.' : proof.error.message}
        </Notice>
      </PublicFrame>
    );
  const p = proof.data;
  const u = p.unit;
  const facts: [string, string][] = [
    ['Finished length', p.finishedLengthMm === null ? '–' : formatLength(p.finishedLengthMm, u)],
    ['Made to fit', p.girthMm === null ? '–' : formatLength(p.girthMm, u)],
    ['Fits from', p.fitRangeMm ? `${formatLength(p.fitRangeMm[0], u)} to ${formatLength(p.fitRangeMm[1], u)}` : 'One length'],
    ['Leather', [p.leatherColour, p.leatherFinish].filter(Boolean).join(', ') || 'As agreed with the shop'],
    ['Quantity', String(p.quantity)],
    ['Price', p.price ? formatMoney(p.price.totalCents, p.price.currency) : 'The shop will confirm'],
    ['Ready by', day(p.dueDate)],
  ];
  return (
    <PublicFrame shopName={p.shopName}>
      <div className="grid gap-6">
        <div>
          <p className="text-sm font-medium uppercase tracking-widest text-hide-500">
            Proof · order {p.orderNumber} · for {p.customerName}
          </p>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight text-hide-900 sm:text-3xl">
            {p.pieceName} for {p.wearer.name}
          </h1>
          <p className="mt-1 text-hide-700">Check the drawing and the details. Approve it and {p.shopName} starts cutting, or tell them what should change.</p>
        </div>
        <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_320px]">
          <div className="grid min-w-0 gap-6">
            <Panel title="The piece">
              <ProofDrawing svg={p.drawingSvg} label={`Drawing of ${p.pieceName}`} />
            </Panel>
            {p.photos.length > 0 && (
              <Panel title="Photos">
                <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3" data-testid="proof-photos">
                  {p.photos.map((ph) => (
                    <li key={ph.id}>
                      <a href={ph.url} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-md border border-hide-200 bg-white">
                        <img src={ph.thumbUrl} alt={ph.caption || 'Photo of the piece'} className="aspect-square w-full object-cover" loading="lazy" />
                      </a>
                      {ph.caption && <p className="mt-1 text-xs text-hide-700">{ph.caption}</p>}
                    </li>
                  ))}
                </ul>
              </Panel>
            )}
          </div>
          <div className="grid min-w-0 gap-6">
            <Panel title="Details">
              <dl className="grid gap-2 text-sm" data-testid="proof-facts">
                {facts.map(([k, v]) => (
                  <div key={k} className="flex justify-between gap-3 border-b border-hide-100 pb-1 last:border-0">
                    <dt className="text-hide-600">{k}</dt>
                    <dd className="text-right font-medium text-hide-900">{v}</dd>
                  </div>
                ))}
              </dl>
            </Panel>
            <Panel title="Your answer">
              <ProofAnswer token={token} proof={p} />
            </Panel>
          </div>
        </div>
      </div>
    </PublicFrame>
  );
}
