import { useState } from 'react';
import { Link, useParams, type LoaderFunction } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { customerQueryOptions } from '@/features/orders/api/queries.ts';
import { useUpdateCustomer } from '@/features/orders/api/mutations.ts';
import { CustomerForm } from '@/features/orders/components/customers/customer-form.tsx';
import { WearerCard } from '@/features/orders/components/customers/wearer-card.tsx';
import { WearerForm } from '@/features/orders/components/customers/wearer-form.tsx';
import { OrderTable } from '@/features/orders/components/table/order-table.tsx';
import { Button } from '@/components/ui/button.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { paths } from '../../../paths.ts';
import { idFromParams } from '../pattern/pattern-tabs.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ params }) => {
  if (!(await isSignedIn(queryClient))) return null;
  await queryClient.ensureQueryData(customerQueryOptions(idFromParams(params.id)));
  return null;
};

/** One customer: contact details, their wearers with measurements, and their orders. */
export function Component() {
  const id = idFromParams(useParams().id);
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data } = useSuspenseQuery(customerQueryOptions(id));
  const update = useUpdateCustomer(id);
  const [editing, setEditing] = useState(false);
  if (!me) return null;
  const { customer, wearers, orders } = data;
  return (
    <div className="grid max-w-5xl gap-6">
      <header className="grid gap-1 border-b border-hide-200 pb-4">
        <p className="text-sm">
          <Link to={paths.customers.list.getHref()} className="text-hide-700 underline-offset-2 hover:underline">
            ← Customers
          </Link>
        </p>
        <h1 className="text-2xl font-semibold tracking-tight text-hide-900 sm:text-3xl">{customer.name}</h1>
        <p className="break-all text-sm text-hide-700">{[customer.email, customer.phone].filter(Boolean).join(' · ') || 'No contact details'}</p>
        {customer.notes && <p className="whitespace-pre-line text-sm text-hide-700">{customer.notes}</p>}
      </header>
      <Panel
        title="Contact"
        aside={
          can(me.role, 'customers.update') && !editing ? (
            <Button size="sm" variant="ghost" onClick={() => setEditing(true)}>
              Edit
            </Button>
          ) : undefined
        }
      >
        {editing ? (
          <CustomerForm customer={customer} submitLabel="Save customer" onSubmit={async (body) => { await update.mutateAsync(body); setEditing(false); }} onCancel={() => setEditing(false)} />
        ) : (
          <p className="text-sm text-hide-700">Measuring links and proofs go to {customer.email || 'no address yet: add an e-mail to send them'}.</p>
        )}
      </Panel>
      <section aria-labelledby="wearers" className="grid gap-4">
        <h2 id="wearers" className="text-lg font-semibold text-hide-900">
          Wearers
        </h2>
        {wearers.length === 0 && <p className="text-sm text-hide-600">No wearers yet.</p>}
        {wearers.map((w) => (
          <WearerCard
            key={w.id}
            wearer={w}
            newOrderHref={paths.orders.new.getHref({ customerId: customer.id, wearerId: w.id })}
            canMeasure={can(me.role, 'measurements.create')}
            canOrder={can(me.role, 'orders.create')}
          />
        ))}
        {can(me.role, 'wearers.create') && (
          <Panel title="Add a wearer">
            <WearerForm customerId={customer.id} />
          </Panel>
        )}
      </section>
      <section aria-labelledby="orders" className="grid gap-3">
        <h2 id="orders" className="text-lg font-semibold text-hide-900">
          Orders
        </h2>
        {orders.length === 0 ? <p className="text-sm text-hide-600">No orders yet.</p> : <OrderTable orders={orders} orderHref={paths.orders.detail.getHref} />}
      </section>
    </div>
  );
}
