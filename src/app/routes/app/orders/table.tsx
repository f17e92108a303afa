import { useCallback } from 'react';
import { useSearchParams, type LoaderFunction } from 'react-router-dom';
import { useQuery, useSuspenseQuery, keepPreviousData, type QueryClient } from '@tanstack/react-query';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { orderFiltersFromSearch, orderFiltersToSearch } from '@/features/orders/api/filters.ts';
import { ordersQueryOptions, type OrderFilters } from '@/features/orders/api/queries.ts';
import { OrderFiltersBar } from '@/features/orders/components/table/order-filters.tsx';
import { OrderTable } from '@/features/orders/components/table/order-table.tsx';
import { OrdersHeader } from '@/features/orders/components/orders-header.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '../../../paths.ts';
import { NewOrderLink, orderTabs } from './order-tabs.tsx';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ request }) => {
  if (!(await isSignedIn(queryClient))) return null;
  await queryClient.ensureQueryData(ordersQueryOptions(orderFiltersFromSearch(new URL(request.url).searchParams)));
  return null;
};

/** The orders as a table with filters kept in the address (so a filtered view can be bookmarked). */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [params, setParams] = useSearchParams();
  const filters = orderFiltersFromSearch(params);
  // Keep the last rows on screen while a new filter loads, instead of a blank table.
  const list = useQuery({ ...ordersQueryOptions(filters), placeholderData: keepPreviousData });
  const onChange = useCallback((next: OrderFilters) => setParams(orderFiltersToSearch(next), { replace: true }), [setParams]);
  if (!me) return null;
  const items = list.data?.items ?? [];
  return (
    <div className="grid gap-6">
      <OrdersHeader shopName={me.shop.name} tabs={orderTabs()} actions={<NewOrderLink role={me.role} />} />
      <OrderFiltersBar filters={filters} onChange={onChange} />
      {list.isError && (
        <Notice tone="danger" role="alert" title="The orders did not load">
          {list.error.message}
        </Notice>
      )}
      {list.isSuccess && items.length === 0 ? (
        <p className="stitched rounded-lg bg-hide-50 px-6 py-10 text-center text-hide-800">No order matches these filters.</p>
      ) : (
        <OrderTable orders={items} orderHref={paths.orders.detail.getHref} />
      )}
      <p role="status" className="text-sm text-hide-600">
        {list.isFetching ? 'Loading…' : `${items.length} ${items.length === 1 ? 'order' : 'orders'}`}
      </p>
    </div>
  );
}
