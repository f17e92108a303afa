// Sign-up/sign-in helpers for API tests: each returns an agent holding the session cookie.
import request from 'supertest';
import type { Express } from 'express';
import type { MeResponse, SignUpInput } from '@shared/schemas/auth.ts';

let counter = 0;

/** A sign-up body in our fictional shop scenario, unique per call. */
export function signUpBody(over: Partial<SignUpInput> = {}): SignUpInput {
  counter += 1;
  return { email: `maren.${counter}@harrowfinch.example`, password: 'oak-bark-tannage-7', name: 'Maren Finch', shopName: 'Harrow & Finch Leatherworks', ...over };
}

/** Signs up a new owner; returns the agent (cookie jar) and the /api/me answer. */
export async function signUpAgent(app: Express, over: Partial<SignUpInput> = {}) {
  const agent = request.agent(app);
  const body = signUpBody(over);
  const res = await agent.post('/api/auth/sign-up').send(body).expect(201);
  return { agent, me: res.body as MeResponse, body };
}

/** The session cookie pair ("latchet_session=...") of a Set-Cookie answer. */
export function sessionCookieOf(setCookie: string[] | string | undefined): string {
  const all = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const found = all.find((c) => c.startsWith('latchet_session=') && !c.startsWith('latchet_session=;'));
  if (!found) throw new Error(`no session cookie in ${JSON.stringify(all)}`);
  return found.split(';')[0]!;
}
