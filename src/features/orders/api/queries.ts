import { queryOptions } from '@tanstack/react-query';
import type { OrderStage } from '@shared/schemas/orders.ts';
import type { CustomerDetail, CustomerView, OrderDetail, OrderList, ShopPricingView } from '@shared/schemas/order-views.ts';
import type { PatternPage, PatternWithHead } from '@shared/schemas/library.ts';
import { api } from '@/lib/api-client.ts';

/** Filters of the order table, as they appear in the URL. */
export interface OrderFilters {
  stage?: OrderStage[];
  customerId?: number;
  dueFrom?: string;
  dueTo?: string;
  query?: string;
  active?: boolean;
  sort?: 'due' | 'updated' | 'number';
}

/** The one key factory of orders, customers and pricing: generic to specific. */
export const orderKeys = {
  all: ['orders'] as const,
  lists: () => [...orderKeys.all, 'list'] as const,
  list: (filters: OrderFilters) => [...orderKeys.lists(), filters] as const,
  details: () => [...orderKeys.all, 'detail'] as const,
  detail: (id: number) => [...orderKeys.details(), id] as const,
  /** Saved patterns an order may be made from (a read of the library for the picker). */
  patternChoices: () => [...orderKeys.all, 'pattern-choices'] as const,
  patternChoice: (id: number) => [...orderKeys.patternChoices(), id] as const,
};

export const customerKeys = {
  all: ['customers'] as const,
  lists: () => [...customerKeys.all, 'list'] as const,
  list: (query: string) => [...customerKeys.lists(), { query }] as const,
  detail: (id: number) => [...customerKeys.all, 'detail', id] as const,
};

export const pricingKeys = {
  all: ['shop-pricing'] as const,
};

export function orderListUrl(filters: OrderFilters): string {
  const q = new URLSearchParams();
  if (filters.stage && filters.stage.length > 0) q.set('stage', filters.stage.join(','));
  if (filters.customerId) q.set('customerId', String(filters.customerId));
  if (filters.dueFrom) q.set('dueFrom', filters.dueFrom);
  if (filters.dueTo) q.set('dueTo', filters.dueTo);
  if (filters.query) q.set('query', filters.query);
  if (filters.active) q.set('active', 'true');
  q.set('sort', filters.sort ?? 'due');
  return `/api/orders?${q.toString()}`;
}

export const ordersQueryOptions = (filters: OrderFilters) =>
  queryOptions({
    queryKey: orderKeys.list(filters),
    queryFn: ({ signal }) => api.get<OrderList>(orderListUrl(filters), signal),
  });

export const orderQueryOptions = (id: number) =>
  queryOptions({
    queryKey: orderKeys.detail(id),
    queryFn: async ({ signal }) => (await api.get<{ order: OrderDetail }>(`/api/orders/${id}`, signal)).order,
  });

export const customersQueryOptions = (query = '') =>
  queryOptions({
    queryKey: customerKeys.list(query),
    queryFn: ({ signal }) =>
      api.get<{ items: CustomerView[] }>(query ? `/api/customers?query=${encodeURIComponent(query)}` : '/api/customers', signal),
  });

export const customerQueryOptions = (id: number) =>
  queryOptions({
    queryKey: customerKeys.detail(id),
    queryFn: ({ signal }) => api.get<CustomerDetail>(`/api/customers/${id}`, signal),
  });

export const pricingQueryOptions = () =>
  queryOptions({
    queryKey: pricingKeys.all,
    queryFn: async ({ signal }) => (await api.get<{ pricing: ShopPricingView }>('/api/shop/pricing', signal)).pricing,
  });

/** Every saved, unarchived pattern by name (the order form's picker). */
export const patternChoicesQueryOptions = () =>
  queryOptions({
    queryKey: orderKeys.patternChoices(),
    queryFn: ({ signal }) => api.get<PatternPage>('/api/patterns?sort=name&limit=100', signal),
  });

/** One pattern's head with its spec: the sizes of its run and its display unit. */
export const patternChoiceQueryOptions = (id: number) =>
  queryOptions({
    queryKey: orderKeys.patternChoice(id),
    queryFn: ({ signal }) => api.get<PatternWithHead>(`/api/patterns/${id}`, signal),
    staleTime: 30_000,
  });
