// Screenshots land in test-output/e2e/ (git-ignored) so a person can look at every screen.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Locator, Page } from 'playwright-core';

const outDir = fileURLToPath(new URL('../../../test-output/e2e/', import.meta.url));

/** Saves a full-page PNG named `name.png` and returns its path. */
export async function snap(page: Page, name: string): Promise<string> {
  mkdirSync(outDir, { recursive: true });
  const path = join(outDir, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** Saves a PNG of one element (e.g. the drawing preview) named `name.png`. */
export async function snapElement(locator: Locator, name: string): Promise<string> {
  mkdirSync(outDir, { recursive: true });
  const path = join(outDir, `${name}.png`);
  await locator.screenshot({ path });
  return path;
}
