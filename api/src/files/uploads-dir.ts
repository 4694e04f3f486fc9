import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { resolveDatabasePath } from '../database/data-source.js';

/**
 * Uploaded and generated photos live beside the database, in `<database folder>/uploads`, so one
 * data directory holds everything a backup needs. An in-memory database (tests) gets a folder in
 * the system's temporary directory.
 */
export function uploadsDirFor(databasePath: string): string {
  if (databasePath === ':memory:') return join(tmpdir(), `nappe-uploads-${process.pid}`);
  return join(dirname(resolveDatabasePath(databasePath)), 'uploads');
}
