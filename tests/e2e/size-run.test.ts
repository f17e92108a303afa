// End-to-end: a collar graded into a five-size run in the editor, the run panel's fit ranges
// and the gap when one girth moves apart, the tip shape changing the preview, and the run
// printed as a print job with its progress bar, in Chromium against the real server.
import { readFileSync } from 'node:fs';
import { PDFDocument } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { parseLengthMm } from '@shared/units/length.ts';
import { startTestServer } from '../helpers/test-server.ts';
import { ensureClientBuilt } from './support/build-client.ts';
import { createPatternViaApi, signUpInBrowser } from './support/shop-session.ts';
import { launchBrowser, type TestBrowser } from './support/browser.ts';
import { snap, snapElement } from './support/screenshots.ts';

const IN = 25.4; // mm per inch, exact (International Yard and Pound Agreement, 1959)
type Server = Awaited<ReturnType<typeof startTestServer>>;

const maker = { name: 'Tobias Harrow', shopName: 'Harrow & Finch Leatherworks', email: 'tobias.run@harrowfinch.example', password: 'bridle butt and edge kote' };
// Five collar sizes 2 in apart (common practice for a graded dog-collar run).
const RUN = [
  ['XS', '10'],
  ['S', '12'],
  ['M', '14'],
  ['L', '16'],
  ['XL', '18'],
] as const;

const preview = (page: Page) => page.getByTestId('drawing-preview').innerHTML();

describe('a size run in the browser', () => {
  let server: Server;
  let browser: TestBrowser;
  let page: Page;
  let id = 0;

  beforeAll(async () => {
    await ensureClientBuilt();
    server = await startTestServer();
    browser = await launchBrowser();
    page = await browser.context.newPage();
    await signUpInBrowser(page, server.url, maker);
    id = await createPatternViaApi(page, server.url, { name: 'Collar run for Bosun', kind: 'collar', spec: presetSpec('collar'), note: 'Shop collar, one size.' });
  }, 180_000);

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('when five sizes are added to the collar, then the run panel lists each blank (neck + 8 in, common practice) and a 3 in fit range', async () => {
    await page.goto(`${server.url}/patterns/${id}`);
    await page.getByTestId('drawing-preview').locator('svg').waitFor();
    await page.getByText('No size run').waitFor();
    for (const [i, [name, girth]] of RUN.entries()) {
      await page.getByRole('button', { name: 'Add a size' }).click();
      await page.getByLabel(`Size ${i + 1} name`).fill(name);
      await page.getByLabel(`Size ${i + 1} girth (in)`).fill(girth);
    }
    const rows = page.getByTestId('size-run-row');
    await expect.poll(() => rows.count()).toBe(5);
    // The collar is measured over two fingers: at every size its middle hole closes 1/4 in over
    // the bare neck (blank = neck + 8 in, common practice), so no size carries a warning.
    await expect.poll(() => rows.locator('th').allTextContents()).toEqual(RUN.map(([n]) => n));
    // Collar rule (common practice): blank = neck + 8 in.
    await expect(rows.locator('td:nth-of-type(2)').allTextContents()).resolves.toEqual(RUN.map(([, g]) => `${Number(g) + 8} in`));
    // Five holes 3/4 in apart span 3 in of fit (collar preset, common practice), so each range is 3 in wide.
    const ranges = await rows.locator('td:nth-of-type(3)').allTextContents();
    const mm = ranges.map((r) => r.split('–').map((t) => parseLengthMm(t.trim(), 'in') ?? Number.NaN));
    // Shown to 1/32 in, so each end may be off by 1/64 in.
    for (const [lo, hi] of mm) expect(Math.abs(hi! - lo! - 3 * IN), ranges.join(', ')).toBeLessThanOrEqual(IN / 32);
    // In rule mode the holes move with the girth: each range starts 2 in above the last.
    for (let i = 1; i < mm.length; i++) expect(Math.abs(mm[i]![0]! - mm[i - 1]![0]! - 2 * IN)).toBeLessThanOrEqual(IN / 32);
    // Sizes 2 in apart with 3 in ranges overlap their neighbours by 1 in; no gap anywhere.
    const joins = page.getByTestId('size-join');
    await expect(joins.evaluateAll((els) => els.map((e) => e.getAttribute('data-kind')))).resolves.toEqual(['overlap', 'overlap', 'overlap', 'overlap']);
    await expect(joins.first().textContent()).resolves.toBe('XS and S overlap by 1 in.');
    await snap(page, 'size-run-01-five-sizes');
  });

  it('when XL moves from 18 in to 20 in, then the run shows a 1 in gap between L and XL as a problem', async () => {
    await page.getByLabel('Size 5 girth (in)').fill('20');
    const gap = page.locator('[data-testid="size-join"][data-kind="gap"]');
    await gap.waitFor();
    // L fits 16 + a .. 19 + a, XL now 20 + a .. 23 + a: 1 in where no hole of either size fits.
    await expect(gap.textContent()).resolves.toContain('Gap of 1 in between L and XL');
    await page.getByText('1 gap in the run').waitFor();
    await snapElement(page.getByTestId('size-run'), 'size-run-02-gap');
  });

  it('when the tip changes from English point to spear and its depth changes, then the preview redraws each time', async () => {
    const tip = page.getByLabel('Tip shape');
    await expect(tip.inputValue()).resolves.toBe('english-point');
    const before = await preview(page);
    await tip.selectOption('spear');
    await expect.poll(() => preview(page)).not.toBe(before);
    const spear = await preview(page);
    const depth = page.getByLabel('Point depth (in)');
    await depth.fill('1 1/2');
    await expect.poll(() => preview(page)).not.toBe(spear);
    await tip.selectOption('round');
    await page.getByLabel('Corner radius (in)').waitFor();
    // Half the 1 in width is a semicircle (the schema's round tip).
    await expect(page.getByLabel('Corner radius (in)').inputValue()).resolves.toBe('1/2');
    await tip.selectOption('spear');
    await page.getByLabel('Point depth (in)').fill('1 1/2');
    await expect.poll(() => preview(page)).not.toBe(before);
    await snapElement(page.getByTestId('drawing-preview'), 'size-run-03-spear-tip');
    await page.getByLabel('Note for this revision').fill('Graded XS-XL for the spring order; spear tip.');
    await page.getByRole('button', { name: 'Save revision 2' }).click();
    await page.getByText('Saved as revision 2.').waitFor();
  });

  it('when the margin is beyond what the server prints (2 in), then its refusal is shown beside the margin', async () => {
    await page.getByLabel('Margin (in)').fill('2');
    await page.getByRole('link', { name: 'Template PDF, all 5 sizes' }).click();
    const margin = page.getByLabel('Margin (in)');
    // The print options' limit is 25.4 mm (server/modules/print/print-options.ts).
    await expect.poll(() => margin.getAttribute('aria-invalid')).toBe('true');
    const describedBy = (await margin.getAttribute('aria-describedby')) ?? '';
    await expect(page.locator(`[id="${describedBy}"]`).textContent()).resolves.toContain('outside 0-25.4 mm');
    await snapElement(page.getByTestId('print-panel'), 'size-run-04-margin-refused');
  });

  it('when all five sizes print as a job, then the bar counts pages and the PDF has as many pages as the server printed for the same options', async () => {
    await page.getByLabel('Margin (in)').fill('1/4');
    await page.getByLabel('Tile overlap (in)').fill('1/2');
    await page.getByLabel('Add the job sheet').check();
    // Record every step the bar shows, however fast the worker is.
    await page.evaluate(() => {
      const w = window as unknown as { __steps: string[] };
      w.__steps = [];
      new MutationObserver(() => {
        const t = document.querySelector('[data-testid="print-step"]')?.textContent;
        if (t && w.__steps[w.__steps.length - 1] !== t) w.__steps.push(t);
      }).observe(document.body, { subtree: true, childList: true, characterData: true });
    });
    const [download] = await Promise.all([page.waitForEvent('download', { timeout: 120_000 }), page.getByRole('link', { name: 'Template PDF, all 5 sizes' }).click()]);
    const file = readFileSync(await download.path());
    expect(file.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(download.suggestedFilename()).toMatch(/-r2-all-sizes-letter\.pdf$/);
    const pages = (await PDFDocument.load(file)).getPageCount();
    await page.getByTestId('print-saved').waitFor();
    await snap(page, 'size-run-05-printed');

    const steps = await page.evaluate(() => (window as unknown as { __steps: string[] }).__steps);
    console.info('print job steps seen:', steps.join(' | '));
    expect(steps[steps.length - 1]).toBe(`Done: ${pages} pages`);
    for (const s of steps.filter((x) => x.startsWith('Drawing page'))) expect(s).toMatch(new RegExp(`^Drawing page \\d+ of ${pages}$`));

    // The same options through the synchronous download give the same page count.
    const sync = await page.request.get(`${server.url}/api/patterns/${id}/revisions/2/pdf?paper=letter&orientation=auto&margin=6.35mm&overlap=12.7mm&jobSheet=true&size=all`);
    expect(sync.status()).toBe(200);
    expect((await PDFDocument.load(await sync.body())).getPageCount()).toBe(pages);
  }, 150_000);

  it('when one size is chosen, then the PDF downloads directly, without a job', async () => {
    await page.getByLabel('Size', { exact: true }).selectOption('M');
    const [download] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), page.getByRole('link', { name: 'Template PDF', exact: true }).click()]);
    expect(download.suggestedFilename()).toMatch(/-r2-size-m-letter\.pdf$/);
    await expect(page.getByTestId('print-progress').count()).resolves.toBe(0);
  }, 90_000);

  it('when a size is removed and two names clash, then the run shrinks and the schema names the clash under the sizes', async () => {
    await page.getByRole('button', { name: 'Remove size XL' }).click();
    await expect.poll(() => page.getByTestId('size-row').count()).toBe(4);
    await expect.poll(() => page.getByTestId('size-run-row').count()).toBe(4);
    // Size names are unique whatever their case (shared/schemas/strap-spec.ts).
    await page.getByLabel('Size 4 name').fill('s');
    const sizes = page.getByRole('group', { name: 'Sizes' });
    await sizes.getByRole('alert').getByText('size names must be unique').waitFor();
    await expect(page.getByRole('button', { name: /Save revision/ }).isDisabled()).resolves.toBe(true);
    await snap(page, 'size-run-06-names-clash');
    await page.getByLabel('Size 4 name').fill('L');
    await expect.poll(() => sizes.getByText('size names must be unique').count()).toBe(0);
  });

  it('when a size is too small for the five tip holes and the maker saves, then the run panel and the refused save name that size beside its girth', async () => {
    // 2 in of collar leaves no room for 5 holes 3/4 in apart plus the tip (collar preset, common practice).
    const girth = page.getByLabel('Size 4 girth (in)');
    await girth.fill('2');
    // 5 holes 3/4 in apart with the first 3 in from the tip take 4 x 3/4 + 3 = 6 in (collar preset).
    const tooShort = /Tip holes: 5 holes 3\/4 in apart need 6 in from the tip, .+ available before the buckle end/;
    const runPanel = page.locator('section', { has: page.getByRole('heading', { name: 'Size run (4)' }) });
    await runPanel.getByText(tooShort).waitFor();
    // The run panel says which size to change, as the save's refusal does.
    await expect(runPanel.getByText(tooShort).textContent()).resolves.toMatch(/^Size L \(2 in\): /);
    await page.getByLabel('Note for this revision').fill('Trying a toy size.');
    await page.getByRole('button', { name: 'Save revision 3' }).click();
    await expect.poll(() => girth.getAttribute('aria-invalid')).toBe('true');
    const describedBy = (await girth.getAttribute('aria-describedby')) ?? '';
    const message = (await page.locator(`[id="${describedBy}"]`).textContent()) ?? '';
    // The server names the size beside its girth (in the unit shown) and the engine's limit;
    // the field path stays out of the sentence.
    expect(message).toMatch(/^Size L \(2 in\): /);
    expect(message).toMatch(tooShort);
    expect(message).not.toMatch(/sizes\.|girthMm|spec\./);
    await snap(page, 'size-run-07-size-refused');
    await girth.fill('16');
    await expect.poll(() => girth.getAttribute('aria-invalid')).toBeNull();
  });
});
