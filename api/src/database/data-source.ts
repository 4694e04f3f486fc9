import 'reflect-metadata';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import type Database from 'better-sqlite3';
import { DataSource, type DataSourceOptions } from 'typeorm';
import { entities } from './entities.js';
import { migrations } from './migrations/index.js';
import { SqliteSerializer } from './sqlite-serializer.js';

export const BUSY_TIMEOUT_MS = 5000;

/** Connection pragmas: WAL for concurrent readers, FULL sync because the ledger holds money. */
export function prepareSqlite(db: Database.Database): void {
  db.pragma('journal_mode = WAL');
  db.pragma('synchronous = FULL');
  db.pragma('foreign_keys = ON');
  db.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
}

export function resolveDatabasePath(path: string): string {
  if (path === ':memory:') return path;
  const absolute = resolve(process.cwd(), path);
  mkdirSync(dirname(absolute), { recursive: true });
  return absolute;
}

export function dataSourceOptions(databasePath: string): DataSourceOptions {
  return {
    type: 'better-sqlite3',
    database: resolveDatabasePath(databasePath),
    entities,
    migrations,
    migrationsRun: false,
    migrationsTransactionMode: 'each',
    synchronize: false,
    prepareDatabase: prepareSqlite,
    logging: false,
  };
}

/**
 * Opens the database, applies pending migrations, and installs the connection lock.
 * Used by the app module, the CLI scripts (migrate, seed) and the tests, so all of them
 * run the same way.
 */
export async function openDataSource(
  databasePath: string,
  serializer = new SqliteSerializer(),
): Promise<DataSource> {
  const dataSource = await new DataSource(dataSourceOptions(databasePath)).initialize();
  await dataSource.runMigrations({ transaction: 'each' });
  serializer.install(dataSource);
  return dataSource;
}
