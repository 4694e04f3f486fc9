// SQLite's ceiling for durable writes on this disk: better-sqlite3 with the app's own connection
// pragmas (prepareSqlite from api/dist: journal_mode=WAL, synchronous=FULL, foreign_keys, busy
// timeout), one small INSERT per transaction (autocommit), one writer, for a fixed time.
//   node sqlite-ceiling.mjs <dir> <seconds>  → one JSON line on standard output
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { pathToFileURL } from 'node:url';
import Database from 'better-sqlite3';
import { ROOT } from '../lib/system.mjs';
import { summarise } from './stats.mjs';

const [dir, secondsArg] = process.argv.slice(2);
const seconds = Number(secondsArg);
if (!dir || !(seconds > 0)) {
  console.error('usage: node sqlite-ceiling.mjs <dir> <seconds>');
  process.exit(2);
}

/** @type {{ prepareSqlite: (db: import('better-sqlite3').Database) => void }} */
const { prepareSqlite } = await import(
  pathToFileURL(join(ROOT, 'api', 'dist', 'database', 'data-source.js')).href
);

const file = join(dir, 'sqlite-ceiling.sqlite');
const db = new Database(file);
prepareSqlite(db);
const pragmas = {
  journalMode: db.pragma('journal_mode', { simple: true }),
  synchronous: db.pragma('synchronous', { simple: true }),
};
// Refuse to report a ceiling measured without the durability it is meant to bound.
if (pragmas.journalMode !== 'wal' || pragmas.synchronous !== 2) {
  throw new Error(
    `expected journal_mode=wal and synchronous=FULL (2), got ${JSON.stringify(pragmas)}`,
  );
}
db.exec('CREATE TABLE ceiling (id INTEGER PRIMARY KEY, at TEXT NOT NULL, body TEXT NOT NULL)');
const insert = db.prepare('INSERT INTO ceiling (at, body) VALUES (?, ?)');
const body = 'a small row, about the size of an order event summary'.padEnd(120, '.');
/** @type {number[]} */
const times = [];
const start = performance.now();
const end = start + seconds * 1000;
while (performance.now() < end) {
  const t = performance.now();
  insert.run(new Date().toISOString(), body); // autocommit: one transaction, one commit
  times.push(performance.now() - t);
}
const elapsed = (performance.now() - start) / 1000;
const rows = /** @type {number} */ (db.prepare('SELECT COUNT(*) FROM ceiling').pluck().get());
db.close();
for (const suffix of ['', '-wal', '-shm']) rmSync(file + suffix, { force: true });
if (rows !== times.length) throw new Error(`${times.length} commits but ${rows} rows`);
console.log(
  JSON.stringify({
    ops: times.length,
    seconds: elapsed,
    perSecond: times.length / elapsed,
    ...pragmas,
    ...summarise(times),
  }),
);
