// Members of the shop: list, change a role, remove. A shop always keeps an owner.
import type { Knex } from 'knex';
import type { Role } from '@shared/schemas/auth.ts';
import type { MemberView } from '@shared/schemas/library.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { HttpError, notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import type { AuditRepository } from '../audit/audit.repository.ts';
import { idParam } from '../patterns/pattern-access.ts';
import { iso } from '../patterns/views.ts';
import type { MemberRow, MembersRepository } from './members.repository.ts';

const view = (m: MemberRow): MemberView => ({ userId: m.userId, name: m.name, email: m.email, role: m.role, joinedAt: iso(m.joinedAt) });
const lastOwner = () => new HttpError(409, 'last_owner', 'A shop needs at least one owner: make someone else owner first.');

export function createMembersService(db: Knex, members: MembersRepository, audit: AuditRepository) {
  async function memberOr404(trx: Knex, shopId: number, raw: string | undefined): Promise<MemberRow> {
    const id = idParam(raw);
    const m = id === null ? undefined : await members.one(trx, shopId, id);
    if (!m) throw notFound('member');
    return m;
  }

  return {
    list: async (auth: AuthContext) => ({ items: (await members.list(auth.shop.id)).map(view) }),

    changeRole: (auth: AuthContext, raw: string | undefined, role: Role) =>
      writeTransaction(db, async (trx) => {
        const m = await memberOr404(trx, auth.shop.id, raw);
        if (m.role === 'owner' && role !== 'owner' && (await members.owners(trx, auth.shop.id)) <= 1) throw lastOwner();
        await members.setRole(trx, auth.shop.id, m.userId, role);
        await audit.record(trx, { shopId: auth.shop.id, userId: auth.user.id, action: 'member.role-changed', detail: { userId: m.userId, from: m.role, to: role } });
        return { member: view({ ...m, role }) };
      }),

    /** Removes the membership and ends that member's sessions in this shop at once. */
    remove: (auth: AuthContext, raw: string | undefined) =>
      writeTransaction(db, async (trx) => {
        const m = await memberOr404(trx, auth.shop.id, raw);
        if (m.role === 'owner' && (await members.owners(trx, auth.shop.id)) <= 1) throw lastOwner();
        await members.remove(trx, auth.shop.id, m.userId);
        await members.endSessions(trx, auth.shop.id, m.userId);
        await audit.record(trx, { shopId: auth.shop.id, userId: auth.user.id, action: 'member.removed', detail: { userId: m.userId, name: m.name } });
      }),
  };
}
export type MembersService = ReturnType<typeof createMembersService>;
