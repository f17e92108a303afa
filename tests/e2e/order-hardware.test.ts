// End-to-end: an order's hardware lines, edited on the order page. The owner lists hardware and
// prices; the order starts "as the pattern" (matched by kind); the owner chooses lines, a
// quantity over 50 is refused by its label at the field, the saved lines reach the order view
// and the price breakdown; back to "as the pattern" stores null again. Photographed at 390 px
// and 1280 px, and the page is never wider than the screen.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import type { OrderDetail } from '@shared/schemas/order-views.ts';
import { startTestServer } from '../helpers/test-server.ts';
import { ensureClientBuilt } from './support/build-client.ts';
import { createPatternViaApi, signUpInBrowser } from './support/shop-session.ts';
import { launchBrowser, type TestBrowser } from './support/browser.ts';
import { snap } from './support/screenshots.ts';

type Server = Awaited<ReturnType<typeof startTestServer>>;

const owner = { name: 'Tamsin Hale', shopName: 'Hale Strapworks', email: 'tamsin.hardware@halestrap.example', password: 'solid brass roller 1907' };
const PRICING = { currency: 'GBP', wasteFactor: 1.25, hourlyRateCents: 3000, leathers: [{ id: 'bridle-chestnut', name: 'Bridle, chestnut', pricePerSqFtCents: 1200 }] };
const HARDWARE = [
  { id: 'buckle-1in', kind: 'buckle', name: 'Roller buckle', insideWidthMm: 25.4, unitCostCents: 450 },
  { id: 'dring-1in', kind: 'd-ring', name: 'Welded D-ring', insideWidthMm: 25.4, unitCostCents: 120 },
  { id: 'rivet-8', kind: 'rivet', name: 'Double cap rivet', postLengthMm: 8, unitCostCents: 15 },
  { id: 'brass-plate', kind: 'other', name: 'Engraved brass name plate', unitCostCents: 975 },
];

async function bothWidths(page: Page, name: string): Promise<void> {
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await page.waitForTimeout(50); // one frame for the layout to settle at the new width
    const wide = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(wide, `${name} at ${width} px is ${wide} px wide`).toBeLessThanOrEqual(width);
    await snap(page, `order-hardware-${name}-${width}`);
  }
  await page.setViewportSize({ width: 1280, height: 900 });
}

describe("an order's hardware lines, in the browser", () => {
  let server: Server;
  let shop: TestBrowser;
  let page: Page;
  let orderId = 0;
  const api = async (path: string) => ((await (await page.request.get(server.url + path)).json()) as { order: OrderDetail }).order;

  beforeAll(async () => {
    await ensureClientBuilt();
    server = await startTestServer();
    shop = await launchBrowser({ width: 1280, height: 900 });
    page = await shop.context.newPage();
    page.setDefaultTimeout(20_000);
    await signUpInBrowser(page, server.url, owner);
    const h = { headers: { Origin: server.url } };
    expect((await page.request.put(server.url + '/api/shop/pricing', { ...h, data: PRICING })).status()).toBe(200);
    expect((await page.request.put(server.url + '/api/shop/standards', { ...h, data: { units: 'in', hardware: HARDWARE } })).status()).toBe(200);
    const patternId = await createPatternViaApi(page, server.url, { name: 'Shop collar, 1 in bridle', kind: 'collar', spec: presetSpec('collar'), note: 'Proven on the shop dogs.' });
    const c = await page.request.post(server.url + '/api/customers', { ...h, data: { name: 'Wren Aldous', email: 'wren@customers.example', phone: '' } });
    expect(c.status()).toBe(201);
    const customerId = ((await c.json()) as { customer: { id: number } }).customer.id;
    const wr = await page.request.post(`${server.url}/api/customers/${customerId}/wearers`, { ...h, data: { name: 'Juniper', kind: 'dog' } });
    const wearerId = ((await wr.json()) as { wearer: { id: number } }).wearer.id;
    await page.request.post(`${server.url}/api/wearers/${wearerId}/measurements`, { ...h, data: { girthMm: 355.6, unit: 'in', part: 'neck', method: 'soft-tape' } });
    const o = await page.request.post(server.url + '/api/orders', { ...h, data: { wearerId, patternId, fit: { from: 'measurement' }, dueDate: '2027-03-14', leatherId: 'bridle-chestnut', benchMinutes: 60 } });
    expect(o.status()).toBe(201);
    orderId = ((await o.json()) as { order: OrderDetail }).order.id;
  }, 240_000);

  afterAll(async () => {
    await shop?.close();
    await server?.close();
  });

  it('when the order is new, then its hardware is matched from the pattern and the edit form says "Matched by kind"', async () => {
    const order = await api(`/api/orders/${orderId}`);
    expect(order.hardwareChosen).toBe(false);
    expect(order.hardware.map((l) => l.itemId)).toContain('buckle-1in');
    await page.goto(`${server.url}/orders/${orderId}`);
    await page.getByTestId('price-total').waitFor();
    await page.getByRole('button', { name: 'Edit' }).click();
    await expect(page.getByLabel('Matched by kind').isChecked()).resolves.toBe(true);
    await expect(page.getByTestId('order-hardware-line').count()).resolves.toBe(0);
  });

  it('when the owner chooses lines, then they start from the matched ones, each item is named in words, and a quantity of 60 is refused by its label', async () => {
    await page.getByLabel('Choose lines').check();
    const lines = page.getByTestId('order-hardware-line');
    // The lines the pattern matched (buckle, D-ring, rivets) are where choosing starts.
    await expect(lines.count()).resolves.toBeGreaterThan(0);
    const first = lines.first().getByLabel('Hardware item');
    await expect(first.inputValue()).resolves.toBe('buckle-1in');
    const words = await first.locator('option').allTextContents();
    expect(words).toContain('Roller buckle (Buckle, 1 in inside), £4.50 each');
    expect(words).toContain('Double cap rivet (Rivet, 5/16 in post), £0.15 each');
    expect(words).toContain('Engraved brass name plate (Other), £9.75 each');
    // Keep one line: the name plate, 60 of them (too many).
    while ((await lines.count()) > 1) await lines.nth(1).getByRole('button', { name: /Remove/ }).click();
    await first.selectOption('brass-plate');
    await lines.first().getByLabel('Hardware quantity').fill('60');
    await page.getByRole('button', { name: 'Add line' }).click();
    await expect(lines.count()).resolves.toBe(2);
    await page.getByRole('button', { name: 'Save changes' }).click();
    await lines.first().getByText('Hardware quantity must be at most 50').waitFor();
    // The added line was left unchosen: refused by its label too.
    await lines.nth(1).getByText('Hardware item is required').waitFor();
    // No schema path or camelCase name on screen.
    const shown = await page.getByTestId('order-hardware').innerText();
    expect(shown).toContain('Hardware quantity must be at most 50');
    expect(shown).not.toMatch(/itemId|hardware\.\d|\b[a-z]+[A-Z][a-z]+\b/);
    await bothWidths(page, '01-lines-refused');
  });

  it('when the owner saves two name plates, then the order view stores the line and the price counts it', async () => {
    const lines = page.getByTestId('order-hardware-line');
    await lines.nth(1).getByRole('button', { name: /Remove/ }).click();
    await lines.first().getByLabel('Hardware quantity').fill('2');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByRole('button', { name: 'Edit' }).waitFor();
    const order = await api(`/api/orders/${orderId}`);
    expect(order.hardwareChosen).toBe(true);
    expect(order.hardware).toEqual([{ itemId: 'brass-plate', quantity: 2 }]);
    expect(order.price!.hardware).toEqual([{ itemId: 'brass-plate', name: 'Engraved brass name plate', quantity: 2, unitCostCents: 975, cents: 1950 }]);
    const breakdown = (await page.getByTestId('price-breakdown').textContent()) ?? '';
    expect(breakdown).toContain('Engraved brass name plate');
    expect(breakdown).toContain('£19.50');
    expect(breakdown).not.toContain('Roller buckle');
    await bothWidths(page, '02-saved');
    // The edit form opens on the saved lines.
    await page.getByRole('button', { name: 'Edit' }).click();
    await expect(page.getByLabel('Choose lines').isChecked()).resolves.toBe(true);
    await expect(page.getByTestId('order-hardware-line').count()).resolves.toBe(1);
    await expect(page.getByTestId('order-hardware-line').getByLabel('Hardware quantity').inputValue()).resolves.toBe('2');
    await bothWidths(page, '03-edit-lines');
  });

  it('when the owner switches back to "Matched by kind" (as the pattern), then null is stored and the matched hardware is priced again', async () => {
    await page.getByLabel('Matched by kind').check();
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByRole('button', { name: 'Edit' }).waitFor();
    const order = await api(`/api/orders/${orderId}`);
    expect(order.hardwareChosen).toBe(false);
    expect(order.price!.hardware.map((h) => h.itemId)).toContain('buckle-1in');
    expect(order.price!.hardware.map((h) => h.itemId)).not.toContain('brass-plate');
    const stored = await server.db('orders').where({ id: orderId }).first('hardware');
    expect(stored.hardware).toBeNull();
    const breakdown = (await page.getByTestId('price-breakdown').textContent()) ?? '';
    expect(breakdown).toContain('Roller buckle');
    expect(breakdown).not.toContain('Engraved brass name plate');
  });
});
