// Online backup and restore of the SQLite database, with SQLite's own backup API
// (better-sqlite3 `backup()`): consistent while the API keeps writing, no downtime.
import { closeSync, existsSync, fsyncSync, openSync, renameSync, rmSync, statSync } from 'node:fs';
import { copyFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { performance } from 'node:perf_hooks';
import Database from 'better-sqlite3';

/**
 * @typedef {{ path: string, bytes: number, tables: Record<string, number>, durationMs: number }} BackupResult
 */

/**
 * Reads row counts of the application's tables (not SQLite's or TypeORM's bookkeeping).
 * @param {Database.Database} db
 * @returns {Record<string, number>}
 */
export function rowCounts(db) {
  const tables = /** @type {{ name: string }[]} */ (
    db
      .prepare(
        `SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name`,
      )
      .all()
  );
  /** @type {Record<string, number>} */
  const counts = {};
  for (const { name } of tables) {
    const row = /** @type {{ n: number }} */ (
      db.prepare(`SELECT count(*) AS n FROM "${name}"`).get()
    );
    counts[name] = row.n;
  }
  return counts;
}

/**
 * Refuses a file that is not a healthy SQLite database.
 * @param {string} path
 */
export function verifyDatabaseFile(path) {
  const db = new Database(path, { readonly: true, fileMustExist: true });
  try {
    const result = /** @type {{ integrity_check: string }[]} */ (db.pragma('integrity_check'));
    const verdict = result.map((r) => r.integrity_check).join('; ');
    if (verdict !== 'ok') throw new Error(`${path} failed SQLite's integrity check: ${verdict}`);
    return rowCounts(db);
  } finally {
    db.close();
  }
}

/** fsync a file so the copy survives a power cut (SQLite's own durability advice). */
function syncFile(/** @type {string} */ path) {
  const fd = openSync(path, 'r+');
  try {
    fsyncSync(fd);
  } finally {
    closeSync(fd);
  }
}

/**
 * Copies a live database to `destination` page by page while others keep writing.
 * @param {string} source
 * @param {string} destination
 * @returns {Promise<BackupResult>}
 */
export async function backupDatabase(source, destination) {
  const started = performance.now();
  if (existsSync(destination))
    throw new Error(`${destination} already exists; choose another name.`);
  const db = new Database(source, { fileMustExist: true });
  db.pragma('busy_timeout = 5000');
  try {
    await db.backup(destination);
  } finally {
    db.close();
  }
  syncFile(destination);
  const tables = verifyDatabaseFile(destination);
  return {
    path: destination,
    bytes: statSync(destination).size,
    tables,
    durationMs: performance.now() - started,
  };
}

/**
 * Puts a backup in place of the database at `target`. The API must be stopped first: a running
 * API keeps the old file open. The backup is checked before anything is touched, copied next
 * to the target, synced, and renamed over it; the old file's WAL and shared-memory files are
 * removed so they cannot be replayed onto the restored file.
 * @param {string} backup
 * @param {string} target
 * @param {{ keepPrevious?: boolean }} options
 */
export async function restoreDatabase(backup, target, { keepPrevious = true } = {}) {
  const tables = verifyDatabaseFile(backup);
  const staging = join(dirname(target), `.restore-${process.pid}-${Date.now()}.sqlite`);
  await copyFile(backup, staging);
  syncFile(staging);
  let previous = null;
  if (existsSync(target) && keepPrevious) {
    previous = `${target}.before-restore-${new Date().toISOString().replace(/[:.]/g, '-')}`;
    renameSync(target, previous);
    // A WAL left by a crash holds committed transactions: keep it with the file it belongs to.
    if (existsSync(`${target}-wal`)) renameSync(`${target}-wal`, `${previous}-wal`);
  }
  for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
  renameSync(staging, target);
  return { target, previous, tables };
}
