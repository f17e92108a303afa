import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeasureAnswerInput } from '@shared/schemas/orders.ts';
import type { MeasureAnswered, ProofAnswered } from '@shared/schemas/order-views.ts';
import { api } from '@/lib/api-client.ts';
import { customerLinkKeys } from './queries.ts';

export function useAnswerMeasurement(token: string) {
  return useMutation({
    mutationFn: (body: MeasureAnswerInput) => api.post<MeasureAnswered>(`/api/measure/${encodeURIComponent(token)}`, body),
  });
}

/** Approve, or ask for a change; the page re-reads the proof to show its new state. */
export function useAnswerProof(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (answer: { approve: true; name: string } | { approve: false; name: string; message: string }) =>
      answer.approve
        ? api.post<ProofAnswered>(`/api/proof/${encodeURIComponent(token)}/approve`, { name: answer.name })
        : api.post<ProofAnswered>(`/api/proof/${encodeURIComponent(token)}/change`, { name: answer.name, message: answer.message }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customerLinkKeys.proof(token) }),
  });
}
