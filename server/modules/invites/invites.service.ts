// Invites by e-mail: send, list, revoke, look at, accept (signs up or joins).
import type { Role } from '@shared/schemas/auth.ts';
import type { InviteLookup, InviteView } from '@shared/schemas/library-views.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { HttpError, badInput, notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { BAD_CREDENTIALS } from '../auth/auth.service.ts';
import { hashPassword, verifyPassword } from '../auth/password.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { inviteMail } from '../mail/messages.ts';
import type { MembersRepository } from '../members/members.repository.ts';
import { idParam } from '../patterns/pattern-access.ts';
import { iso } from '../patterns/views.ts';
import type { InviteRow, InvitesRepository } from './invites.repository.ts';
import { newToken, plausibleToken, tokenHash } from './tokens.ts';

const inviteView = (i: InviteRow): InviteView => ({
  id: i.id,
  email: i.email,
  role: i.role,
  shopName: i.shop_name,
  invitedBy: i.inviter_name,
  expiresAt: iso(i.expires_at),
  createdAt: iso(i.created_at),
  expired: Number(i.expires_at) <= Date.now(),
});

export function createInvitesService(deps: LibraryDeps, invites: InvitesRepository, members: MembersRepository) {
  const { db, repos, config } = deps;

  /** The usable invite of a link, or the error that explains why it is not. */
  async function usable(token: string | undefined, q = db): Promise<InviteRow> {
    const row = plausibleToken(token) ? await invites.byTokenHash(tokenHash(token), q) : undefined;
    if (!row || row.revoked_at !== null) throw notFound('invite');
    if (row.accepted_at !== null) throw new HttpError(410, 'invite_used', 'This invite has been used already; ask the shop owner for a new one.');
    if (Number(row.expires_at) <= Date.now()) throw new HttpError(410, 'invite_expired', 'This invite has run out; ask the shop owner for a new one.');
    return row;
  }

  return {
    async create(auth: AuthContext, input: { email: string; role: Role }) {
      const token = newToken();
      const now = Date.now();
      const expiresAt = now + config.inviteTtlMs;
      const { id, mailId } = await writeTransaction(db, async (trx) => {
        if (await members.isMemberByEmail(trx, auth.shop.id, input.email)) {
          throw new HttpError(409, 'already_member', `${input.email} is already a member of ${auth.shop.name}.`, { email: 'email already belongs to a member' });
        }
        const inviteId = await invites.insert(trx, { shop_id: auth.shop.id, email: input.email, role: input.role, token_hash: tokenHash(token), invited_by: auth.user.id, expires_at: expiresAt, created_at: now });
        const mail = inviteMail({ shopName: auth.shop.name, inviterName: auth.user.name, role: input.role, link: `${config.publicOrigin}/invite/${token}`, expiresAt: new Date(expiresAt) });
        const queued = await deps.outbox.enqueue(trx, { shopId: auth.shop.id, kind: 'invite', to: input.email, ...mail });
        await repos.audit.record(trx, { shopId: auth.shop.id, userId: auth.user.id, action: 'invite.sent', detail: { email: input.email, role: input.role } });
        return { id: inviteId, mailId: queued };
      });
      // Outside the transaction: the owner learns whether the mail left, the invite stands either way.
      await deps.outbox.flush();
      const row = (await invites.open(auth.shop.id)).find((i) => i.id === id)!;
      return { invite: inviteView(row), mail: (await deps.outbox.statusOf(mailId)) ?? 'queued' };
    },

    list: async (auth: AuthContext) => ({ items: (await invites.open(auth.shop.id)).map(inviteView) }),

    async revoke(auth: AuthContext, raw: string | undefined): Promise<void> {
      const id = idParam(raw);
      await writeTransaction(db, async (trx) => {
        if (id === null || (await invites.revoke(trx, auth.shop.id, id, Date.now())) !== 1) throw notFound('invite');
        await repos.audit.record(trx, { shopId: auth.shop.id, userId: auth.user.id, action: 'invite.revoked', detail: { inviteId: id } });
      });
    },

    /** What the invite page shows before accepting. */
    async view(token: string | undefined): Promise<InviteLookup> {
      const row = await usable(token);
      const account = await repos.auth.findUserByEmail(row.email);
      return { invite: inviteView(row), accountExists: account !== undefined };
    },

    /**
     * Accepts: a signed-in user with the invited address joins; otherwise the password of the
     * existing account, or a name and new password for a new one. Returns who joined which shop.
     */
    async accept(auth: AuthContext | undefined, token: string | undefined, body: { name?: string; password?: string }) {
      const invite = await usable(token);
      let userId: number;
      let newUser: { name: string; passwordHash: string } | null = null;
      if (auth) {
        if (auth.user.email !== invite.email) throw new HttpError(403, 'invite_for_other_email', `This invite is for ${invite.email}; sign out and open the link again.`);
        userId = auth.user.id;
      } else {
        const existing = await repos.auth.findUserByEmail(invite.email);
        if (existing) {
          if (!body.password) throw badInput({ password: 'password of your existing account is required' });
          if (!(await verifyPassword(existing.password_hash, body.password))) throw new HttpError(401, 'invalid_credentials', BAD_CREDENTIALS);
          userId = existing.id;
        } else {
          const fields: Record<string, string> = {};
          if (!body.name) fields.name = 'name is required to create your account';
          if (!body.password) fields.password = 'password is required to create your account';
          if (Object.keys(fields).length > 0) throw badInput(fields);
          newUser = { name: body.name!, passwordHash: await hashPassword(body.password!) };
          userId = 0;
        }
      }
      return writeTransaction(db, async (trx) => {
        const fresh = await usable(token, trx);
        const now = Date.now();
        if (newUser) {
          if (await repos.auth.findUserByEmail(fresh.email, trx)) throw new HttpError(409, 'email_taken', 'An account with this e-mail was created meanwhile; open the link again.');
          userId = await repos.auth.insertUser(trx, { email: fresh.email, name: newUser.name, password_hash: newUser.passwordHash, created_at: now });
        }
        if (await members.one(trx, fresh.shop_id, userId)) throw new HttpError(409, 'already_member', `You already belong to ${fresh.shop_name}.`);
        if ((await invites.accept(trx, fresh.id, userId, now)) !== 1) throw new HttpError(410, 'invite_used', 'This invite has been used already.');
        await repos.auth.insertMembership(trx, fresh.shop_id, userId, fresh.role, now);
        await repos.audit.record(trx, { shopId: fresh.shop_id, userId, action: 'invite.accepted', detail: { inviteId: fresh.id, role: fresh.role } });
        return { userId, shopId: fresh.shop_id, created: newUser !== null };
      });
    },
  };
}
export type InvitesService = ReturnType<typeof createInvitesService>;
