import { Link } from 'react-router-dom';
import { can } from '@shared/schemas/permissions.ts';
import type { Role } from '@shared/schemas/auth.ts';
import { buttonClass } from '@/components/ui/button.tsx';
import { paths } from '../../../paths.ts';

/** The two views of the orders, as tabs. */
export const orderTabs = () => [
  { to: paths.orders.board.getHref(), label: 'Board' },
  { to: paths.orders.table.getHref(), label: 'Table' },
];

/** "New order" for roles that may take one. */
export function NewOrderLink({ role }: { role: Role }) {
  if (!can(role, 'orders.create')) return null;
  return (
    <Link to={paths.orders.new.getHref()} className={buttonClass('primary')}>
      New order
    </Link>
  );
}
