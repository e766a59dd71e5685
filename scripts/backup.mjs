// `npm run backup`: a consistent, compressed dump of `npm start`'s database into backups/; prints its path.
// CONESTACK_DB_INSTANCE, DB_NAME and BACKUP_DIR choose another instance, database or folder.
import { backupDatabase, backupTarget } from './lib/backup.mjs';

try {
  process.stdout.write(`${await backupDatabase(backupTarget())}\n`);
} catch (err) {
  process.stderr.write(`[conestack] backup failed: ${err instanceof Error ? err.message : err}\n`);
  process.exit(1);
}
