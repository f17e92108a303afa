import { useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  CreateOrderInput,
  CustomerInput,
  MeasurementInput,
  MeasurementRequestSchema,
  MoveOrderInput,
  ShopPricingInput,
  UpdateOrderInput,
  WearerInput,
} from '@shared/schemas/orders.ts';
import type { CustomerView, MeasurementRequestSent, MeasurementView, OrderDetail, PhotoView, ProofCreated, ShopPricingView, WearerView } from '@shared/schemas/order-views.ts';
import type { z } from 'zod';
import { api, apiRequest } from '@/lib/api-client.ts';
import { downloadFile } from '@/lib/download-file.ts';
import { uploadWithProgress } from '@/lib/upload-with-progress.ts';
import { customerKeys, orderKeys, pricingKeys } from './queries.ts';

/** After anything changes an order: its page, the board and table, and its customer's page. */
function useOrderChanged() {
  const queryClient = useQueryClient();
  return async (order: OrderDetail) => {
    queryClient.setQueryData(orderKeys.detail(order.id), order);
    await queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
    await queryClient.invalidateQueries({ queryKey: customerKeys.all });
  };
}

/** Re-reads an order after a change whose answer is not the order itself. */
function useOrderRefetch(id: number) {
  const queryClient = useQueryClient();
  return async () => {
    await queryClient.invalidateQueries({ queryKey: orderKeys.detail(id) });
    await queryClient.invalidateQueries({ queryKey: orderKeys.lists() });
  };
}

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: CustomerInput) => (await api.post<{ customer: CustomerView }>('/api/customers', body)).customer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerKeys.lists() }),
  });
}

export function useUpdateCustomer(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: Partial<CustomerInput>) => (await api.patch<{ customer: CustomerView }>(`/api/customers/${id}`, body)).customer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerKeys.all }),
  });
}

export function useCreateWearer(customerId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: WearerInput) => (await api.post<{ wearer: WearerView }>(`/api/customers/${customerId}/wearers`, body)).wearer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerKeys.all }),
  });
}

/** A new customer and their first wearer in one go (the order form's "new customer"). */
export function useCreateCustomerWithWearer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ customer, wearer }: { customer: CustomerInput; wearer: WearerInput }) => {
      const created = (await api.post<{ customer: CustomerView }>('/api/customers', customer)).customer;
      const w = (await api.post<{ wearer: WearerView }>(`/api/customers/${created.id}/wearers`, wearer)).wearer;
      return { customer: created, wearer: w };
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerKeys.all }),
  });
}

export function useAddMeasurement(wearerId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: MeasurementInput) => (await api.post<{ measurement: MeasurementView }>(`/api/wearers/${wearerId}/measurements`, body)).measurement,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerKeys.all }),
  });
}

export function useCreateOrder() {
  const changed = useOrderChanged();
  return useMutation({
    mutationFn: async (body: CreateOrderInput) => (await api.post<{ order: OrderDetail }>('/api/orders', body)).order,
    onSuccess: changed,
  });
}

export function useUpdateOrder(id: number) {
  const changed = useOrderChanged();
  return useMutation({
    mutationFn: async (body: UpdateOrderInput) => (await api.patch<{ order: OrderDetail }>(`/api/orders/${id}`, body)).order,
    onSuccess: changed,
  });
}

/** Moves an order to a stage; the board passes the order's id with each move. */
export function useMoveOrder() {
  const changed = useOrderChanged();
  return useMutation({
    mutationFn: async ({ id, ...body }: MoveOrderInput & { id: number }) => (await api.post<{ order: OrderDetail }>(`/api/orders/${id}/stage`, body)).order,
    onSuccess: changed,
  });
}

export function useRequestMeasurement(id: number) {
  const refetch = useOrderRefetch(id);
  return useMutation({
    mutationFn: (body: z.input<typeof MeasurementRequestSchema>) => api.post<MeasurementRequestSent>(`/api/orders/${id}/measurement-request`, body),
    onSuccess: refetch,
  });
}

export function useRevokeMeasurementRequest(orderId: number) {
  const refetch = useOrderRefetch(orderId);
  return useMutation({
    mutationFn: (requestId: number) => api.delete<unknown>(`/api/measurement-requests/${requestId}`),
    onSuccess: refetch,
  });
}

export function useCreateProof(id: number) {
  const refetch = useOrderRefetch(id);
  return useMutation({
    mutationFn: () => api.post<ProofCreated>(`/api/orders/${id}/proof`, {}),
    onSuccess: refetch,
  });
}

export function useRevokeProof(orderId: number) {
  const refetch = useOrderRefetch(orderId);
  return useMutation({
    mutationFn: (proofId: number) => api.delete<unknown>(`/api/proofs/${proofId}`),
    onSuccess: refetch,
  });
}

/** Uploads one photo, reporting progress (0..1) while it goes. */
export function useUploadPhoto(orderId: number) {
  const refetch = useOrderRefetch(orderId);
  return useMutation({
    mutationFn: ({ file, caption, onProgress }: { file: File; caption: string; onProgress: (f: number) => void }) => {
      const body = new FormData();
      body.append('caption', caption);
      body.append('file', file);
      return uploadWithProgress<{ photo: PhotoView }>(`/api/orders/${orderId}/photos`, body, onProgress);
    },
    onSuccess: refetch,
  });
}

export function useDeletePhoto(orderId: number) {
  const refetch = useOrderRefetch(orderId);
  return useMutation({
    mutationFn: (photoId: number) => api.delete<unknown>(`/api/orders/${orderId}/photos/${photoId}`),
    onSuccess: refetch,
  });
}

/** Fetches the job sheet PDF (the server logs the print on the order) and saves it. */
export function usePrintJobSheet(orderId: number) {
  const refetch = useOrderRefetch(orderId);
  return useMutation({
    mutationFn: (paper: string) => downloadFile(`/api/orders/${orderId}/job-sheet.pdf?paper=${encodeURIComponent(paper)}`, `order-${orderId}-job-sheet.pdf`),
    onSuccess: refetch,
  });
}

export function useSavePricing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: ShopPricingInput) => (await apiRequest<{ pricing: ShopPricingView }>('/api/shop/pricing', { method: 'PUT', body })).data.pricing,
    onSuccess: (pricing) => {
      queryClient.setQueryData(pricingKeys.all, pricing);
      // Prices shown on orders follow the new settings.
      return queryClient.invalidateQueries({ queryKey: orderKeys.all });
    },
  });
}
