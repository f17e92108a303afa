// Memberships of a shop as the members screens see them.
import type { Knex } from 'knex';
import type { Role } from '@shared/schemas/auth.ts';

export interface MemberRow {
  userId: number;
  name: string;
  email: string;
  role: Role;
  joinedAt: number;
}

export function createMembersRepository(db: Knex) {
  return {
    list: (shopId: number) =>
      db('memberships as m')
        .join('users as u', 'u.id', 'm.user_id')
        .where('m.shop_id', shopId)
        .orderBy([{ column: 'm.created_at' }, { column: 'm.user_id' }])
        .select<MemberRow[]>('u.id as userId', 'u.name', 'u.email', 'm.role', 'm.created_at as joinedAt'),
    one: (q: Knex, shopId: number, userId: number) =>
      q('memberships as m')
        .join('users as u', 'u.id', 'm.user_id')
        .where({ 'm.shop_id': shopId, 'm.user_id': userId })
        .first<MemberRow | undefined>('u.id as userId', 'u.name', 'u.email', 'm.role', 'm.created_at as joinedAt'),
    async owners(q: Knex, shopId: number): Promise<number> {
      const row = await q('memberships').where({ shop_id: shopId, role: 'owner' }).count<{ n: number }[]>({ n: '*' }).first();
      return Number(row?.n ?? 0);
    },
    setRole: (q: Knex, shopId: number, userId: number, role: Role) => q('memberships').where({ shop_id: shopId, user_id: userId }).update({ role }),
    remove: (q: Knex, shopId: number, userId: number) => q('memberships').where({ shop_id: shopId, user_id: userId }).delete(),
    /** Ends the user's sessions that act for this shop. */
    endSessions: (q: Knex, shopId: number, userId: number) => q('sessions').where({ shop_id: shopId, user_id: userId }).delete(),
    isMemberByEmail: async (q: Knex, shopId: number, email: string) =>
      (await q('memberships as m').join('users as u', 'u.id', 'm.user_id').where({ 'm.shop_id': shopId, 'u.email': email }).first()) !== undefined,
  };
}
export type MembersRepository = ReturnType<typeof createMembersRepository>;
