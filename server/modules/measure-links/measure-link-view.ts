import type { MeasurementRequestView } from '@shared/schemas/order-views.ts';
import { iso } from '../patterns/views.ts';
import type { MeasureLinkRow } from './measure-links.repository.ts';

export const measureLinkView = (r: MeasureLinkRow, nowMs: number): MeasurementRequestView => ({
  id: r.id,
  sentTo: r.email,
  createdAt: iso(r.created_at),
  expiresAt: iso(r.expires_at),
  answeredAt: r.answered_at !== null ? iso(Number(r.answered_at)) : null,
  expired: Number(r.expires_at) <= nowMs,
  revoked: r.revoked_at !== null,
});
