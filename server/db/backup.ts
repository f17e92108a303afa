// Copies of the SQLite file while the server runs, and putting one back.
//
// The copy uses SQLite's online backup API through better-sqlite3 (`db.backup`): pages are
// copied from a consistent snapshot while the server keeps reading and writing (WAL mode), so
// nobody has to stop. A plain `cp` of a live WAL database can tear (the -wal file holds the
// newest commits). Every copy is checked with PRAGMA integrity_check before it is reported.
import { copyFileSync, existsSync, mkdirSync, renameSync, rmSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import Database from 'better-sqlite3';

/** `latchet-20261203-121500.sqlite3` beside the database, in a `backups` folder. */
export function defaultBackupPath(databaseFile: string, now = new Date()): string {
  const stamp = now.toISOString().replace(/[-:]/g, '').replace('T', '-').slice(0, 15);
  return join(dirname(resolve(databaseFile)), 'backups', `latchet-${stamp}.sqlite3`);
}

/** PRAGMA integrity_check of `file`: 'ok' or the problems SQLite lists. */
export function integrityOf(file: string): string {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    return (db.pragma('integrity_check') as { integrity_check: string }[]).map((r) => r.integrity_check).join('; ');
  } finally {
    db.close();
  }
}

export interface BackupResult {
  file: string;
  bytes: number;
  pages: number;
  integrity: string;
}

/** Copies the live database `databaseFile` to `destination` and checks the copy. */
export async function backupDatabase(databaseFile: string, destination: string): Promise<BackupResult> {
  if (!existsSync(databaseFile)) throw new Error(`no database at ${databaseFile}`);
  if (existsSync(destination)) throw new Error(`${destination} exists already; a backup never overwrites a file`);
  mkdirSync(dirname(resolve(destination)), { recursive: true });
  const source = new Database(databaseFile, { fileMustExist: true });
  let pages = 0;
  try {
    // Wait for the server's write lock as long as the server itself would (pragmas.ts).
    source.pragma('busy_timeout = 5000');
    await source.backup(destination, {
      progress: ({ totalPages }) => {
        pages = totalPages;
        // Copy in one step: a write by the server between steps would restart the copy.
        return totalPages;
      },
    });
  } finally {
    source.close();
  }
  const integrity = integrityOf(destination);
  if (integrity !== 'ok') throw new Error(`the copy ${destination} failed integrity_check: ${integrity}`);
  return { file: destination, bytes: statSync(destination).size, pages, integrity };
}

/**
 * Puts the backup `backupFile` in place of `databaseFile` (the server must be stopped). The
 * file it replaces is kept beside it as `<name>.before-restore-<stamp>`; returns that path.
 */
export function restoreDatabase(backupFile: string, databaseFile: string, now = new Date()): string | null {
  const integrity = integrityOf(backupFile);
  if (integrity !== 'ok') throw new Error(`${backupFile} failed integrity_check (${integrity}); nothing was changed`);
  const target = resolve(databaseFile);
  mkdirSync(dirname(target), { recursive: true });
  let keptAs: string | null = null;
  if (existsSync(target)) {
    keptAs = `${target}.before-restore-${now.toISOString().replace(/[-:.]/g, '').slice(0, 15)}`;
    // The old file with its WAL, so the set moved aside is whole too.
    renameSync(target, keptAs);
    for (const suffix of ['-wal', '-shm']) if (existsSync(target + suffix)) renameSync(target + suffix, keptAs + suffix);
  }
  for (const suffix of ['-wal', '-shm']) rmSync(target + suffix, { force: true });
  copyFileSync(backupFile, target);
  return keptAs;
}
