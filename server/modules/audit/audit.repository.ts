// The audit trail: who did what to which pattern (or to the shop), when.
import type { Knex } from 'knex';

/** Actions recorded in the trail. */
export type AuditAction =
  | 'pattern.created'
  | 'pattern.updated'
  | 'pattern.duplicated'
  | 'pattern.exported'
  | 'pattern.imported'
  | 'revision.saved'
  | 'revision.restored'
  | 'share.created'
  | 'share.revoked'
  | 'member.role-changed'
  | 'member.removed'
  | 'invite.sent'
  | 'invite.revoked'
  | 'invite.accepted'
  | 'photo.added'
  | 'photo.deleted';

export interface AuditEvent {
  shopId: number;
  patternId?: number | null;
  userId: number | null;
  action: AuditAction;
  detail?: Record<string, unknown>;
}

export interface AuditRow {
  id: number;
  action: AuditAction;
  detail: string;
  created_at: number;
  user_id: number | null;
  user_name: string | null;
}

export function createAuditRepository(db: Knex) {
  return {
    record: (q: Knex, e: AuditEvent) =>
      q('audit_events').insert({
        shop_id: e.shopId,
        pattern_id: e.patternId ?? null,
        user_id: e.userId,
        action: e.action,
        detail: JSON.stringify(e.detail ?? {}),
        created_at: Date.now(),
      }),
    forPattern: (patternId: number, limit: number) =>
      db('audit_events as a')
        .leftJoin('users as u', 'u.id', 'a.user_id')
        .where('a.pattern_id', patternId)
        .orderBy('a.id', 'desc')
        .limit(limit)
        .select<AuditRow[]>('a.id', 'a.action', 'a.detail', 'a.created_at', 'a.user_id', 'u.name as user_name'),
  };
}
export type AuditRepository = ReturnType<typeof createAuditRepository>;
