import { type LoaderFunction } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { pricingQueryOptions } from '@/features/orders/api/queries.ts';
import { PricingForm } from '@/features/orders/components/pricing/pricing-form.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { formatWhen } from '@/lib/format-when.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async () => {
  if (!(await isSignedIn(queryClient))) return null;
  await queryClient.ensureQueryData(pricingQueryOptions());
  return null;
};

/** The shop's prices that orders are costed with (hardware costs live in the shop standards). */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: pricing } = useSuspenseQuery(pricingQueryOptions());
  if (!me) return null;
  return (
    <div className="grid max-w-3xl gap-6">
      <div>
        <p className="text-sm font-medium uppercase tracking-widest text-hide-500">{me.shop.name}</p>
        <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">Pricing</h1>
        <p className="mt-1 text-hide-700">
          An order’s price: the blank’s leather area times the waste factor at the leather’s price per square foot, the hardware at its unit cost, and bench
          time at the hourly rate.
        </p>
        {pricing.updatedAt && (
          <p className="mt-1 text-xs text-hide-600">
            Last changed {formatWhen(pricing.updatedAt)}
            {pricing.updatedBy && <> by {pricing.updatedBy.name}</>}
          </p>
        )}
      </div>
      <Panel title="Prices">
        <PricingForm pricing={pricing} canEdit={can(me.role, 'pricing.update')} />
      </Panel>
    </div>
  );
}
