import { useState } from 'react';
import { Link, useParams, type LoaderFunction } from 'react-router-dom';
import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { orderQueryOptions, pricingQueryOptions } from '@/features/orders/api/queries.ts';
import { StageBadge } from '@/features/orders/components/stage-badge.tsx';
import { StageFlow } from '@/features/orders/components/order/stage-flow.tsx';
import { OrderFacts } from '@/features/orders/components/order/order-facts.tsx';
import { OrderEditForm } from '@/features/orders/components/order/order-edit-form.tsx';
import { OrderHistory } from '@/features/orders/components/order/order-history.tsx';
import { PriceBreakdown } from '@/features/orders/components/order/price-breakdown.tsx';
import { PhotoPanel } from '@/features/orders/components/order/photo-panel.tsx';
import { JobSheetPanel } from '@/features/orders/components/order/job-sheet-panel.tsx';
import { CustomerLinksPanel } from '@/features/orders/components/order/customer-links-panel.tsx';
import { Button } from '@/components/ui/button.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { paths } from '../../../paths.ts';
import { idFromParams } from '../pattern/pattern-tabs.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  if (!(await isSignedIn(queryClient))) return null;
  await queryClient.ensureQueryData(orderQueryOptions(idFromParams(params.id)));
  return null;
};

/** One order: its stage flow, what it is, its price, photos, job sheet, customer links and history. */
export function Component() {
  const id = idFromParams(useParams().id);
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: order } = useSuspenseQuery(orderQueryOptions(id));
  const pricing = useQuery(pricingQueryOptions());
  const [editing, setEditing] = useState(false);
  if (!me) return null;
  const role = me.role;
  return (
    <div className="grid gap-6">
      <header className="grid gap-1 border-b border-hide-200 pb-4">
        <p className="text-sm">
          <Link to={paths.orders.board.getHref()} className="text-hide-700 underline-offset-2 hover:underline">
            ← Orders
          </Link>
        </p>
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold tracking-tight text-hide-900 sm:text-3xl">Order {order.number}</h1>
          <span data-testid="order-stage">
            <StageBadge stage={order.stage} />
          </span>
        </div>
        <p className="text-hide-700">
          {order.pattern.name} for {order.wearer.name} ({order.customer.name})
        </p>
      </header>

      <Panel title="Stage">
        <StageFlow order={order} canMove={can(role, 'orders.move')} />
      </Panel>

      {/* On a phone the panels run in the order the bench needs them (price and job sheet before
          photos and history); from lg the two columns are wrappers again. */}
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_380px]">
        <div className="contents lg:grid lg:min-w-0 lg:gap-6">
          <Panel
            className="order-1 lg:order-none"
            title="The order"
            aside={
              can(role, 'orders.update') && !editing ? (
                <Button size="sm" variant="ghost" onClick={() => setEditing(true)}>
                  Edit
                </Button>
              ) : undefined
            }
          >
            {editing ? (
              <OrderEditForm order={order} leathers={pricing.data?.leathers ?? []} onDone={() => setEditing(false)} />
            ) : (
              <OrderFacts order={order} customerHref={paths.customers.detail.getHref(order.customer.id)} patternHref={paths.patterns.detail.getHref(order.pattern.id)} />
            )}
          </Panel>
          <Panel className="order-5 lg:order-none" title={`Photos (${order.photos.length})`}>
            <PhotoPanel orderId={order.id} photos={order.photos} canUpload={can(role, 'orders.photos.upload')} canDelete={can(role, 'orders.photos.delete')} />
          </Panel>
          <Panel className="order-6 lg:order-none" title="History">
            <OrderHistory events={order.history} />
          </Panel>
        </div>
        <div className="contents lg:grid lg:min-w-0 lg:gap-6">
          <Panel className="order-2 lg:order-none" title="Price">
            <PriceBreakdown price={order.price} />
          </Panel>
          <Panel className="order-3 lg:order-none" title="Job sheet">
            <JobSheetPanel orderId={order.id} prints={order.prints} ready={order.girthMm !== null} />
          </Panel>
          <Panel className="order-4 lg:order-none" title="Customer links">
            <CustomerLinksPanel order={order} canRequest={can(role, 'orders.requestMeasurement')} canProof={can(role, 'orders.proof')} />
          </Panel>
        </div>
      </div>
    </div>
  );
}
