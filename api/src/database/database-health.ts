import type { DataSource } from 'typeorm';
import { BUSY_TIMEOUT_MS } from './data-source.js';

export interface PragmaReport {
  journalMode: string;
  synchronous: number;
  foreignKeys: number;
  busyTimeout: number;
  integrity: string;
}

export async function readPragmas(dataSource: DataSource): Promise<PragmaReport> {
  const one = async <T>(sql: string): Promise<T> => {
    const rows = (await dataSource.query(sql)) as Record<string, T>[];
    return Object.values(rows[0] ?? {})[0] as T;
  };
  return {
    journalMode: String(await one<string>('PRAGMA journal_mode')),
    synchronous: Number(await one<number>('PRAGMA synchronous')),
    foreignKeys: Number(await one<number>('PRAGMA foreign_keys')),
    busyTimeout: Number(await one<number>('PRAGMA busy_timeout')),
    integrity: String(await one<string>('PRAGMA integrity_check')),
  };
}

/**
 * Refuses to run on a database that is not set up for durability (SQLite docs: WAL,
 * synchronous=FULL is 2, foreign keys on, a busy timeout, integrity_check "ok").
 * In-memory databases cannot use WAL; they report "memory" and are accepted for tests only.
 */
export async function assertDurableSqlite(dataSource: DataSource): Promise<PragmaReport> {
  const report = await readPragmas(dataSource);
  const inMemory = report.journalMode === 'memory';
  const problems: string[] = [];
  if (report.journalMode !== 'wal' && !inMemory)
    problems.push(`journal_mode is ${report.journalMode}, expected wal`);
  if (report.synchronous !== 2 && !inMemory)
    problems.push(`synchronous is ${report.synchronous}, expected 2 (FULL)`);
  if (report.foreignKeys !== 1) problems.push('foreign_keys is off');
  if (report.busyTimeout < BUSY_TIMEOUT_MS)
    problems.push(`busy_timeout is ${report.busyTimeout} ms`);
  if (report.integrity !== 'ok') problems.push(`integrity_check says: ${report.integrity}`);
  if (problems.length > 0)
    throw new Error(`The database is not safe to use: ${problems.join('; ')}`);
  return report;
}

export interface PostgresReport {
  /** `server_version_num`, e.g. 150018 for 15.18. */
  serverVersion: number;
  fsync: string;
  synchronousCommit: string;
  fullPageWrites: string;
  /** The isolation level new transactions get. */
  isolation: string;
}

/**
 * PostgreSQL 13 or newer: the test suite drops its databases with `DROP DATABASE … WITH (FORCE)`,
 * new in 13 (PostgreSQL docs, "DROP DATABASE"), and nothing is tried on older servers.
 */
export const MIN_POSTGRES_VERSION = 130000;

export async function readPostgresSettings(dataSource: DataSource): Promise<PostgresReport> {
  const setting = async (name: string): Promise<string> => {
    const rows = (await dataSource.query('SELECT current_setting($1) AS value', [name])) as Array<{
      value: string;
    }>;
    return String(rows[0]?.value);
  };
  return {
    serverVersion: Number(await setting('server_version_num')),
    fsync: await setting('fsync'),
    synchronousCommit: await setting('synchronous_commit'),
    fullPageWrites: await setting('full_page_writes'),
    isolation: await setting('default_transaction_isolation'),
  };
}

/**
 * Refuses a PostgreSQL server that could lose acknowledged writes or that runs our transactions
 * differently from what the locking assumes (PostgreSQL docs, 20.5 "Write Ahead Log": `fsync`
 * off risks unrecoverable corruption, `synchronous_commit` off can lose the last commits after a
 * crash, `full_page_writes` off risks torn pages; 13.2: READ COMMITTED, where a statement sees
 * what committed before it began, so reading after taking a lock sees the last holder's writes).
 * `synchronous_commit` values other than `off` all wait for the local flush.
 */
export async function assertDurablePostgres(dataSource: DataSource): Promise<PostgresReport> {
  const report = await readPostgresSettings(dataSource);
  const problems: string[] = [];
  if (!(report.serverVersion >= MIN_POSTGRES_VERSION))
    problems.push(`PostgreSQL ${report.serverVersion} is older than 13`);
  if (report.fsync !== 'on') problems.push(`fsync is ${report.fsync}, expected on`);
  if (!['on', 'local', 'remote_write', 'remote_apply'].includes(report.synchronousCommit))
    problems.push(`synchronous_commit is ${report.synchronousCommit}, expected on`);
  if (report.fullPageWrites !== 'on')
    problems.push(`full_page_writes is ${report.fullPageWrites}, expected on`);
  if (report.isolation !== 'read committed')
    problems.push(`default_transaction_isolation is ${report.isolation}, expected read committed`);
  if (problems.length > 0)
    throw new Error(`The database is not safe to use: ${problems.join('; ')}`);
  return report;
}

/** The boot check of whichever database the data source opened. */
export async function assertDurableDatabase(
  dataSource: DataSource,
): Promise<PragmaReport | PostgresReport> {
  return dataSource.options.type === 'postgres'
    ? assertDurablePostgres(dataSource)
    : assertDurableSqlite(dataSource);
}
