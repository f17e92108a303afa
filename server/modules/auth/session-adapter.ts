// lucia's storage port implemented over our sessions table (lucia's own adapters for
// SQLite would bypass Knex and our immediate transactions).
import type { Adapter, DatabaseSession, DatabaseUser } from 'lucia';
import type { AuthRepository, SessionRow } from './auth.repository.ts';

const toSession = (row: SessionRow): DatabaseSession => ({
  id: row.id,
  userId: row.user_id,
  expiresAt: new Date(Number(row.expires_at)),
  attributes: { shopId: row.shop_id, createdAt: Number(row.created_at) },
});

/** A lucia Adapter storing sessions through the auth repository. */
export function createSessionAdapter(repo: AuthRepository): Adapter {
  return {
    async getSessionAndUser(sessionId) {
      const row = await repo.sessionWithUser(sessionId);
      if (!row) return [null, null];
      const user: DatabaseUser = { id: row.user_id, attributes: { email: row.email, name: row.name } };
      return [toSession(row), user];
    },
    async getUserSessions(userId) {
      return (await repo.sessionsOfUser(userId)).map(toSession);
    },
    async setSession(session) {
      await repo.insertSession({
        id: session.id,
        user_id: session.userId,
        shop_id: session.attributes.shopId,
        expires_at: session.expiresAt.getTime(),
        created_at: session.attributes.createdAt,
      });
    },
    async updateSessionExpiration(sessionId, expiresAt) {
      await repo.setSessionExpiry(sessionId, expiresAt.getTime());
    },
    async deleteSession(sessionId) {
      await repo.deleteSession(sessionId);
    },
    async deleteUserSessions(userId) {
      await repo.deleteUserSessions(userId);
    },
    async deleteExpiredSessions() {
      await repo.deleteExpiredSessions(Date.now());
    },
  };
}
