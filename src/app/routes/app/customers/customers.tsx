import { useEffect, useState } from 'react';
import { useNavigate, useSearchParams, type LoaderFunction } from 'react-router-dom';
import { keepPreviousData, useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '@shared/schemas/permissions.ts';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { isSignedIn } from '@/features/auth/api/signed-in.ts';
import { customersQueryOptions } from '@/features/orders/api/queries.ts';
import { useCreateCustomer } from '@/features/orders/api/mutations.ts';
import { CustomerForm } from '@/features/orders/components/customers/customer-form.tsx';
import { CustomerList } from '@/features/orders/components/customers/customer-list.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Panel } from '@/components/ui/panel.tsx';
import { paths } from '../../../paths.ts';

export const clientLoader = (queryClient: QueryClient): LoaderFunction => async ({ request }) => {
  if (!(await isSignedIn(queryClient))) return null;
  await queryClient.ensureQueryData(customersQueryOptions(new URL(request.url).searchParams.get('query') ?? ''));
  return null;
};

/** The shop's customers: search, and add one. */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const [text, setText] = useState(params.get('query') ?? '');
  const query = params.get('query') ?? '';
  const list = useQuery({ ...customersQueryOptions(query), placeholderData: keepPreviousData });
  const create = useCreateCustomer();
  useEffect(() => {
    const t = setTimeout(() => {
      if (text.trim() !== query) setParams(text.trim() ? { query: text.trim() } : {}, { replace: true });
    }, 300);
    return () => clearTimeout(t);
  }, [text, query, setParams]);
  if (!me) return null;
  const items = list.data?.items ?? [];
  return (
    <div className="grid max-w-5xl gap-6">
      <div>
        <p className="text-sm font-medium uppercase tracking-widest text-hide-500">{me.shop.name}</p>
        <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">Customers</h1>
        <p className="mt-1 text-hide-700">Who orders, who wears it, and their measurements over time.</p>
      </div>
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_360px]">
        <div className="grid min-w-0 gap-4">
          <TextField label="Search customers" type="search" placeholder="Name, e-mail or phone" value={text} onChange={(e) => setText(e.target.value)} />
          {items.length === 0 ? (
            <p className="stitched rounded-lg bg-hide-50 px-6 py-10 text-center text-hide-800">{query ? 'No customer matches.' : 'No customers yet.'}</p>
          ) : (
            <CustomerList customers={items} customerHref={paths.customers.detail.getHref} />
          )}
        </div>
        {can(me.role, 'customers.create') && (
          <Panel title="New customer">
            <CustomerForm submitLabel="Add customer" onSubmit={async (body) => navigate(paths.customers.detail.getHref((await create.mutateAsync(body)).id))} />
          </Panel>
        )}
      </div>
    </div>
  );
}
