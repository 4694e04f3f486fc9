// `npm run backup [-- <destination>]`: an online backup of the database while the API runs.
// Default destination: data/backups/nappe-<timestamp>.sqlite next to the database.
import { mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { backupDatabase } from './lib/backup.mjs';
import { systemConfig } from './lib/system.mjs';

const { databasePath } = systemConfig();
const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const destination = resolve(
  process.argv[2] ?? join(dirname(databasePath), 'backups', `nappe-${stamp}.sqlite`),
);
mkdirSync(dirname(destination), { recursive: true });

try {
  const result = await backupDatabase(databasePath, destination);
  const rows = Object.entries(result.tables)
    .map(([t, n]) => `${t} ${n}`)
    .join(', ');
  console.log(
    `Backed up ${databasePath}\n      to ${result.path}\n  ${(result.bytes / 1024).toFixed(0)} KiB in ${result.durationMs.toFixed(0)} ms; integrity ok\n  rows: ${rows}`,
  );
} catch (error) {
  console.error(`Backup failed: ${error instanceof Error ? error.message : error}`);
  process.exit(1);
}
