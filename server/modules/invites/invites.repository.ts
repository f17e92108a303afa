// Invite rows.
import type { Knex } from 'knex';
import type { Role } from '@shared/schemas/auth.ts';

export interface InviteRow {
  id: number;
  shop_id: number;
  shop_name: string;
  email: string;
  role: Role;
  invited_by: number | null;
  inviter_name: string | null;
  expires_at: number;
  accepted_at: number | null;
  revoked_at: number | null;
  created_at: number;
}

const COLUMNS = ['i.id', 'i.shop_id', 's.name as shop_name', 'i.email', 'i.role', 'i.invited_by', 'u.name as inviter_name', 'i.expires_at', 'i.accepted_at', 'i.revoked_at', 'i.created_at'];

export function createInvitesRepository(db: Knex) {
  const base = (q: Knex) => q('invites as i').join('shops as s', 's.id', 'i.shop_id').leftJoin('users as u', 'u.id', 'i.invited_by');
  return {
    async insert(q: Knex, row: { shop_id: number; email: string; role: Role; token_hash: string; invited_by: number; expires_at: number; created_at: number }): Promise<number> {
      const [r] = await q('invites').insert(row).returning<{ id: number }[]>('id');
      return r!.id;
    },
    byTokenHash: (hash: string, q: Knex = db) => base(q).where('i.token_hash', hash).first<InviteRow | undefined>(COLUMNS),
    /** Invites not yet accepted or revoked, newest first (expired ones included, marked by the caller). */
    open: (shopId: number) => base(db).where('i.shop_id', shopId).whereNull('i.accepted_at').whereNull('i.revoked_at').orderBy('i.id', 'desc').select<InviteRow[]>(COLUMNS),
    revoke: (q: Knex, shopId: number, id: number, now: number) => q('invites').where({ id, shop_id: shopId }).whereNull('accepted_at').whereNull('revoked_at').update({ revoked_at: now }),
    /** Marks the invite used once: 0 rows when someone else used it first. */
    accept: (q: Knex, id: number, userId: number, now: number) => q('invites').where({ id }).whereNull('accepted_at').whereNull('revoked_at').update({ accepted_at: now, accepted_by: userId }),
  };
}
export type InvitesRepository = ReturnType<typeof createInvitesRepository>;
