import { type LoaderFunction } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { orderFiltersToSearch } from '@/features/orders/api/filters.ts';
import { ordersQueryOptions } from '@/features/orders/api/queries.ts';
import { OrderBoard } from '@/features/orders/components/board/order-board.tsx';
import { OrdersHeader } from '@/features/orders/components/orders-header.tsx';
import { paths } from '../../../paths.ts';
import { NewOrderLink, orderTabs } from './order-tabs.tsx';

const BOARD_FILTERS = {};

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async () => {
  if (!(await isSignedIn(queryClient))) return null;
  await queryClient.ensureQueryData(ordersQueryOptions(BOARD_FILTERS));
  return null;
};

/** Every working order in a column of its stage, soonest due first; the latest handed over. */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data } = useSuspenseQuery(ordersQueryOptions(BOARD_FILTERS));
  if (!me) return null;
  return (
    <div className="grid gap-6">
      <OrdersHeader shopName={me.shop.name} tabs={orderTabs()} actions={<NewOrderLink role={me.role} />} />
      {data.items.length === 0 ? (
        <div className="stitched rounded-lg bg-hide-50 px-6 py-12 text-center">
          <p className="font-semibold text-hide-900">No orders yet.</p>
          <p className="mt-1 text-sm text-hide-700">An order takes a customer, a saved pattern and a girth; start one with “New order”.</p>
        </div>
      ) : (
        <OrderBoard
          orders={data.items}
          orderHref={paths.orders.detail.getHref}
          allInStageHref={(stage) => paths.orders.table.getHref(orderFiltersToSearch({ stage: [stage], sort: 'updated' }).toString())}
          canMove={can(me.role, 'orders.move')}
        />
      )}
    </div>
  );
}
