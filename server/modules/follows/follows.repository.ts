// Who follows which pattern, and each user's mail setting.
import type { Knex } from 'knex';

export interface Follower {
  userId: number;
  name: string;
  email: string;
}

export function createFollowsRepository(db: Knex) {
  return {
    follow: (q: Knex, patternId: number, userId: number) =>
      q('pattern_follows').insert({ pattern_id: patternId, user_id: userId, created_at: Date.now() }).onConflict(['pattern_id', 'user_id']).ignore(),
    unfollow: (patternId: number, userId: number) => db('pattern_follows').where({ pattern_id: patternId, user_id: userId }).delete(),
    async isFollowing(patternId: number, userId: number): Promise<boolean> {
      return (await db('pattern_follows').where({ pattern_id: patternId, user_id: userId }).first()) !== undefined;
    },
    /** Followers still in the shop, with mail on (no settings row = on), other than `exceptUserId`. */
    toNotify: (q: Knex, patternId: number, shopId: number, exceptUserId: number) =>
      q('pattern_follows as f')
        .join('users as u', 'u.id', 'f.user_id')
        .join('memberships as m', function () {
          this.on('m.user_id', '=', 'f.user_id').andOn('m.shop_id', '=', q.raw('?', [shopId]));
        })
        .leftJoin('user_settings as s', 's.user_id', 'f.user_id')
        .where('f.pattern_id', patternId)
        .whereNot('f.user_id', exceptUserId)
        .where((w) => w.whereNull('s.user_id').orWhere('s.notify_followed_revisions', true))
        .select<Follower[]>('u.id as userId', 'u.name', 'u.email'),
    async settings(userId: number): Promise<{ notifyOnFollowedRevisions: boolean }> {
      const row = await db('user_settings').where({ user_id: userId }).first<{ notify_followed_revisions: number } | undefined>();
      return { notifyOnFollowedRevisions: row ? Boolean(row.notify_followed_revisions) : true };
    },
    saveSettings: (userId: number, notify: boolean) =>
      db('user_settings').insert({ user_id: userId, notify_followed_revisions: notify }).onConflict('user_id').merge(),
  };
}
export type FollowsRepository = ReturnType<typeof createFollowsRepository>;
