import { Link } from 'react-router-dom';
import type { OrderStage } from '@shared/schemas/orders.ts';
import type { OrderSummary } from '@shared/schemas/order-views.ts';
import { Button } from '@/components/ui/button.tsx';
import { cx } from '@/components/ui/cx.ts';
import { formatDay, nextStage, previousStage, stageLabel } from '../../stages.ts';
import { orderGirthText } from '../order-girth.ts';

export interface OrderCardProps {
  order: OrderSummary;
  href: string;
  /** Absent when the role may not move orders. */
  onMove?: (order: OrderSummary, to: OrderStage) => void;
  moving?: boolean;
}

/** One order on the board: who, what, when, and a step back or forward along the flow. */
export function OrderCard({ order, href, onMove, moving }: OrderCardProps) {
  const back = previousStage(order.stage);
  const forward = nextStage(order.stage);
  return (
    <li
      className="rounded-md border border-hide-200 bg-white p-3 shadow-sm shadow-hide-900/5"
      draggable={Boolean(onMove)}
      onDragStart={(e) => {
        e.dataTransfer.setData('text/x-latchet-order', String(order.id));
        e.dataTransfer.effectAllowed = 'move';
      }}
      data-testid={`order-card-${order.number}`}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-x-2">
        <Link to={href} className="whitespace-nowrap font-semibold text-hide-900 underline-offset-2 hover:underline">
          Order {order.number}
        </Link>
        <span className={cx('whitespace-nowrap text-xs', order.overdue ? 'font-semibold text-thread-700' : 'text-hide-600')}>
          {order.overdue ? 'Overdue · ' : 'Due '}
          {formatDay(order.dueDate)}
        </span>
      </div>
      <p className="mt-1 text-sm text-hide-800">
        {order.wearer.name} <span className="text-hide-600">for {order.customer.name}</span>
      </p>
      <p className="text-xs text-hide-600">
        {order.pattern.name} · {orderGirthText(order)}
        {order.quantity > 1 && <> · ×{order.quantity}</>}
      </p>
      {onMove && (back || forward) && (
        <div className="mt-2 flex flex-wrap justify-between gap-1">
          {back ? (
            <Button size="sm" variant="ghost" className="h-7 px-2 text-xs" disabled={moving} onClick={() => onMove(order, back)} aria-label={`Move order ${order.number} back to ${stageLabel(back)}`}>
              ← {stageLabel(back)}
            </Button>
          ) : (
            <span />
          )}
          {forward && (
            <Button size="sm" variant="secondary" className="h-7 px-2 text-xs" disabled={moving} onClick={() => onMove(order, forward)} aria-label={`Move order ${order.number} to ${stageLabel(forward)}`}>
              {stageLabel(forward)} →
            </Button>
          )}
        </div>
      )}
    </li>
  );
}
