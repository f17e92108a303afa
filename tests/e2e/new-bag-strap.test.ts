// End-to-end: a maker starts a bag strap either at one length (the shop's standard) or as the
// adjustable strap with a buckle and swivel snaps, and each opens as what was chosen.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startTestServer } from '../helpers/test-server.ts';
import { ensureClientBuilt } from './support/build-client.ts';
import { signUpInBrowser } from './support/shop-session.ts';
import { launchBrowser, type TestBrowser } from './support/browser.ts';
import { snap } from './support/screenshots.ts';

type Server = Awaited<ReturnType<typeof startTestServer>>;
const owner = { name: 'Maren Finch', shopName: 'Harrow & Finch Leatherworks', email: 'maren.bags@harrowfinch.example', password: 'saddle soap and neatsfoot' };

interface HeadSpec {
  pieces: unknown[];
  hardware: { clips?: { kind: string; count: number }; buckle?: { style: string } };
  ends?: unknown;
  [key: string]: unknown;
}

describe('starting a bag strap', () => {
  let server: Server;
  let browser: TestBrowser;
  let page: Page;

  beforeAll(async () => {
    await ensureClientBuilt();
    server = await startTestServer();
    browser = await launchBrowser({ width: 1280, height: 800 });
    page = await browser.context.newPage();
    await signUpInBrowser(page, server.url, owner);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  async function startBagStrap(name: string, length: RegExp | null): Promise<HeadSpec> {
    await page.goto(`${server.url}/patterns/new?kind=bag-strap`);
    await page.getByLabel('Pattern name').fill(name);
    if (length) await page.getByRole('radio', { name: length }).check();
    await page.getByRole('button', { name: 'Create pattern' }).click();
    await page.waitForURL(/\/patterns\/\d+$/);
    await page.getByTestId('drawing-preview').locator('svg').waitFor();
    const id = page.url().split('/').pop();
    const res = await page.request.get(`${server.url}/api/patterns/${id}`);
    expect(res.status()).toBe(200);
    return ((await res.json()) as { head: { spec: HeadSpec } }).head.spec;
  }

  it('when the maker picks the adjustable bag strap, then it opens with its buckle, holes and swivel snaps; the one-length strap has neither', async () => {
    await page.goto(`${server.url}/patterns/new?kind=bag-strap`);
    await expect.poll(() => page.getByRole('radio', { name: /^Adjustable/ }).isVisible()).toBe(true);
    await snap(page, 'new-bag-strap-01-choice');

    const adjustable = await startBagStrap('Camera strap for Wren', /^Adjustable/);
    await snap(page, 'new-bag-strap-02-adjustable');
    await expect.poll(() => page.getByText('Started from the built-in adjustable bag strap.').count()).toBeGreaterThan(0);
    expect(adjustable.hardware.clips, 'swivel snaps on the adjustable strap').toMatchObject({ kind: 'swivel-snap', count: 2 });
    expect(adjustable.hardware.buckle?.style, 'a buckle to adjust it').toBe('centre-bar');

    const fixed = await startBagStrap('Satchel strap for Odile', null);
    expect(fixed.hardware.clips ?? null, 'the one-length strap folds round D-rings, no snaps').toBeNull();
    expect(fixed.hardware.buckle?.style, 'and has no buckle').toBe('none');
  });
});
