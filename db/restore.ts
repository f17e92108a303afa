// `npm run db:restore -- BACKUP_FILE`: with the server STOPPED, puts a backup in place of
// DATABASE_FILE after checking it (integrity_check); the replaced file is kept beside it as
// <name>.before-restore-<time>. Start the server again afterwards (it migrates if needed).
import { restoreDatabase } from '../server/db/backup.ts';

const databaseFile = process.env.DATABASE_FILE || 'data/latchet.sqlite3';
const backupFile = process.argv[2];
if (!backupFile) {
  console.error('usage: npm run db:restore -- BACKUP_FILE   (stop the server first)');
  process.exit(2);
}
try {
  const keptAs = restoreDatabase(backupFile, databaseFile);
  console.log(`restored ${backupFile} to ${databaseFile}${keptAs ? `; the previous file is kept as ${keptAs}` : ''}`);
} catch (err) {
  console.error(`restore failed: ${(err as Error).message}`);
  process.exit(1);
}
