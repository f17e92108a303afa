import { Link } from 'react-router-dom';
import type { OrderSummary } from '@shared/schemas/order-views.ts';
import { cx } from '@/components/ui/cx.ts';
import { formatMoney } from '@/lib/format-money.ts';
import { formatDay } from '../../stages.ts';
import { orderGirthText } from '../order-girth.ts';
import { StageBadge } from '../stage-badge.tsx';

/** Orders as rows (scrolls sideways inside its frame on a phone; the page never does). */
export function OrderTable({ orders, orderHref }: { orders: OrderSummary[]; orderHref: (id: number) => string }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-hide-200 bg-white/70">
      <table className="w-full min-w-[44rem] text-left text-sm" data-testid="order-table">
        <thead className="border-b border-hide-200 bg-hide-50 text-xs uppercase tracking-wide text-hide-700">
          <tr>
            <th scope="col" className="px-3 py-2">Order</th>
            <th scope="col" className="px-3 py-2">Stage</th>
            <th scope="col" className="px-3 py-2">Customer and wearer</th>
            <th scope="col" className="px-3 py-2">Pattern and girth</th>
            <th scope="col" className="px-3 py-2">Due</th>
            <th scope="col" className="px-3 py-2 text-right">Price</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-hide-100">
          {orders.map((o) => (
            <tr key={o.id} className="align-top">
              <td className="px-3 py-2 font-semibold">
                <Link to={orderHref(o.id)} className="text-hide-900 underline-offset-2 hover:underline">
                  {o.number}
                </Link>
              </td>
              <td className="px-3 py-2">
                <StageBadge stage={o.stage} />
              </td>
              <td className="px-3 py-2">
                {o.customer.name}
                <span className="block text-xs text-hide-600">{o.wearer.name}</span>
              </td>
              <td className="px-3 py-2">
                {o.pattern.name} <span className="text-xs text-hide-600">r{o.revision}</span>
                <span className="block text-xs text-hide-600">
                  {orderGirthText(o)}
                  {o.quantity > 1 && <> · ×{o.quantity}</>}
                </span>
              </td>
              <td className={cx('whitespace-nowrap px-3 py-2', o.overdue && 'font-semibold text-thread-700')}>
                {formatDay(o.dueDate)}
                {o.overdue && <span className="block text-xs">Overdue</span>}
              </td>
              <td className="whitespace-nowrap px-3 py-2 text-right tabular-nums">{o.priceCents === null ? '–' : formatMoney(o.priceCents, o.currency)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
