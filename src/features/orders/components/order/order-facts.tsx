import { Link } from 'react-router-dom';
import { BODY_PART_LABELS, MEASURE_METHOD_LABELS, formatGirth } from '@shared/schemas/orders.ts';
import type { OrderDetail } from '@shared/schemas/order-views.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { formatWhen } from '@/lib/format-when.ts';
import { formatDay } from '../../stages.ts';
import { orderGirthText } from '../order-girth.ts';

function Fact({ label, children, testId }: { label: string; children: React.ReactNode; testId?: string }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs font-medium uppercase tracking-wide text-hide-600">{label}</dt>
      <dd className="text-sm text-hide-900" data-testid={testId}>
        {children}
      </dd>
    </div>
  );
}

/** What the order is: for whom, from which pattern, at what girth, in what leather, by when. */
export function OrderFacts({ order, customerHref, patternHref }: { order: OrderDetail; customerHref: string; patternHref: string }) {
  const u = order.unit;
  const m = order.measurement;
  return (
    <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
      <Fact label="Customer">
        <Link to={customerHref} className="underline-offset-2 hover:underline">
          {order.customer.name}
        </Link>
        {order.customerEmail && <span className="block break-all text-xs text-hide-600">{order.customerEmail}</span>}
      </Fact>
      <Fact label="Wearer">{order.wearer.name}</Fact>
      <Fact label="Pattern">
        <Link to={patternHref} className="underline-offset-2 hover:underline">
          {order.pattern.name}
        </Link>{' '}
        <span className="text-xs text-hide-600">revision {order.revision}</span>
      </Fact>
      <Fact label="Girth" testId="order-girth">
        {orderGirthText(order)}
        {m && (
          <span className="block text-xs text-hide-600">
            {BODY_PART_LABELS[m.part]}, {MEASURE_METHOD_LABELS[m.method].toLowerCase()}, {m.takenBy?.name ?? m.takenByLabel}, {formatWhen(m.takenAt)} ({formatGirth(m.girthMm, m.unit)})
          </span>
        )}
      </Fact>
      {order.fitted && (
        <>
          <Fact label="Finished length">{formatLength(order.fitted.finishedLengthMm, u)}</Fact>
          <Fact label="Fits">
            {order.fitted.fitRangeMm ? `${formatLength(order.fitted.fitRangeMm[0], u)} to ${formatLength(order.fitted.fitRangeMm[1], u)}` : 'One length'}
            <span className="block text-xs text-hide-600">blank {formatLength(order.fitted.blankLengthMm, u)}</span>
          </Fact>
        </>
      )}
      <Fact label="Due">
        <span className={order.overdue ? 'font-semibold text-thread-700' : undefined}>
          {formatDay(order.dueDate)}
          {order.overdue && ' (overdue)'}
        </span>
      </Fact>
      <Fact label="Quantity">{order.quantity}</Fact>
      <Fact label="Leather">{[order.leatherColour, order.leatherFinish].filter(Boolean).join(', ') || '–'}</Fact>
      <Fact label="Thread">{order.thread || '–'}</Fact>
      {order.notes && (
        <div className="sm:col-span-2">
          <Fact label="Notes">
            <span className="whitespace-pre-line">{order.notes}</span>
          </Fact>
        </div>
      )}
    </dl>
  );
}
