import type { ReactNode } from 'react';
import { NavLink } from 'react-router-dom';
import { cx } from '@/components/ui/cx.ts';

/** The orders screens' title, their two views as tabs, and the screen's actions. */
export function OrdersHeader({ shopName, tabs, actions }: { shopName: string; tabs: { to: string; label: string }[]; actions?: ReactNode }) {
  return (
    <header className="grid gap-4 border-b border-hide-200">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm font-medium uppercase tracking-widest text-hide-500">{shopName}</p>
          <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">Orders</h1>
        </div>
        {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
      </div>
      <nav aria-label="Order views" className="-mb-px flex gap-1">
        {tabs.map((t) => (
          <NavLink
            key={t.to}
            to={t.to}
            end
            className={({ isActive }) =>
              cx('border-b-2 px-3 py-2 text-sm font-medium', isActive ? 'border-hide-700 text-hide-900' : 'border-transparent text-hide-600 hover:border-hide-300 hover:text-hide-900')
            }
          >
            {t.label}
          </NavLink>
        ))}
      </nav>
    </header>
  );
}
