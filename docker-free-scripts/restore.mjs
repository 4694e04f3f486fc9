// `npm run restore -- <backup file>`: puts a backup in place of the database.
// Stop the API first (Ctrl-C the demo). The replaced file is kept beside it as
// `<name>.before-restore-<timestamp>`.
import { resolve } from 'node:path';
import { restoreDatabase } from './lib/backup.mjs';
import { systemConfig } from './lib/system.mjs';

const backup = process.argv[2];
if (!backup) {
  console.error('Usage: npm run restore -- <backup file>   (stop the API first)');
  process.exit(2);
}
const { databasePath } = systemConfig();
try {
  const result = await restoreDatabase(resolve(backup), databasePath);
  console.log(`Restored ${resolve(backup)}\n      to ${result.target}`);
  if (result.previous) console.log(`  the replaced database is kept at ${result.previous}`);
  console.log(
    `  rows: ${Object.entries(result.tables)
      .map(([t, n]) => `${t} ${n}`)
      .join(', ')}`,
  );
  console.log(
    'Start the API again (npm run demo); it checks the database and applies any newer migrations.',
  );
} catch (error) {
  console.error(
    `Restore failed, nothing was changed: ${error instanceof Error ? error.message : error}`,
  );
  process.exit(1);
}
