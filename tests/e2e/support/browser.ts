// Debian's Chromium driven by playwright-core (Playwright never downloads a browser here),
// each test file in its own fresh profile so no cookie or cache leaks between runs.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

export const CHROMIUM_PATH = '/usr/bin/chromium';

const ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
  '--disable-dev-shm-usage',
];

export interface TestBrowser {
  context: BrowserContext;
  close(): Promise<void>;
}

/** A headless Chromium with a fresh profile; `close()` also removes the profile. */
export async function launchBrowser(viewport = { width: 1360, height: 900 }): Promise<TestBrowser> {
  const userDataDir = mkdtempSync(join(tmpdir(), 'latchet-e2e-'));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: ARGS,
    viewport,
    acceptDownloads: true,
  });
  return {
    context,
    async close() {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}
