// End-to-end: a maker adds a photo of a finished piece to a pattern, a web page renamed .png is
// refused in plain words, an apprentice sees the photo but gets no upload or delete controls
// (the permission table: pattern photos need a maker), and deleting asks first.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { startTestServer } from '../helpers/test-server.ts';
import { ensureClientBuilt } from './support/build-client.ts';
import { createPatternViaApi, signUpInBrowser } from './support/shop-session.ts';
import { launchBrowser, type TestBrowser } from './support/browser.ts';
import { snap } from './support/screenshots.ts';

type Server = Awaited<ReturnType<typeof startTestServer>>;

const owner = { name: 'Maren Finch', shopName: 'Harrow & Finch Leatherworks', email: 'maren.photos@harrowfinch.example', password: 'oak-tanned bridle 1892' };
const apprentice = { name: 'Tobin Reyes', email: 'tobin.photos@harrowfinch.example', password: 'waxed linen and a stitching pony' };
const CAPTION = 'Finished collar on Juniper, chestnut bridle';

/** Screenshots at desktop and phone widths; at each, the page must not be wider than the screen. */
async function snapBoth(page: Page, name: string): Promise<void> {
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: width === 390 ? 844 : 800 });
    await page.waitForTimeout(50); // one frame for the layout to settle at the new width
    const wide = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(wide, `${name} at ${width} px is ${wide} px wide`).toBeLessThanOrEqual(width);
    await snap(page, `pattern-photos-${name}-${width}`);
  }
  await page.setViewportSize({ width: 1280, height: 800 });
}

describe('photos on a pattern, in the browser', () => {
  let server: Server;
  let shop: TestBrowser;
  let page: Page;
  let bench: TestBrowser;
  let apprenticePage: Page;
  let patternUrl = '';

  beforeAll(async () => {
    await ensureClientBuilt();
    server = await startTestServer();
    shop = await launchBrowser({ width: 1280, height: 800 });
    page = await shop.context.newPage();
    await signUpInBrowser(page, server.url, owner);
    const id = await createPatternViaApi(page, server.url, { name: 'Shop collar, 1 in bridle', kind: 'collar', spec: presetSpec('collar'), note: 'Proven on the shop dogs.' });
    patternUrl = `${server.url}/patterns/${id}`;
    // The apprentice joins through an invite (its own E2E covers the screens of that).
    const invite = await page.request.post(server.url + '/api/shop/invites', { headers: { Origin: server.url }, data: { email: apprentice.email, role: 'apprentice' } });
    expect(invite.status()).toBe(201);
    const mail = await server.mailbox.waitFor((m) => m.recipients.includes(apprentice.email));
    const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text)?.[1] ?? '';
    bench = await launchBrowser({ width: 1280, height: 800 });
    apprenticePage = await bench.context.newPage();
    const accepted = await apprenticePage.request.post(`${server.url}/api/invites/${token}/accept`, { headers: { Origin: server.url }, data: { name: apprentice.name, password: apprentice.password } });
    expect(accepted.status()).toBe(201);
    // A step that cannot find its control fails in 20 s, well inside the test's own limit.
    for (const p of [page, apprenticePage]) p.setDefaultTimeout(20_000);
    await page.goto(patternUrl);
    await page.getByText('No photos yet.').waitFor();
  }, 240_000);

  afterAll(async () => {
    await bench?.close();
    await shop?.close();
    await server?.close();
  });

  it('when the owner uploads a web page renamed .png, then it is refused in plain words and nothing is added', async () => {
    await page.getByLabel(/^Photo \(JPEG/).setInputFiles({ name: 'juniper.png', mimeType: 'image/png', buffer: Buffer.from('<!doctype html><title>not a photo</title>') });
    await page.getByRole('button', { name: 'Upload photo' }).click();
    const alert = page.getByRole('alert').filter({ hasText: 'The photo was not added' });
    await alert.waitFor();
    // The accepted types are the ones the issue names (JPEG, PNG, WebP judged by their bytes).
    await expect(alert.textContent()).resolves.toContain('Choose a JPEG, PNG or WebP photo.');
    await expect(page.getByText('No photos yet.').count()).resolves.toBe(1);
    await snapBoth(page, '01-refused');
  });

  it('when the owner uploads a real PNG, then its thumbnail shows on the pattern', async () => {
    // A 64 x 40 px tan swatch made by sharp, the photo library the server also uses.
    const png = await sharp({ create: { width: 64, height: 40, channels: 3, background: { r: 163, g: 108, b: 57 } } }).png().toBuffer();
    await page.getByLabel(/^Photo \(JPEG/).setInputFiles({ name: 'juniper-collar.png', mimeType: 'image/png', buffer: png });
    await page.getByLabel('Caption').fill(CAPTION);
    await page.getByRole('button', { name: 'Upload photo' }).click();
    await page.getByText('Photo added.').waitFor();
    const thumb = page.getByTestId('pattern-photos').getByRole('img', { name: CAPTION });
    await thumb.waitFor();
    // The thumbnail really loaded (a broken image has no natural width).
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);
    await page.getByRole('heading', { name: 'Photos (1)' }).waitFor();
    await snapBoth(page, '02-added');
  });

  it('when an apprentice opens the pattern, then the photo shows but there is no upload or delete', async () => {
    await apprenticePage.goto(patternUrl);
    await apprenticePage.getByTestId('pattern-photos').getByRole('img', { name: CAPTION }).waitFor();
    await expect(apprenticePage.getByRole('button', { name: 'Upload photo' }).count()).resolves.toBe(0);
    await expect(apprenticePage.getByRole('button', { name: /^Delete photo/ }).count()).resolves.toBe(0);
    await snapBoth(apprenticePage, '03-apprentice');
  });

  it('when the owner deletes the photo, then it asks first, Keep leaves it, and Delete photo removes it', async () => {
    await page.getByRole('button', { name: `Delete photo ${CAPTION}` }).click();
    const ask = page.getByRole('group', { name: 'Delete this photo?' });
    await ask.waitFor();
    await snapBoth(page, '04-asking');
    await ask.getByRole('button', { name: 'Keep' }).click();
    await expect(page.getByTestId('pattern-photos').getByRole('img', { name: CAPTION }).count()).resolves.toBe(1);
    await page.getByRole('button', { name: `Delete photo ${CAPTION}` }).click();
    await page.getByRole('group', { name: 'Delete this photo?' }).getByRole('button', { name: 'Delete photo', exact: true }).click();
    await page.getByText('No photos yet.').waitFor();
    const left = await page.request.get(`${patternUrl.replace('/patterns/', '/api/patterns/')}/photos`);
    expect(((await left.json()) as { items: unknown[] }).items).toHaveLength(0);
  });
});
