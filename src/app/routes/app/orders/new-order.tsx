import { useNavigate, useSearchParams, type LoaderFunction } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { customersQueryOptions, patternChoicesQueryOptions, pricingQueryOptions } from '@/features/orders/api/queries.ts';
import { NewOrderForm } from '@/features/orders/components/new-order/new-order-form.tsx';
import { paths } from '../../../paths.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async () => {
  if (!(await isSignedIn(queryClient))) return null;
  await Promise.all([
    queryClient.ensureQueryData(customersQueryOptions()),
    queryClient.ensureQueryData(patternChoicesQueryOptions()),
    queryClient.ensureQueryData(pricingQueryOptions()),
  ]);
  return null;
};

function positive(raw: string | null): number | undefined {
  const n = Number(raw);
  return Number.isInteger(n) && n > 0 ? n : undefined;
}

/** A new order from a saved pattern (also reached from a customer's page with them chosen). */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: customers } = useSuspenseQuery(customersQueryOptions());
  const { data: patterns } = useSuspenseQuery(patternChoicesQueryOptions());
  const { data: pricing } = useSuspenseQuery(pricingQueryOptions());
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const customerId = positive(params.get('customerId'));
  const wearerId = positive(params.get('wearerId'));
  return (
    <div className="grid max-w-4xl gap-6">
      <div>
        <p className="text-sm font-medium uppercase tracking-widest text-hide-500">{me?.shop.name}</p>
        <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">New order</h1>
        <p className="mt-1 text-hide-700">A saved pattern fitted to one girth: a size of its run, a measurement on record, or one the customer sends.</p>
      </div>
      <NewOrderForm
        customers={customers.items}
        patterns={patterns.items.filter((p) => !p.archived)}
        leathers={pricing.leathers}
        initial={{ ...(customerId ? { customerId } : {}), ...(wearerId ? { wearerId } : {}) }}
        onCreated={(id) => navigate(paths.orders.detail.getHref(id))}
      />
    </div>
  );
}
