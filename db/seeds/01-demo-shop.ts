// Demo shop "Harrow & Finch Leatherworks" with its owner, maker and apprentice. Running it
// again resets exactly these rows (matched by the demo e-mails and shop name) and nothing else.
import type { Knex } from 'knex';
import { hashPassword } from '../../server/modules/auth/password.ts';

/** The password of every demo account; printed by `npm start`. */
export const DEMO_PASSWORD = 'saddle-stitch-2026';
export const DEMO_SHOP = 'Harrow & Finch Leatherworks';
export const DEMO_USERS = [
  { email: 'maren@harrowfinch.example', name: 'Maren Finch', role: 'owner' },
  { email: 'tobias@harrowfinch.example', name: 'Tobias Harrow', role: 'maker' },
  { email: 'ilse@harrowfinch.example', name: 'Ilse Park', role: 'apprentice' },
] as const;

export async function seed(knex: Knex): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const now = Date.now();
  await knex.transaction(async (trx) => {
    // The shop first: its patterns, revisions, invites and share links go with it (ON DELETE
    // CASCADE), which frees the demo users (revision authors are RESTRICT); then the users,
    // whose memberships and sessions cascade.
    await trx('shops').where({ name: DEMO_SHOP }).delete();
    await trx('users').whereIn('email', DEMO_USERS.map((u) => u.email)).delete();
    const [shop] = await trx('shops').insert({ name: DEMO_SHOP, created_at: now }).returning<{ id: number }[]>('id');
    for (const [i, u] of DEMO_USERS.entries()) {
      const [user] = await trx('users')
        .insert({ email: u.email, name: u.name, password_hash: passwordHash, created_at: now })
        .returning<{ id: number }[]>('id');
      // Distinct join times keep "first shop" and member lists in a stable order.
      await trx('memberships').insert({ shop_id: shop!.id, user_id: user!.id, role: u.role, created_at: now + i });
    }
  });
}
