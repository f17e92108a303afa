// End-to-end: an owner sets the shop's collar standard (allowance, ease, a buckle from the
// shop's hardware list) on the Shop page, and a new collar opens from it with no warning and
// no changes; a maker adds a keeper, a stitch row and a taper and sees each in the preview
// and in the printed PDF; makers and apprentices read the standards. Chromium, real server.
import { execFileSync } from 'node:child_process';
import { mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import { basename } from 'node:path';
import sharp from 'sharp';
import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startTestServer } from '../helpers/test-server.ts';
import { ensureClientBuilt } from './support/build-client.ts';
import { signUpInBrowser } from './support/shop-session.ts';
import { launchBrowser, type TestBrowser } from './support/browser.ts';
import { snap } from './support/screenshots.ts';

type Server = Awaited<ReturnType<typeof startTestServer>>;
const owner = { name: 'Maren Finch', shopName: 'Harrow & Finch Leatherworks', email: 'maren.std@harrowfinch.example', password: 'slicker and gum tragacanth' };
const SIZES = [
  { name: 'desktop', width: 1280, height: 800 },
  { name: 'tablet', width: 820, height: 1180 },
  { name: 'phone', width: 390, height: 844 },
] as const;
const OUT = new URL('../../test-output/e2e/', import.meta.url).pathname;

const blankText = async (page: Page) => (await page.getByTestId('strap-blank').locator('strong').textContent()) ?? '';
/** Counts of what the preview draws for one piece (ids from shared/render/svg.ts). */
const previewOf = (page: Page, piece: string) =>
  page.evaluate((id) => {
    const svg = document.querySelector('[data-testid="drawing-preview"] svg');
    return {
      hasPiece: Boolean(svg?.querySelector(`#piece-${id}-cut`)),
      punchMarks: svg?.querySelectorAll(`#piece-${id}-punch circle`).length ?? 0,
      outline: svg?.querySelector(`#piece-${id}-cut path`)?.getAttribute('d') ?? '',
    };
  }, piece);

/** Grey pixels of every page's upper half (the drawing, above the title block) at 30 dpi. */
async function drawingPixels(pdf: string): Promise<string[]> {
  const prefix = `${pdf}-px`;
  execFileSync('pdftoppm', ['-gray', '-png', '-r', '30', pdf, prefix]);
  const pages = readdirSync(OUT).filter((f) => f.startsWith(basename(prefix)) && f.endsWith('.png')).sort();
  const out: string[] = [];
  for (const f of pages) {
    const img = sharp(`${OUT}${f}`);
    const { height = 0, width = 0 } = await img.metadata();
    out.push((await img.extract({ left: 0, top: 0, width, height: Math.floor(height / 2) }).raw().toBuffer()).toString('base64'));
  }
  return out;
}

/** A member of the owner's shop with a live session, written straight to the database. */
async function addMember(server: Server, role: 'maker' | 'apprentice', name: string): Promise<string> {
  const shop = await server.db('shops').where({ name: owner.shopName }).first<{ id: number }>();
  const now = Date.now();
  const [u] = await server.db('users').insert({ email: `${role}.std@harrowfinch.example`, name, password_hash: 'not-used', created_at: now }).returning<{ id: number }[]>('id');
  await server.db('memberships').insert({ shop_id: shop.id, user_id: u!.id, role, created_at: now });
  const id = randomBytes(20).toString('hex');
  await server.db('sessions').insert({ id, user_id: u!.id, shop_id: shop.id, expires_at: now + 3_600_000, created_at: now });
  return id;
}

describe('shop standards and every piece in the editor', () => {
  let server: Server;
  let browser: TestBrowser;
  let page: Page;
  let makerBrowser: TestBrowser;
  let maker: Page;
  let collarUrl = '';

  beforeAll(async () => {
    await ensureClientBuilt();
    server = await startTestServer();
    browser = await launchBrowser({ width: 1280, height: 800 });
    page = await browser.context.newPage();
    await signUpInBrowser(page, server.url, owner);
  }, 180_000);

  afterAll(async () => {
    await makerBrowser?.close();
    await browser?.close();
    await server?.close();
  });

  it('when the owner opens Shop, Standards, then the collar standard shows the built-in allowance of 8 in and the starter hardware', async () => {
    await page.getByRole('link', { name: 'Shop' }).click();
    await page.getByRole('link', { name: 'Standards' }).click();
    await page.getByRole('heading', { name: 'Shop standards' }).waitFor();
    // The built-in collar rule: blank = neck + 8 in (common practice, shared/pattern/presets/collar.ts).
    await expect.poll(() => page.getByLabel('Allowance').inputValue()).toBe('8');
    await page.getByText('The built-in standards: nobody has changed them yet.').waitFor();
    expect(await page.getByTestId('hardware-row').count()).toBeGreaterThan(3);
    await snap(page, 'standards-01-owner-built-in');
  });

  it('when the owner types an ease over the limit, then the field says so in inches and nothing is saved', async () => {
    await page.getByLabel('Ease').fill('20');
    // EASE_MAX_MM = 300 (shared/schemas/strap-spec-limits.ts) is 11 13/16 in to the nearest 1/32 in.
    await page.getByText('Ease must be at most 11 13/16 in').waitFor();
    await page.getByRole('button', { name: 'Save standards' }).click();
    await page.getByText(/Nothing was saved: check the collar standard/).waitFor();
    await snap(page, 'standards-02-ease-refused');
  });

  it('when the owner sets allowance 9 1/4 in, ease 1/2 in and a brass buckle added to the list, then the standards save', async () => {
    await page.getByLabel('Ease').fill('1/2');
    await page.getByLabel('Allowance').fill('9 1/4');
    await page.getByRole('button', { name: 'Add hardware' }).click();
    const row = page.getByTestId('hardware-row').last();
    await row.getByLabel('Name').fill('Solid brass buckle, 1 in');
    await row.getByLabel('Unit cost').fill('4.50');
    await page.getByTestId('kind-standard-collar').getByLabel('Buckle', { exact: true }).selectOption({ label: 'Solid brass buckle, 1 in' });
    await page.getByRole('button', { name: 'Save standards' }).click();
    await page.getByText('Saved. New patterns start from these standards.').waitFor();
    await page.getByText(/Last changed .* by Maren Finch\./).waitFor();
    await snap(page, 'standards-03-saved');
  });

  it('when the owner starts a new collar, then it opens from the standard: allowance 9 1/4 in, blank 22 1/4 in, no changes and no warning (the middle hole closes on neck + ease)', async () => {
    await page.goto(server.url + '/patterns/new?kind=collar');
    await page.getByLabel('Pattern name').fill('Collar for Pepper');
    await page.getByRole('button', { name: 'Create pattern' }).click();
    await page.getByRole('heading', { name: 'Collar for Pepper' }).waitFor();
    collarUrl = page.url();
    await expect.poll(() => page.getByLabel('Rule allowance').inputValue()).toBe('9 1/4');
    await expect.poll(() => page.getByLabel('Ease').inputValue()).toBe('1/2');
    // Blank = neck + allowance (the shop's rule): 13 in + 9 1/4 in.
    await expect.poll(() => blankText(page)).toBe('22 1/4 in');
    await page.getByText('No changes yet.').waitFor();
    const warnings = await page.locator('[data-testid="layout-warnings"] li').evaluateAll((li) => li.map((l) => l.getAttribute('data-code')));
    await snap(page, 'standards-04-new-collar');
    expect(warnings).toEqual([]);
  });

  it('when a maker adds a keeper, a stitch row and a taper point, then the preview draws each', async () => {
    makerBrowser = await launchBrowser({ width: 1280, height: 800 });
    await makerBrowser.context.addCookies([{ name: 'latchet_session', value: await addMember(server, 'maker', 'Tobias Harrow'), url: server.url }]);
    maker = await makerBrowser.context.newPage();
    await maker.goto(collarUrl);
    await maker.getByTestId('drawing-preview').locator('svg').waitFor();
    const before = await previewOf(maker, 'strap');

    await maker.getByRole('button', { name: 'Add a keeper' }).click();
    await expect.poll(async () => (await previewOf(maker, 'keeper')).hasPiece).toBe(true);

    const strap = maker.getByTestId('piece-strap');
    await strap.locator('summary').click();
    await strap.getByRole('button', { name: 'Add a stitch row' }).click();
    await expect.poll(async () => (await previewOf(maker, 'strap')).punchMarks).toBeGreaterThan(before.punchMarks + 20);

    await strap.getByRole('button', { name: 'Add a taper point' }).click();
    await expect.poll(async () => (await previewOf(maker, 'strap')).outline).not.toBe(before.outline);
    await snap(maker, 'standards-05-maker-pieces');

    await maker.getByLabel('Note for this revision').fill('Keeper, stitched edges, narrower at the tip.');
    await maker.getByRole('button', { name: 'Save revision 2' }).click();
    await maker.getByText('Saved as revision 2.').waitFor();
  });

  it('when the maker prints revision 2, then the PDF draws the keeper as its own piece, the stitching, and the taper (the drawing differs from the same strap untapered)', async () => {
    const id = Number(/patterns\/(\d+)/.exec(collarUrl)![1]);
    const res = await maker.request.get(`${server.url}/api/patterns/${id}/revisions/2/pdf?paper=letter`);
    expect(res.status()).toBe(200);
    mkdirSync(OUT, { recursive: true });
    const file = `${OUT}standards-06-keeper-stitch-taper.pdf`;
    writeFileSync(file, await res.body());
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
    expect(text).toMatch(/Keeper/);
    expect(text).toMatch(/Keeper: .* blank/);
    // The stitch row is listed with its iron and thread (4 x seam, common practice).
    expect(text).toMatch(/Stitching: \d+ rows?, \d+ holes/);
    execFileSync('pdftoppm', ['-png', '-r', '40', '-f', '1', '-l', '3', file, `${OUT}standards-06-page`]);

    // The same revision without its taper, saved as revision 3: the drawings above the title
    // blocks must differ, or the PDF ignored the taper.
    const head = await maker.request.get(`${server.url}/api/patterns/${id}`);
    const { spec } = (await head.json()).head as { spec: { pieces: Array<{ role: string; taper: unknown[] }> } };
    for (const p of spec.pieces) if (p.role === 'strap') p.taper = [];
    const saved = await maker.request.post(`${server.url}/api/patterns/${id}/revisions`, { headers: { 'If-Match': head.headers().etag!, Origin: server.url }, data: { spec, note: 'Without the taper' } });
    expect(saved.status()).toBe(201);
    const plain = await maker.request.get(`${server.url}/api/patterns/${id}/revisions/3/pdf?paper=letter`);
    const plainFile = `${OUT}standards-06-without-taper.pdf`;
    writeFileSync(plainFile, await plain.body());
    expect(await drawingPixels(file)).not.toEqual(await drawingPixels(plainFile));
  });

  it('when each role opens the standards at desktop, tablet and phone width, then the page fits and only the owner can save', async () => {
    const apprenticeBrowser = await launchBrowser({ width: 1280, height: 800 });
    await apprenticeBrowser.context.addCookies([{ name: 'latchet_session', value: await addMember(server, 'apprentice', 'Ilse Park'), url: server.url }]);
    const apprentice = await apprenticeBrowser.context.newPage();
    try {
      for (const [role, p] of [['owner', page], ['maker', maker], ['apprentice', apprentice]] as const) {
        for (const size of SIZES) {
          await p.setViewportSize({ width: size.width, height: size.height });
          await p.goto(server.url + '/shop/standards');
          await p.getByRole('heading', { name: 'Shop standards' }).waitFor();
          expect(await p.getByRole('button', { name: 'Save standards' }).count()).toBe(role === 'owner' ? 1 : 0);
          const overflow = await p.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
          await snap(p, `standards-07-${role}-${size.name}`);
          expect(overflow).toBeLessThanOrEqual(0);
        }
      }
      await maker.setViewportSize({ width: 390, height: 844 });
      await maker.goto(collarUrl);
      await maker.getByTestId('piece-keeper').locator('summary').click();
      await snap(maker, 'standards-08-maker-editor-phone');
    } finally {
      await apprenticeBrowser.close();
    }
  });
});
