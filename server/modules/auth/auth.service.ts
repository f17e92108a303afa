// Sign-up, sign-in and the "who am I" answer. Knows nothing of HTTP beyond HttpError.
import type { Knex } from 'knex';
import type { MeResponse, SignInInput, SignUpInput } from '@shared/schemas/auth.ts';
import { HttpError } from '../../http/http-error.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import type { AppLucia } from '../../http/session.ts';
import type { AuthRepository } from './auth.repository.ts';
import { burnVerifyTime, hashPassword, verifyPassword } from './password.ts';

/** One wording for unknown e-mail and wrong password, so neither reveals which it was. */
export const BAD_CREDENTIALS = 'That e-mail and password do not match an account.';

export function createAuthService(db: Knex, repo: AuthRepository, lucia: AppLucia) {
  async function startSession(userId: number, shopId: number): Promise<string> {
    const session = await lucia.createSession(userId, { shopId, createdAt: Date.now() });
    return session.id;
  }

  return {
    /** Creates the user, their shop and the owner membership; returns the new session id. */
    async signUp(input: SignUpInput): Promise<{ sessionId: string; me: MeResponse }> {
      // Hash before the transaction: never hold the write lock for ~40 ms of hashing.
      const passwordHash = await hashPassword(input.password);
      const now = Date.now();
      const ids = await writeTransaction(db, async (trx) => {
        if (await repo.findUserByEmail(input.email, trx)) {
          throw new HttpError(409, 'email_taken', 'An account with that e-mail already exists; sign in instead.', { email: 'email is already registered' });
        }
        const userId = await repo.insertUser(trx, { email: input.email, name: input.name, password_hash: passwordHash, created_at: now });
        const shopId = await repo.insertShop(trx, input.shopName, now);
        await repo.insertMembership(trx, shopId, userId, 'owner', now);
        return { userId, shopId };
      });
      const sessionId = await startSession(ids.userId, ids.shopId);
      return {
        sessionId,
        me: { user: { id: ids.userId, email: input.email, name: input.name }, shop: { id: ids.shopId, name: input.shopName }, role: 'owner' },
      };
    },

    /** Checks the password and opens a fresh session in the user's first shop. */
    async signIn(input: SignInInput): Promise<{ sessionId: string; me: MeResponse }> {
      const user = await repo.findUserByEmail(input.email);
      if (!user) {
        await burnVerifyTime(input.password);
        throw new HttpError(401, 'invalid_credentials', BAD_CREDENTIALS);
      }
      if (!(await verifyPassword(user.password_hash, input.password))) throw new HttpError(401, 'invalid_credentials', BAD_CREDENTIALS);
      const member = await repo.firstMembership(user.id);
      if (!member) throw new HttpError(403, 'no_shop', 'This account no longer belongs to any shop; ask a shop owner for an invite.');
      const sessionId = await startSession(user.id, member.shopId);
      return {
        sessionId,
        me: { user: { id: user.id, email: user.email, name: user.name }, shop: { id: member.shopId, name: member.shopName }, role: member.role },
      };
    },

    startSession,
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
