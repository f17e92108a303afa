// End-to-end: the pattern page as a bench view. A maker prints the form's unsaved values (a
// PDF marked "not saved"), an apprentice on a phone reaches Print before the form and prints
// at a customer's girth, the preview draws at true size after a card calibration, nothing is
// wider than a 390 px phone, and screenshots of every role at three sizes.
import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Download, Page } from 'playwright-core';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import type { Role } from '@shared/schemas/auth.ts';
import { startTestServer } from '../helpers/test-server.ts';
import { ensureClientBuilt } from './support/build-client.ts';
import { createPatternViaApi, signUpInBrowser } from './support/shop-session.ts';
import { launchBrowser, type TestBrowser } from './support/browser.ts';
import { snap } from './support/screenshots.ts';

type Server = Awaited<ReturnType<typeof startTestServer>>;
const owner = { name: 'Maren Finch', shopName: 'Harrow & Finch Leatherworks', email: 'maren.bench@harrowfinch.example', password: 'saddle soap and neatsfoot' };
const PASSWORD = 'round knife on a granite slab';
const people: Record<Exclude<Role, 'owner'>, { name: string; email: string }> = {
  maker: { name: 'Tobias Harrow', email: 'tobias.bench@harrowfinch.example' },
  apprentice: { name: 'Ilse Park', email: 'ilse.bench@harrowfinch.example' },
};
const SIZES = { desktop: { width: 1280, height: 800 }, tablet: { width: 820, height: 1180 }, phone: { width: 390, height: 844 } } as const;
const outDir = join(process.cwd(), 'test-output', 'e2e');

/** The text of a PDF, read back with pdftotext (poppler-utils). */
async function pdfText(download: Download, name: string): Promise<string> {
  mkdirSync(outDir, { recursive: true });
  const path = join(outDir, name);
  await download.saveAs(path);
  expect(readFileSync(path).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  return execFileSync('pdftotext', ['-layout', path, '-'], { encoding: 'utf8' });
}

describe('the bench view', () => {
  let server: Server;
  let browser: TestBrowser;
  let page: Page;
  let id = 0;

  async function signInAs(email: string, password: string) {
    await page.context().clearCookies();
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByTestId('shop-name').waitFor();
  }
  async function openPattern() {
    await page.goto(`${server.url}/patterns/${id}`);
    await page.getByTestId('drawing-preview').locator('svg').waitFor();
  }
  const overflowPx = () => page.evaluate(() => document.documentElement.scrollWidth);

  beforeAll(async () => {
    await ensureClientBuilt();
    server = await startTestServer();
    browser = await launchBrowser(SIZES.desktop);
    page = await browser.context.newPage();
    await signUpInBrowser(page, server.url, owner);
    id = await createPatternViaApi(page, server.url, { name: 'Collar for Pippin', kind: 'collar', spec: presetSpec('collar'), note: 'Shop collar.' });
    // The maker and the apprentice join the owner's shop (written straight to the database:
    // joining through invites is covered by pattern-library.test.ts).
    const { hashPassword } = await import('../../server/modules/auth/password.ts');
    const hash = await hashPassword(PASSWORD);
    const shop = await server.db('shops').first<{ id: number }>('id');
    for (const [role, who] of Object.entries(people)) {
      const [user] = await server.db('users').insert({ email: who.email, name: who.name, password_hash: hash, created_at: Date.now() }).returning<{ id: number }[]>('id');
      await server.db('memberships').insert({ shop_id: shop!.id, user_id: user!.id, role, created_at: Date.now() });
    }
  }, 240_000);

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('when a maker changes the girth and prints the form without saving, then a PDF downloads marked "not saved" at the new girth and no revision is added', async () => {
    await signInAs(people.maker.email, PASSWORD);
    await openPattern();
    await page.getByLabel('Girth (in)', { exact: true }).fill('16');
    await page.waitForFunction(() => document.querySelector('[data-testid="bench-state"]')?.textContent?.includes('not saved'));
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('trial-print').click()]);
    expect(download.suggestedFilename()).toMatch(/not-saved/);
    const text = await pdfText(download, 'bench-trial-print.pdf');
    expect(text.toLowerCase()).toContain('not saved');
    // The title block's girth row shows the form's unsaved 16 in (the saved collar is 13 in).
    expect(text).toMatch(/16 in/);
    const head = await page.request.get(`${server.url}/api/patterns/${id}`);
    expect(((await head.json()) as { head: { number: number } }).head.number).toBe(1);
  });

  it('when an apprentice opens the pattern on a phone (390 x 844), then Print is inside the first screen above the values, and prints at a customer girth', async () => {
    await page.setViewportSize(SIZES.phone);
    await signInAs(people.apprentice.email, PASSWORD);
    await openPattern();
    const print = page.getByTestId('bench-print');
    const box = await print.boundingBox();
    expect(box).not.toBeNull();
    expect(box!.y + box!.height).toBeLessThanOrEqual(SIZES.phone.height);
    // The values are folded away below the print panel, not greyed out above it.
    const values = await page.getByTestId('read-only-values').boundingBox();
    const panel = await page.getByTestId('print-panel').boundingBox();
    expect(panel!.y).toBeLessThan(values!.y);
    expect(await page.getByLabel('Girth (in)', { exact: true }).isVisible()).toBe(false);
    expect(await overflowPx()).toBeLessThanOrEqual(SIZES.phone.width);

    await print.click();
    await page.getByRole('button', { name: 'Print at a customer’s girth…' }).click();
    await page.getByLabel('Customer girth (in)').fill('14 1/2');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Template PDF at this girth' }).click()]);
    const text = await pdfText(download, 'bench-customer-girth.pdf');
    expect(text).toMatch(/rev 1 · at 14 1\/2 in girth/);
  });

  it('when a maker scrolls down the form on a tablet and a phone, then the drawing and summary stay at the top of the screen', async () => {
    await signInAs(people.maker.email, PASSWORD);
    for (const [name, size] of [['tablet', SIZES.tablet], ['phone', SIZES.phone]] as const) {
      await page.setViewportSize(size);
      await openPattern();
      // Scrolled to the save note, below the whole form (again if a late render moved the page),
      // the bench card's top stays at the top of the window.
      const benchTop = async () => {
        await page.getByLabel('Note for this revision').scrollIntoViewIfNeeded();
        await page.evaluate(() => window.scrollBy(0, -200));
        return page.evaluate(() => (window.scrollY > 1000 ? document.querySelector('[data-testid="bench-card"]')!.getBoundingClientRect().top : -1));
      };
      await expect.poll(benchTop, { message: name }).toBeGreaterThanOrEqual(0);
      expect(await benchTop(), name).toBeLessThan(16);
      expect(await page.getByTestId('bench-summary').isVisible()).toBe(true);
      await page.screenshot({ path: join(outDir, `bench-maker-${name}-form-scrolled.png`) });
    }
    await page.setViewportSize(SIZES.desktop);
  });

  it('when the drawing is zoomed with keys, the wheel, the buttons and a two-finger pinch, then its scale follows and 0 fits it again', async () => {
    await page.setViewportSize(SIZES.desktop);
    await openPattern();
    const drawing = page.getByTestId('drawing-preview');
    const scale = async () => Number(await drawing.getAttribute('data-px-per-mm'));
    const fitted = await scale();
    await drawing.focus();
    await page.keyboard.press('+');
    await expect.poll(scale).toBeCloseTo(fitted * 1.25, 6);
    const box = (await drawing.boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.wheel(0, -400);
    await expect.poll(scale).toBeGreaterThan(fitted * 1.25);
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await page.getByRole('button', { name: 'Zoom out' }).click();
    await drawing.focus();
    await page.keyboard.press('0');
    await expect.poll(() => drawing.getAttribute('data-mode')).toBe('fit');
    expect(await scale()).toBeCloseTo(fitted, 6);

    // Pinch: two touch points moving apart from 100 px to 200 px (Chromium turns the touches
    // into pointer events, which the drawing reads) double the scale.
    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Emulation.setTouchEmulationEnabled', { enabled: true, maxTouchPoints: 2 });
    const cx = box.x + box.width / 2;
    const cy = box.y + box.height / 2;
    const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', half: number) =>
      cdp.send('Input.dispatchTouchEvent', { type, touchPoints: type === 'touchEnd' ? [] : [{ x: cx - half, y: cy, id: 1 }, { x: cx + half, y: cy, id: 2 }] });
    await touch('touchStart', 50);
    for (const half of [60, 70, 80, 90, 100]) await touch('touchMove', half);
    await touch('touchEnd', 100);
    await expect.poll(scale).toBeCloseTo(fitted * 2, 3);
    await cdp.send('Emulation.setTouchEmulationEnabled', { enabled: false });
  });

  it('when the screen is calibrated with a card, then true size draws 25.4 mm as 25.4 x the stored px per mm', async () => {
    await page.setViewportSize(SIZES.desktop);
    await openPattern();
    await page.getByRole('button', { name: 'Set up true size' }).click();
    // 5 px per mm is what a card 428 px wide on this screen would give (85.60 mm, ISO/IEC 7810 ID-1).
    await page.getByLabel('Card size on screen').fill('5');
    await page.getByRole('button', { name: 'Use this size' }).click();
    const stored = Number(await page.evaluate(() => localStorage.getItem('latchet.screen.pxPerMm')));
    expect(stored).toBe(5);
    await expect.poll(() => page.getByTestId('drawing-preview').getAttribute('data-mode')).toBe('true');
    const square = await page.getByTestId('true-size-square').boundingBox();
    expect(square!.width).toBeCloseTo(25.4 * stored, 1);
    expect(square!.height).toBeCloseTo(25.4 * stored, 1);
    // The drawing itself: its user unit is the mm, so the rendered width of the SVG over its
    // viewBox width is the px per mm the screen shows.
    const pxPerMm = await page.getByTestId('drawing-preview').locator('svg').evaluate((svg) => (svg as SVGSVGElement).getBoundingClientRect().width / (svg as SVGSVGElement).viewBox.baseVal.width);
    expect(pxPerMm).toBeCloseTo(stored, 3);
    // A stored ratio survives a reload: this browser is calibrated once.
    await openPattern();
    await page.getByRole('button', { name: 'True size' }).click();
    expect((await page.getByTestId('true-size-square').boundingBox())!.width).toBeCloseTo(25.4 * stored, 1);
  });

  it('when each role opens the pattern and the library at 1280, 820 and 390 px, then nothing is wider than the screen (screenshots in test-output/e2e)', async () => {
    const logins: [Role, string, string][] = [
      ['owner', owner.email, owner.password],
      ['maker', people.maker.email, PASSWORD],
      ['apprentice', people.apprentice.email, PASSWORD],
    ];
    for (const [role, email, password] of logins) {
      await page.setViewportSize(SIZES.desktop);
      await signInAs(email, password);
      for (const [name, size] of Object.entries(SIZES)) {
        await page.setViewportSize(size);
        await openPattern();
        await snap(page, `bench-${role}-${name}-pattern`);
        await page.screenshot({ path: join(outDir, `bench-${role}-${name}-pattern-first-screen.png`) });
        expect(await overflowPx(), `${role} pattern at ${name}`).toBeLessThanOrEqual(size.width);
        await page.goto(`${server.url}/`);
        await page.getByTestId('pattern-thumbnail').first().waitFor();
        await expect.poll(() => page.getByTestId('pattern-thumbnail').first().evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
        expect(await page.getByTestId('pattern-fit').first().textContent()).toBe('Girth 13 in');
        await snap(page, `bench-${role}-${name}-library`);
        expect(await overflowPx(), `${role} library at ${name}`).toBeLessThanOrEqual(size.width);
      }
    }
  }, 240_000);
});
