import type { OrderEvent } from '@shared/schemas/order-views.ts';
import { formatWhen } from '@/lib/format-when.ts';

/** What happened to the order, newest first: the server's sentence, who, and when. */
export function OrderHistory({ events }: { events: OrderEvent[] }) {
  if (events.length === 0) return <p className="text-sm text-hide-600">Nothing has happened yet.</p>;
  return (
    <ol className="grid gap-3" data-testid="order-history">
      {events.map((e) => (
        <li key={e.id} className="border-l-2 border-hide-200 pl-3">
          <p className="text-sm text-hide-900">{e.summary}</p>
          <p className="text-xs text-hide-600">
            {e.by ? e.by.name : e.byLabel} · <time dateTime={e.at}>{formatWhen(e.at)}</time>
          </p>
        </li>
      ))}
    </ol>
  );
}
