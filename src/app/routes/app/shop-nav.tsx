import { NavLink } from 'react-router-dom';
import { cx } from '@/components/ui/cx.ts';
import { paths } from '../../paths.ts';

/** The Shop page's screens: its people and its standards. */
export function ShopNav() {
  const items = [
    { to: paths.shop.members.getHref(), label: 'People' },
    { to: paths.shop.standards.getHref(), label: 'Standards' },
  ];
  return (
    <nav aria-label="Shop" className="flex gap-1 border-b border-hide-200">
      {items.map((i) => (
        <NavLink
          key={i.to}
          to={i.to}
          className={({ isActive }) =>
            cx('-mb-px border-b-2 px-3 py-2 text-sm font-medium', isActive ? 'border-hide-800 text-hide-900' : 'border-transparent text-hide-600 hover:text-hide-900')
          }
        >
          {i.label}
        </NavLink>
      ))}
    </nav>
  );
}
