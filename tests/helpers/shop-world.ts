// A populated shop for API tests: Harrow & Finch with owner, maker and apprentice, a second
// shop's owner, each with a live session cookie, and one collar pattern. Users and sessions
// are written directly (one shared hash) so building a world costs no password hashing.
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import type { Role } from '@shared/schemas/auth.ts';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import type { PatternWithHead } from '@shared/schemas/library.ts';
import type { TestApp } from './test-app.ts';

/** The Argon2id hash of {@link WORLD_PASSWORD}, computed once per test file. */
let sharedHash: Promise<string> | undefined;
export const WORLD_PASSWORD = 'bridle-leather-9';

export interface Member {
  id: number;
  email: string;
  name: string;
  role: Role;
  shopId: number;
  /** "latchet_session=..." */
  cookie: string;
}

export interface ShopWorld {
  shopId: number;
  owner: Member;
  maker: Member;
  apprentice: Member;
  /** The owner of another shop ("Bosun Tack Co."). */
  outsider: Member;
  /** A collar pattern of the main shop, made by the maker (revision 1). */
  collar: PatternWithHead & { etag: string };
}

async function addMember(t: TestApp, shopId: number, email: string, name: string, role: Role): Promise<Member> {
  const { hashPassword } = await import('../../server/modules/auth/password.ts');
  sharedHash ??= hashPassword(WORLD_PASSWORD);
  const now = Date.now();
  const [user] = await t.db('users').insert({ email, name, password_hash: await sharedHash, created_at: now }).returning<{ id: number }[]>('id');
  await t.db('memberships').insert({ shop_id: shopId, user_id: user!.id, role, created_at: now });
  const sessionId = randomBytes(20).toString('hex');
  await t.db('sessions').insert({ id: sessionId, user_id: user!.id, shop_id: shopId, expires_at: now + 3_600_000, created_at: now });
  return { id: user!.id, email, name, role, shopId, cookie: `latchet_session=${sessionId}` };
}

/** Builds the world on a fresh test app. */
export async function buildWorld(t: TestApp): Promise<ShopWorld> {
  const now = Date.now();
  const [shop] = await t.db('shops').insert({ name: 'Harrow & Finch Leatherworks', created_at: now }).returning<{ id: number }[]>('id');
  const [other] = await t.db('shops').insert({ name: 'Bosun Tack Co.', created_at: now }).returning<{ id: number }[]>('id');
  const owner = await addMember(t, shop!.id, 'maren@harrowfinch.example', 'Maren Finch', 'owner');
  const maker = await addMember(t, shop!.id, 'tobias@harrowfinch.example', 'Tobias Harrow', 'maker');
  const apprentice = await addMember(t, shop!.id, 'ilse@harrowfinch.example', 'Ilse Park', 'apprentice');
  const outsider = await addMember(t, other!.id, 'quinn@bosuntack.example', 'Quinn Abara', 'owner');
  const res = await request(t.app)
    .post('/api/patterns')
    .set('Cookie', maker.cookie)
    .send({ name: "Juniper's collar", kind: 'collar', spec: presetSpec('collar'), note: 'First cut for Juniper', tags: ['dog', 'order-1043'] })
    .expect(201);
  const collar = { ...(res.body as PatternWithHead), etag: res.headers.etag as string };
  return { shopId: shop!.id, owner, maker, apprentice, outsider, collar };
}

/** The collar preset with another girth (mm), for saving new revisions. */
export function collarWithGirth(girthMm: number) {
  return { ...presetSpec('collar'), girthMm };
}
