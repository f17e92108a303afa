import { useState } from 'react';
import { useParams, type LoaderFunction } from 'react-router-dom';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { WEARER_KIND_LABELS, formatGirth } from '@shared/schemas/orders.ts';
import type { MeasureAnswered } from '@shared/schemas/order-views.ts';
import { measurePageQueryOptions } from '@/features/customer-links/api/queries.ts';
import { MeasureForm } from '@/features/customer-links/components/measure-form.tsx';
import { PublicFrame } from '@/features/customer-links/components/public-frame.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { ApiError, isApiError } from '@/lib/api-client.ts';
import { formatWhen } from '@/lib/format-when.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  // A used or expired link is an answer to show, not a crash: prefetch keeps the error.
  await queryClient.prefetchQuery(measurePageQueryOptions(params.token ?? ''));
  return null;
};

function linkProblem(err: Error): { title: string; text: string } {
  if (err instanceof ApiError && err.code === 'link_used') return { title: 'This link has been used', text: 'We already have your measurement. If it needs changing, reply to the shop’s e-mail.' };
  if (err instanceof ApiError && err.code === 'link_expired') return { title: 'This link has run out', text: 'Ask the shop for a new measuring link.' };
  if (isApiError(err, 404)) return { title: 'This link does not open a measuring page', text: 'It may have been mistyped; check the address in the e-mail.' };
  return { title: 'The page did not open', text: err.message };
}

/** The customer's measuring page, opened from the e-mail: how to measure, two readings, cautions. */
export function Component() {
  const token = useParams().token ?? '';
  const page = useQuery(measurePageQueryOptions(token));
  const [answered, setAnswered] = useState<MeasureAnswered | null>(null);

  if (page.isPending)
    return (
      <PublicFrame>
        <p role="status">Opening the measuring page…</p>
      </PublicFrame>
    );
  if (page.isError) {
    const p = linkProblem(page.error);
    return (
      <PublicFrame>
        <Notice tone="danger" role="alert" title={p.title}>
          {p.text}
        </Notice>
      </PublicFrame>
    );
  }
  const d = page.data;
  return (
    <PublicFrame shopName={d.shopName}>
      <div className="grid gap-6">
        <div>
          <p className="text-sm font-medium uppercase tracking-widest text-hide-500">
            For {d.customerName} · {WEARER_KIND_LABELS[d.wearer.kind]}
          </p>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight text-hide-900 sm:text-3xl">
            Measure {d.wearer.name}’s {d.where}
          </h1>
          <p className="mt-1 text-hide-700">
            {d.shopName} is making a {d.pieceKind.replace('-', ' ')} to fit. This link works until {formatWhen(d.expiresAt)}.
          </p>
        </div>
        {d.message && (
          <Notice tone="info" title={`A note from ${d.shopName}`}>
            <p className="whitespace-pre-line">{d.message}</p>
          </Notice>
        )}
        {answered ? (
          <Notice tone="success" role="status" title="Thank you: your measurement is with the shop">
            {formatGirth(answered.girthMm, answered.unit)}. {answered.thanks}
          </Notice>
        ) : (
          <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
            <Panel title="How to measure">
              <ol className="list-decimal space-y-2 pl-5 text-sm text-hide-800" data-testid="how-to-measure">
                {d.howTo.map((step) => (
                  <li key={step}>{step}</li>
                ))}
              </ol>
            </Panel>
            <Panel title="Your measurement">
              <MeasureForm token={token} page={d} onAnswered={setAnswered} />
            </Panel>
          </div>
        )}
        <Notice tone="warning" title="Fit and safety">
          <ul className="list-disc space-y-0.5 pl-5" data-testid="fit-cautions">
            {d.cautions.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </Notice>
      </div>
    </PublicFrame>
  );
}
