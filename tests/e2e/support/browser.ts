// Debian's Chromium driven by playwright-core (Playwright never downloads a browser here),
// each test file in its own fresh profile so no cookie or cache leaks between runs.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';
import { vi } from 'vitest';

// expect.poll gives up after 1 s by default; on a loaded 2-core machine a redraw can take
// longer. The bound only guards against hangs, so every E2E file polls for up to 30 s.
vi.setConfig({ expect: { poll: { timeout: 30_000 } } });

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
  // Waits (locators, downloads, navigation) only guard against hangs: 60 s, not Playwright's
  // 30 s, so a machine busy with other suites does not fail a correct page.
  context.setDefaultTimeout(60_000);
  return {
    context,
    async close() {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}
