// Makes sure dist/client holds a build of the current src/ and shared/ before a browser
// test loads it. Builds at most once per change: a build newer than every source file is
// reused, and a lock directory keeps two test forks from building at the same time.
import { execFile } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, rmSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { fileURLToPath } from 'node:url';

const run = promisify(execFile);
const repo = fileURLToPath(new URL('../../../', import.meta.url));
const builtIndex = join(repo, 'dist/client/index.html');
const lockDir = join(repo, 'dist/.client-build.lock');
const sourceRoots = ['src', 'shared', 'vite.config.ts', 'package-lock.json'];
const LOCK_STALE_MS = 5 * 60_000;

function newestMtimeMs(path: string): number {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const entry of readdirSync(path)) {
    if (entry === 'node_modules' || entry.startsWith('.')) continue;
    newest = Math.max(newest, newestMtimeMs(join(path, entry)));
  }
  return newest;
}

function isFresh(): boolean {
  if (!existsSync(builtIndex)) return false;
  const sources = Math.max(...sourceRoots.map((p) => newestMtimeMs(join(repo, p))));
  return statSync(builtIndex).mtimeMs >= sources;
}

function tryLock(): boolean {
  mkdirSync(join(repo, 'dist'), { recursive: true });
  try {
    mkdirSync(lockDir);
    return true;
  } catch {
    // A lock left by a killed run would block forever; one older than any build is abandoned.
    if (Date.now() - statSync(lockDir).mtimeMs > LOCK_STALE_MS) rmSync(lockDir, { recursive: true, force: true });
    return false;
  }
}

/** Builds the client into dist/client unless a build of the current sources is there. */
export async function ensureClientBuilt(): Promise<void> {
  for (;;) {
    if (isFresh()) return;
    if (tryLock()) break;
    await new Promise((r) => setTimeout(r, 500));
  }
  try {
    if (isFresh()) return;
    await run(process.execPath, [join(repo, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn'], {
      cwd: repo,
      maxBuffer: 16 * 1024 * 1024,
    });
  } finally {
    rmSync(lockDir, { recursive: true, force: true });
  }
}
