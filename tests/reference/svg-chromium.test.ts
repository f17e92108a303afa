// Byte identity of the SVG between Node (svg.js over svgdom) and a real browser DOM
// (Debian Chromium via playwright-core): the same shared/ code bundled with esbuild runs in
// the page over window/document.
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { computeLayout, drawLayout, presetSpec, PRESET_NAMES } from '@shared/pattern/index.ts';
import { renderSvg } from '@shared/render/svg.ts';
import { svgdomDom } from '../../server/render/svgdom-window.ts';
import { launchBrowser, type TestBrowser } from '../e2e/support/browser.ts';

const repo = fileURLToPath(new URL('../../', import.meta.url));
let browser: TestBrowser;
let bundle: string;

beforeAll(async () => {
  const out = await build({
    stdin: {
      contents: `import { computeLayout, drawLayout, presetSpec } from './shared/pattern/index.ts';
        import { renderSvg } from './shared/render/svg.ts';
        globalThis.latchetSvg = (name) => { const s = presetSpec(name); return renderSvg(drawLayout(computeLayout(s), s), { window, document }); };`,
      resolveDir: repo,
      loader: 'ts',
    },
    bundle: true,
    format: 'iife',
    write: false,
    define: { global: 'globalThis' },
    alias: { '@shared': `${repo}shared` },
    logLevel: 'silent',
  });
  bundle = out.outputFiles[0]!.text;
  browser = await launchBrowser();
}, 60_000);
afterAll(async () => browser?.close());

describe('SVG in Chromium', () => {
  it('when each preset is rendered over Chromium DOM, then the bytes equal the svgdom output in Node', async () => {
    const page = await browser.context.newPage();
    await page.setContent('<!doctype html><html><body></body></html>');
    await page.addScriptTag({ content: bundle });
    for (const name of PRESET_NAMES) {
      const inBrowser = await page.evaluate((n) => (globalThis as unknown as { latchetSvg(n: string): string }).latchetSvg(n), name);
      const s = presetSpec(name);
      expect(inBrowser, name).toBe(renderSvg(drawLayout(computeLayout(s), s), svgdomDom()));
    }
    await page.close();
  });
});
