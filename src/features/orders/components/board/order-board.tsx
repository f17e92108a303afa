import { useState } from 'react';
import type { OrderStage } from '@shared/schemas/orders.ts';
import type { OrderSummary } from '@shared/schemas/order-views.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { cx } from '@/components/ui/cx.ts';
import { useMoveOrder } from '../../api/mutations.ts';
import { ORDER_STAGES, stageLabel } from '../../stages.ts';
import { OrderCard } from './order-card.tsx';

/**
 * The orders as columns by stage. Move buttons on each card step it along the flow; cards can
 * also be dragged to a column (a mouse nicety; the buttons work everywhere, keyboards too).
 */
export function OrderBoard({ orders, orderHref, canMove }: { orders: OrderSummary[]; orderHref: (id: number) => string; canMove: boolean }) {
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
          const inStage = orders.filter((o) => o.stage === stage);
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
                <span className="rounded-full bg-hide-100 px-1.5 text-hide-700">{inStage.length}</span>
              </h2>
              {inStage.length === 0 ? (
                <p className="px-1 pb-2 text-xs text-hide-500">None</p>
              ) : (
                <ul className="grid gap-2">
                  {inStage.map((o) => (
                    <OrderCard key={o.id} order={o} href={orderHref(o.id)} {...(canMove ? { onMove } : {})} moving={move.isPending} />
                  ))}
                </ul>
              )}
            </section>
          );
        })}
      </div>
    </div>
  );
}
