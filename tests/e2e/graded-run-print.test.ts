// End-to-end: a collar run whose sizes grade their width is printed from the pattern page as
// a print job, and every sheet of the downloaded PDF names the sizes drawn on it (pdftotext).
import { execFileSync } from 'node:child_process';
import { copyFileSync, mkdirSync, readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { PDFDocument } from 'pdf-lib';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { startTestServer } from '../helpers/test-server.ts';
import { ensureClientBuilt } from './support/build-client.ts';
import { createPatternViaApi, signUpInBrowser } from './support/shop-session.ts';
import { launchBrowser, type TestBrowser } from './support/browser.ts';
import { snap } from './support/screenshots.ts';

const IN = 25.4; // mm per inch, exact (International Yard and Pound Agreement, 1959)
type Server = Awaited<ReturnType<typeof startTestServer>>;
const maker = { name: 'Tobias Harrow', shopName: 'Harrow & Finch Leatherworks', email: 'tobias.graded@harrowfinch.example', password: 'bridle butt and edge kote' };

// Five collar sizes 2 in apart (common practice for a graded dog-collar run), narrower for
// small necks and wider for large ones, as a shop grades them.
const RUN: StrapSpec['sizes'] = [
  { name: 'XS', girthMm: 10 * IN, widthMm: 0.75 * IN, holes: { count: 3, spacingMm: 0.5 * IN } },
  { name: 'S', girthMm: 12 * IN, widthMm: 0.875 * IN },
  { name: 'M', girthMm: 14 * IN },
  { name: 'L', girthMm: 16 * IN, widthMm: 1.25 * IN },
  { name: 'XL', girthMm: 18 * IN, widthMm: 1.5 * IN, hardware: { buckleInsideWidthMm: 1.5 * IN } },
];

describe('a graded size run printed from the browser', () => {
  let server: Server;
  let browser: TestBrowser;
  let page: Page;

  beforeAll(async () => {
    await ensureClientBuilt();
    server = await startTestServer();
    browser = await launchBrowser({ width: 1280, height: 800 });
    page = await browser.context.newPage();
    await signUpInBrowser(page, server.url, maker);
  }, 180_000);
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('when a five-size collar run with graded widths prints as a job, then each sheet is titled with its own sizes and every size is on some sheet', async () => {
    const id = await createPatternViaApi(page, server.url, { name: 'Graded collar run', kind: 'collar', spec: { ...presetSpec('collar'), sizes: RUN }, note: 'Widths graded by size.' });
    await page.goto(`${server.url}/patterns/${id}`);
    await page.getByTestId('drawing-preview').locator('svg').waitFor();
    const [download] = await Promise.all([page.waitForEvent('download', { timeout: 120_000 }), page.getByRole('link', { name: 'Template PDF, all 5 sizes' }).click()]);
    await page.getByTestId('print-saved').waitFor();
    await snap(page, 'graded-run-01-printed');
    mkdirSync('test-output/e2e', { recursive: true });
    const path = 'test-output/e2e/graded-run.pdf'; // kept to be looked at
    copyFileSync(await download.path(), path);
    const pages = (await PDFDocument.load(readFileSync(path))).getPageCount();
    expect(pages).toBeGreaterThan(1);

    const named = new Set<string>();
    for (let n = 1; n <= pages; n++) {
      const text = execFileSync('pdftotext', ['-layout', '-f', String(n), '-l', String(n), path, '-'], { encoding: 'utf8' });
      const drawn = RUN.filter((z) => new RegExp(`Collar, size ${z.name}\\b`).test(text)).map((z) => z.name);
      if (drawn.length === 0) continue; // a job sheet page carries no strap
      const row = /size\s+([A-Z, ]+?)(?:\s{2,}|$)/m.exec(text);
      expect(row, `page ${n} names its sizes in the title block:\n${text}`).not.toBeNull();
      expect(row![1]!.split(',').map((s) => s.trim()), `page ${n}`).toEqual(drawn);
      drawn.forEach((z) => named.add(z));
    }
    expect([...named].sort()).toEqual(RUN.map((z) => z.name).sort());
  }, 180_000);
});
