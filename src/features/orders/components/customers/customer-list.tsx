import { Link } from 'react-router-dom';
import type { CustomerView } from '@shared/schemas/order-views.ts';

/** The shop's customers with how many wearers and open orders each has. */
export function CustomerList({ customers, customerHref }: { customers: CustomerView[]; customerHref: (id: number) => string }) {
  return (
    <ul className="divide-y divide-hide-100 rounded-lg border border-hide-200 bg-white/70" data-testid="customer-list">
      {customers.map((c) => (
        <li key={c.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-3">
          <div className="min-w-0">
            <Link to={customerHref(c.id)} className="font-semibold text-hide-900 underline-offset-2 hover:underline">
              {c.name}
            </Link>
            <p className="break-all text-xs text-hide-600">{[c.email, c.phone].filter(Boolean).join(' · ') || 'No contact details'}</p>
          </div>
          <p className="text-xs text-hide-700">
            {c.wearerCount} {c.wearerCount === 1 ? 'wearer' : 'wearers'} · {c.openOrderCount} open {c.openOrderCount === 1 ? 'order' : 'orders'}
          </p>
        </li>
      ))}
    </ul>
  );
}
