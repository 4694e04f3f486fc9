// The disk's ceiling for durable writes, one writer, each mode for a fixed time:
//   append:    append 4 KiB to a file and fsync() it (the file grows, so every flush also
//              commits the file's new size to the file system's journal);
//   overwrite: rewrite 4 KiB in place inside a file that already has its size, then
//              fdatasync() it: what a commit to an SQLite WAL file that has reached its size
//              costs (SQLite reuses the WAL from its start after each checkpoint).
// Every acknowledged SQLite commit with synchronous=FULL waits for at least one such flush, so
// no durable order write on this disk beats the faster of the two.
//   node fsync-ceiling.mjs <dir> <seconds>  → one JSON line on standard output
import { closeSync, fdatasyncSync, fsyncSync, openSync, rmSync, writeSync } from 'node:fs';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { summarise } from './stats.mjs';

const [dir, secondsArg] = process.argv.slice(2);
const seconds = Number(secondsArg);
if (!dir || !(seconds > 0)) {
  console.error('usage: node fsync-ceiling.mjs <dir> <seconds>');
  process.exit(2);
}

const BLOCK = 4096;
const SLOTS = 256; // a 1 MiB file for the overwrite mode
const block = Buffer.alloc(BLOCK, 0x6e);

/** @param {'append' | 'overwrite'} mode */
function measure(mode) {
  const file = join(dir, `fsync-ceiling-${mode}.bin`);
  const fd = openSync(file, mode === 'append' ? 'a' : 'w');
  /** @type {number[]} */
  const times = [];
  try {
    if (mode === 'overwrite') {
      for (let i = 0; i < SLOTS; i += 1) writeSync(fd, block);
      fsyncSync(fd);
    }
    const start = performance.now();
    const end = start + seconds * 1000;
    while (performance.now() < end) {
      const t = performance.now();
      if (mode === 'append') {
        writeSync(fd, block);
        fsyncSync(fd);
      } else {
        writeSync(fd, block, 0, BLOCK, (times.length % SLOTS) * BLOCK);
        fdatasyncSync(fd);
      }
      times.push(performance.now() - t);
    }
    const elapsed = (performance.now() - start) / 1000;
    return {
      ops: times.length,
      seconds: elapsed,
      perSecond: times.length / elapsed,
      ...summarise(times),
    };
  } finally {
    closeSync(fd);
    rmSync(file, { force: true });
  }
}

console.log(
  JSON.stringify({ bytesPerOp: BLOCK, append: measure('append'), overwrite: measure('overwrite') }),
);
