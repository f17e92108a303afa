// `npm run db:backup [-- FILE]`: an online copy of the SQLite database named by DATABASE_FILE
// while the server keeps serving (server/db/backup.ts); default FILE is
// <database folder>/backups/latchet-<UTC time>.sqlite3. Exit code 1 when the copy fails its check.
import { backupDatabase, defaultBackupPath } from '../server/db/backup.ts';

const databaseFile = process.env.DATABASE_FILE || 'data/latchet.sqlite3';
if (process.env.DATABASE_URL) {
  console.error('DATABASE_URL is set: the data lives in PostgreSQL; back it up with pg_dump (see README, Backup).');
  process.exit(2);
}
const destination = process.argv[2] ?? defaultBackupPath(databaseFile);
try {
  const r = await backupDatabase(databaseFile, destination);
  console.log(`backup of ${databaseFile} written to ${r.file} (${r.pages} pages, ${Math.round(r.bytes / 1024)} KiB); integrity_check: ${r.integrity}`);
} catch (err) {
  console.error(`backup failed: ${(err as Error).message}`);
  process.exit(1);
}
