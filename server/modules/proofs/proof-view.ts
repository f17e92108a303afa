import type { ProofLinkView } from '@shared/schemas/order-views.ts';
import { iso } from '../patterns/views.ts';
import type { ProofRow } from './proofs.repository.ts';

export const proofView = (r: ProofRow): ProofLinkView => ({
  id: r.id,
  status: r.status,
  createdAt: iso(r.created_at),
  createdBy: r.created_by !== null ? { id: r.created_by, name: r.created_by_name ?? '' } : null,
  answeredAt: r.answered_at !== null ? iso(r.answered_at) : null,
  answerName: r.answer_name,
  answerMessage: r.answer_message,
  revoked: r.revoked_at !== null,
});
