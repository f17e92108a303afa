import { queryOptions } from '@tanstack/react-query';
import type { MeasurePage, ProofPage } from '@shared/schemas/order-views.ts';
import { api } from '@/lib/api-client.ts';

/** Keys of the customer's public pages (the token is the whole identity). */
export const customerLinkKeys = {
  all: ['customer-links'] as const,
  measure: (token: string) => [...customerLinkKeys.all, 'measure', token] as const,
  proof: (token: string) => [...customerLinkKeys.all, 'proof', token] as const,
};

export const measurePageQueryOptions = (token: string) =>
  queryOptions({
    queryKey: customerLinkKeys.measure(token),
    queryFn: ({ signal }) => api.get<MeasurePage>(`/api/measure/${encodeURIComponent(token)}`, signal),
    retry: false,
    staleTime: Infinity,
  });

export const proofPageQueryOptions = (token: string) =>
  queryOptions({
    queryKey: customerLinkKeys.proof(token),
    queryFn: ({ signal }) => api.get<ProofPage>(`/api/proof/${encodeURIComponent(token)}`, signal),
    retry: false,
  });
