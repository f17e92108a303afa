// A write that failed because the disk (or the database's size cap) is full: the person is
// told in words that nothing was saved and why, with 507 Insufficient Storage (RFC 4918,
// 11.5), instead of a bare 500. The operator still gets the error in the log.
import { HttpError } from './http-error.ts';

/** SQLite's SQLITE_FULL (better-sqlite3 `code`), the OS's ENOSPC, PostgreSQL's 53100 disk_full. */
const FULL_CODES = new Set(['SQLITE_FULL', 'ENOSPC', '53100']);

export function storageFullError(err: unknown): HttpError | null {
  const code = err && typeof err === 'object' ? (err as { code?: unknown }).code : undefined;
  if (typeof code !== 'string' || !FULL_CODES.has(code)) return null;
  return new HttpError(507, 'storage_full', 'The server has run out of storage space, so this change was not saved. Everything saved before is safe; keep this page open and try again once the shop has freed space on the server.');
}
