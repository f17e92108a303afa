import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { OrderStage } from '@shared/schemas/orders.ts';
import type { OrderSummary } from '@shared/schemas/order-views.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { cx } from '@/components/ui/cx.ts';
import { useMoveOrder } from '../../api/mutations.ts';
import { ORDER_STAGES, stageLabel } from '../../stages.ts';
import { OrderCard } from './order-card.tsx';

/**
 * Handed-over orders the board still shows, most recently changed first (an order is last changed when it is handed over, unless edited since). The column is the
 * bench's "just went out" shelf, not the shop's archive: it grew by every order ever finished.
 * The rest are a link away, in the table filtered to that stage.
 */
export const HANDED_OVER_SHOWN = 5;

/** The orders a column lists: all of a working stage; the latest few handed over. */
export function columnOrders(orders: readonly OrderSummary[], stage: OrderStage): { shown: OrderSummary[]; hidden: number } {
  const inStage = orders.filter((o) => o.stage === stage);
  if (stage !== 'handed-over' || inStage.length <= HANDED_OVER_SHOWN) return { shown: inStage, hidden: 0 };
  const latest = [...inStage].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt)).slice(0, HANDED_OVER_SHOWN);
  return { shown: latest, hidden: inStage.length - latest.length };
}

/**
 * The orders as columns by stage. Move buttons on each card step it along the flow; cards can
 * also be dragged to a column (a mouse nicety; the buttons work everywhere, keyboards too).
 */
export function OrderBoard({ orders, orderHref, allInStageHref, canMove }: { orders: OrderSummary[]; orderHref: (id: number) => string; allInStageHref: (stage: OrderStage) => string; canMove: boolean }) {
  const move = useMoveOrder();
  const [over, setOver] = useState<OrderStage | null>(null);
  const [moved, setMoved] = useState<string | null>(null);
  const onMove = (order: OrderSummary, to: OrderStage) => {
    setMoved(null);
    move.mutate({ id: order.id, stage: to }, { onSuccess: () => setMoved(`Order ${order.number} moved to ${stageLabel(to)}.`) });
  };
  return (
    <div className="grid gap-3">
      {move.isError && (
        <Notice tone="danger" role="alert" title="The order did not move">
          {move.error.message}
        </Notice>
      )}
      <p role="status" className="sr-only">
        {moved}
      </p>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4 xl:grid-cols-7" data-testid="order-board">
        {ORDER_STAGES.map((stage) => {
          const { shown, hidden } = columnOrders(orders, stage);
          const count = shown.length + hidden;
          return (
            <section
              key={stage}
              aria-label={stageLabel(stage)}
              className={cx('flex min-w-0 flex-col rounded-lg border bg-hide-50/70 p-2', over === stage ? 'border-brass-500' : 'border-hide-200')}
              onDragOver={(e) => {
                if (!canMove) return;
                e.preventDefault();
                setOver(stage);
              }}
              onDragLeave={() => setOver(null)}
              onDrop={(e) => {
                setOver(null);
                const id = Number(e.dataTransfer.getData('text/x-latchet-order'));
                const order = orders.find((o) => o.id === id);
                if (canMove && order && order.stage !== stage) onMove(order, stage);
              }}
            >
              <h2 className="flex items-center justify-between px-1 pb-2 text-xs font-semibold uppercase tracking-wide text-hide-700">
                <span>{stageLabel(stage)}</span>
                <span className="rounded-full bg-hide-100 px-1.5 text-hide-700">{count}</span>
              </h2>
              {count === 0 ? (
                <p className="px-1 pb-2 text-xs text-hide-500">None</p>
              ) : (
                <ul className="grid gap-2">
                  {shown.map((o) => (
                    <OrderCard key={o.id} order={o} href={orderHref(o.id)} {...(canMove ? { onMove } : {})} moving={move.isPending} />
                  ))}
                </ul>
              )}
              {hidden > 0 && (
                <Link to={allInStageHref(stage)} className="mt-2 px-1 text-xs text-hide-700 underline">
                  {hidden} earlier {hidden === 1 ? 'order' : 'orders'}: all {count} in the table
                </Link>
              )}
            </section>
          );
        })}
      </div>
    </div>
  );
}
