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
