// Browser set-up shared by the E2E files: sign a new shop up through the real form, and
// create patterns through the real API with the session the browser holds.
import { expect } from 'vitest';
import type { Page } from 'playwright-core';

/** Who signs up: the sign-up form's four fields. */
export interface NewShop {
  name: string;
  shopName: string;
  email: string;
  password: string;
}

/** Fills and sends the sign-up form at `baseUrl`; resolves when the signed-in shell shows. */
export async function signUpInBrowser(page: Page, baseUrl: string, who: NewShop): Promise<void> {
  await page.goto(baseUrl + '/sign-up');
  await page.getByLabel('Your name').fill(who.name);
  await page.getByLabel('Shop name').fill(who.shopName);
  await page.getByLabel('E-mail').fill(who.email);
  await page.getByLabel('Password').fill(who.password);
  await page.getByRole('button', { name: 'Create shop and sign in' }).click();
  await page.getByTestId('shop-name').waitFor();
}

/** POST /api/patterns as the signed-in browser; returns the new pattern's id. */
export async function createPatternViaApi(page: Page, baseUrl: string, body: { name: string; kind: string; spec: unknown; note: string }): Promise<number> {
  const res = await page.request.post(baseUrl + '/api/patterns', { headers: { Origin: baseUrl }, data: body });
  expect(res.status()).toBe(201);
  return ((await res.json()) as { pattern: { id: number } }).pattern.id;
}
