// A database on a disk that can be made full on purpose: a small tmpfs mounted for the test
// (needs root, as in CI and the dev container), or SQLite's `PRAGMA max_page_count` capped at
// the file's current size (the same SQLITE_FULL error without the operating system's part;
// runs anywhere).
import { execFileSync } from 'node:child_process';
import { closeSync, mkdirSync, mkdtempSync, openSync, rmSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Knex } from 'knex';

export interface SmallDisk {
  kind: 'tmpfs' | 'max_page_count';
  /** Folder for the database file. */
  dir: string;
  /** Leaves no free space (tmpfs: a filler file; otherwise: cap the page count). */
  fill(db: Knex): Promise<void>;
  /** Gives the space back. */
  free(db: Knex): Promise<void>;
  remove(): void;
}

function tryMount(dir: string, sizeBytes: number): boolean {
  try {
    execFileSync('mount', ['-t', 'tmpfs', '-o', `size=${sizeBytes}`, 'tmpfs', dir], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

/** Writes `chunk`-sized blocks to `fd` until the disk answers ENOSPC. */
function writeUntilFull(fd: number, chunkBytes: number): void {
  const chunk = Buffer.alloc(chunkBytes, 0x2a);
  for (;;) {
    try {
      writeSync(fd, chunk);
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOSPC') return;
      throw err;
    }
  }
}

/** Whether this process may mount a tmpfs (tried once on a scratch folder). */
export function canMountTmpfs(): boolean {
  const probe = mkdtempSync(join(tmpdir(), 'latchet-mount-probe-'));
  try {
    if (!tryMount(probe, 1024 * 1024)) return false;
    execFileSync('umount', [probe]);
    return true;
  } finally {
    rmSync(probe, { recursive: true, force: true });
  }
}

/** A folder on a `sizeBytes` tmpfs, or an ordinary temp folder with the page cap. */
export function smallDisk(kind: SmallDisk['kind'], sizeBytes = 8 * 1024 * 1024): SmallDisk {
  const root = mkdtempSync(join(tmpdir(), 'latchet-disk-'));
  const mounted = kind === 'tmpfs' && tryMount(root, sizeBytes);
  if (kind === 'tmpfs' && !mounted) throw new Error('cannot mount a tmpfs here');
  const dir = join(root, 'data');
  mkdirSync(dir);
  const filler = join(root, 'filler.bin');
  if (mounted) {
    return {
      kind: 'tmpfs',
      dir,
      async fill(db) {
        // An empty WAL must grow for the next commit, so that commit meets the full disk.
        await db.raw('PRAGMA wal_checkpoint(TRUNCATE)');
        const fd = openSync(filler, 'w');
        try {
          writeUntilFull(fd, 64 * 1024);
          writeUntilFull(fd, 512);
        } finally {
          closeSync(fd);
        }
      },
      async free() {
        rmSync(filler, { force: true });
      },
      remove() {
        execFileSync('umount', [root]);
        rmSync(root, { recursive: true, force: true });
      },
    };
  }
  return {
    kind: 'max_page_count',
    dir,
    async fill(db) {
      await db.raw('PRAGMA wal_checkpoint(TRUNCATE)');
      const [{ page_count }] = (await db.raw('PRAGMA page_count')) as [{ page_count: number }];
      await db.raw(`PRAGMA max_page_count = ${page_count}`);
    },
    async free(db) {
      await db.raw('PRAGMA max_page_count = 1073741823');
    },
    remove() {
      rmSync(root, { recursive: true, force: true });
    },
  };
}
