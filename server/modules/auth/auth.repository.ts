// Rows of users, shops, memberships and sessions. The only file of the auth module that
// speaks Knex.
import type { Knex } from 'knex';
import type { Role } from '@shared/schemas/auth.ts';

export interface UserRow {
  id: number;
  email: string;
  name: string;
  password_hash: string;
  created_at: number;
}
export interface SessionRow {
  id: string;
  user_id: number;
  shop_id: number;
  expires_at: number;
  created_at: number;
}
export interface MembershipView {
  shopId: number;
  shopName: string;
  role: Role;
}

export function createAuthRepository(db: Knex) {
  return {
    findUserByEmail: (email: string, q: Knex = db) => q<UserRow>('users').where({ email }).first(),
    findUserById: (id: number, q: Knex = db) => q<UserRow>('users').where({ id }).first(),

    async insertUser(q: Knex, row: Omit<UserRow, 'id'>): Promise<number> {
      const [inserted] = await q('users').insert(row).returning<{ id: number }[]>('id');
      return inserted!.id;
    },
    async insertShop(q: Knex, name: string, now: number): Promise<number> {
      const [inserted] = await q('shops').insert({ name, created_at: now }).returning<{ id: number }[]>('id');
      return inserted!.id;
    },
    async insertMembership(q: Knex, shopId: number, userId: number, role: Role, now: number): Promise<void> {
      await q('memberships').insert({ shop_id: shopId, user_id: userId, role, created_at: now });
    },

    /** The member's role and shop name, or undefined when the user is not in that shop. */
    async membership(userId: number, shopId: number, q: Knex = db): Promise<MembershipView | undefined> {
      const row = await q('memberships as m')
        .join('shops as s', 's.id', 'm.shop_id')
        .where({ 'm.user_id': userId, 'm.shop_id': shopId })
        .first<{ shopId: number; shopName: string; role: Role } | undefined>('s.id as shopId', 's.name as shopName', 'm.role as role');
      return row;
    },
    /** The shop a user lands in at sign-in: the one joined first. */
    async firstMembership(userId: number, q: Knex = db): Promise<MembershipView | undefined> {
      return q('memberships as m')
        .join('shops as s', 's.id', 'm.shop_id')
        .where({ 'm.user_id': userId })
        .orderBy([{ column: 'm.created_at' }, { column: 'm.shop_id' }])
        .first<{ shopId: number; shopName: string; role: Role } | undefined>('s.id as shopId', 's.name as shopName', 'm.role as role');
    },

    /** Every shop the user belongs to, in joining order. */
    memberships: (userId: number) =>
      db('memberships as m')
        .join('shops as s', 's.id', 'm.shop_id')
        .where({ 'm.user_id': userId })
        .orderBy([{ column: 'm.created_at' }, { column: 'm.shop_id' }])
        .select<MembershipView[]>('s.id as shopId', 's.name as shopName', 'm.role as role'),

    sessionWithUser: (id: string) =>
      db('sessions as s')
        .join('users as u', 'u.id', 's.user_id')
        .where('s.id', id)
        .first<(SessionRow & { email: string; name: string }) | undefined>('s.*', 'u.email', 'u.name'),
    sessionsOfUser: (userId: number) => db<SessionRow>('sessions').where({ user_id: userId }),
    insertSession: (row: SessionRow) => db('sessions').insert(row),
    setSessionExpiry: (id: string, expiresAt: number) => db('sessions').where({ id }).update({ expires_at: expiresAt }),
    deleteSession: (id: string) => db('sessions').where({ id }).delete(),
    deleteUserSessions: (userId: number, shopId?: number) =>
      db('sessions').where({ user_id: userId }).modify((qb) => (shopId === undefined ? qb : qb.where({ shop_id: shopId }))).delete(),
    deleteExpiredSessions: (now: number) => db('sessions').where('expires_at', '<=', now).delete(),
  };
}

export type AuthRepository = ReturnType<typeof createAuthRepository>;
