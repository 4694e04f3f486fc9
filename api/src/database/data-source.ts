import 'reflect-metadata';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import type Database from 'better-sqlite3';
import { DataSource, type DataSourceOptions } from 'typeorm';
import type { Env } from '../config/env.js';
import { entities } from './entities.js';
import { migrations } from './migrations/index.js';
import { postgresMigrations } from './migrations/postgres/index.js';
import { SCHEMA_DB_TYPE } from './portable-schema.js';
import { SqliteSerializer } from './sqlite-serializer.js';

export const BUSY_TIMEOUT_MS = 5000;

/** Connections per API process on PostgreSQL (node-postgres pool). */
export const POSTGRES_POOL_SIZE = 10;

/**
 * Where the data lives: a SQLite file (the embedded default) or a PostgreSQL server. Uploaded
 * photos are files in `<folder of DATABASE_PATH>/uploads` either way (uploads-dir.ts): on
 * PostgreSQL, `dataPath` is that DATABASE_PATH, used for its folder only.
 */
export type DatabaseTarget =
  { type: 'sqlite'; path: string } | { type: 'postgres'; url: string; dataPath: string };

export function databaseTarget(
  env: Pick<Env, 'DB_TYPE' | 'DATABASE_PATH' | 'DATABASE_URL'>,
): DatabaseTarget {
  return env.DB_TYPE === 'postgres'
    ? { type: 'postgres', url: env.DATABASE_URL ?? '', dataPath: env.DATABASE_PATH }
    : { type: 'sqlite', path: env.DATABASE_PATH };
}

/** The DATABASE_PATH a PostgreSQL data source was opened with, by its options object. */
const dataPaths = new WeakMap<DataSourceOptions, string>();

/**
 * The DATABASE_PATH behind a data source: the SQLite file itself, or on PostgreSQL the path its
 * target named (whose folder holds the uploads). The seed puts its photos where the app serves them.
 */
export function dataPathOf(dataSource: DataSource): string {
  if (dataSource.options.type === 'better-sqlite3') return String(dataSource.options.database);
  const path = dataPaths.get(dataSource.options);
  if (path === undefined) throw new Error('This data source was not opened by dataSourceOptions()');
  return path;
}

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

/** A SQLite path (the long-standing form) or a target. */
const toTarget = (target: string | DatabaseTarget): DatabaseTarget =>
  typeof target === 'string' ? { type: 'sqlite', path: target } : target;

export function dataSourceOptions(target: string | DatabaseTarget): DataSourceOptions {
  const t = toTarget(target);
  if (t.type !== SCHEMA_DB_TYPE) {
    // The entities' column types were fixed when they were imported (portable-schema.ts).
    throw new Error(
      `The entities were loaded for ${SCHEMA_DB_TYPE}, not ${t.type}: set DB_TYPE=${t.type} in the environment before the API starts.`,
    );
  }
  const common = {
    entities,
    migrationsRun: false,
    migrationsTransactionMode: 'each',
    synchronize: false,
    logging: false,
  } as const;
  if (t.type === 'postgres') {
    const options: DataSourceOptions = {
      ...common,
      type: 'postgres',
      url: t.url,
      migrations: postgresMigrations,
      applicationName: 'nappe-api',
      poolSize: POSTGRES_POOL_SIZE,
    };
    dataPaths.set(options, t.dataPath);
    return options;
  }
  return {
    ...common,
    type: 'better-sqlite3',
    database: resolveDatabasePath(t.path),
    migrations,
    prepareDatabase: prepareSqlite,
  };
}

/** Any fixed 64-bit number: the session lock that lets one process at a time run migrations. */
const MIGRATION_LOCK_KEY = 7_206_114_531_001;

/**
 * Applies pending migrations. On PostgreSQL several API processes may start at once on the same
 * database: a session-level advisory lock (PostgreSQL docs, 9.27.10) lets one of them migrate
 * while the others wait, then find nothing left to do. SQLite has one process per file.
 */
export async function runMigrations(dataSource: DataSource): Promise<void> {
  if (dataSource.options.type !== 'postgres') {
    await dataSource.runMigrations({ transaction: 'each' });
    return;
  }
  const holder = dataSource.createQueryRunner();
  try {
    await holder.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
    try {
      await dataSource.runMigrations({ transaction: 'each' });
    } finally {
      await holder.query('SELECT pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]);
    }
  } finally {
    await holder.release();
  }
}

/**
 * Opens the database, applies pending migrations, and on SQLite installs the connection lock
 * (TypeORM shares one SQLite connection; see sqlite-serializer.ts). PostgreSQL gets a pool and
 * real concurrency instead: the writes that must not interleave take the locks of
 * `serialized-writes.ts`. Used by the app module, the CLI scripts (migrate, seed) and the tests,
 * so all of them run the same way.
 */
export async function openDataSource(
  target: string | DatabaseTarget,
  serializer = new SqliteSerializer(),
): Promise<DataSource> {
  return prepareDataSource(new DataSource(dataSourceOptions(target)), serializer);
}

/** The same as `openDataSource`, for a data source built from options elsewhere (Nest). */
export async function prepareDataSource(
  dataSource: DataSource,
  serializer = new SqliteSerializer(),
): Promise<DataSource> {
  await dataSource.initialize();
  try {
    await runMigrations(dataSource);
  } catch (error) {
    await dataSource.destroy();
    throw error;
  }
  if (dataSource.options.type === 'better-sqlite3') serializer.install(dataSource);
  return dataSource;
}
