// `npm run restore <file>`: replaces the database with a dump from `npm run backup`. The current
// contents are dumped first (named ...-before-restore), so a wrong file can be undone.
import { backupDatabase, backupTarget, restoreDatabase } from './lib/backup.mjs';
import { log } from './lib/run.mjs';

const file = process.argv[2];
if (!file) {
  process.stderr.write('usage: npm run restore <file>\n');
  process.exit(2);
}
const target = backupTarget();
try {
  try {
    log(`current contents saved to ${await backupDatabase(target, '-before-restore')}`);
  } catch (err) {
    // A database that is not there yet has nothing to save.
    if (!/Unknown database/.test(String(err))) throw err;
  }
  await restoreDatabase(target, file);
  log(`${target.database} restored from ${file}`);
} catch (err) {
  process.stderr.write(`[conestack] restore failed: ${err instanceof Error ? err.message : err}\n`);
  process.exit(1);
}
