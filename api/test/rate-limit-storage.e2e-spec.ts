import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { openDataSource } from '../src/database/data-source.js';
import { PostgresThrottlerStorage } from '../src/database/postgres-throttler-storage.js';
import { createTestDatabase, TEST_DB_TYPE, type TestDatabase } from './factories/test-app.js';

let db: TestDatabase;
let ds: DataSource;
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

// The storage API processes share on PostgreSQL; on SQLite the app counts in memory
// (@nestjs/throttler's own storage), one process per file.
describe.skipIf(TEST_DB_TYPE !== 'postgres')('rate-limit counters in PostgreSQL', () => {
  beforeEach(async () => {
    db = await createTestDatabase();
    ds = await openDataSource(db.target);
  });
  afterEach(async () => {
    if (ds.isInitialized) await ds.destroy();
    await db.drop();
  });

  it('counts a window, blocks the request past the limit for the block time, then starts again', async () => {
    const storage = new PostgresThrottlerStorage(ds);
    // A 2 s window and a 0.8 s block, so the block ends well inside the window.
    const hit = () => storage.increment('k'.repeat(64), 2000, 3, 800, 'default');
    const first = await hit();
    expect(first).toEqual({
      totalHits: 1,
      timeToExpire: 2,
      isBlocked: false,
      timeToBlockExpire: 0,
    });
    expect((await hit()).totalHits).toBe(2);
    expect(await hit()).toMatchObject({ totalHits: 3, isBlocked: false });
    const fourth = await hit();
    expect(fourth).toMatchObject({ totalHits: 4, isBlocked: true, timeToBlockExpire: 1 });
    expect(await hit()).toMatchObject({ totalHits: 4, isBlocked: true }); // refused, not counted
    await pause(900);
    expect(await hit()).toEqual({
      totalHits: 1,
      timeToExpire: 2,
      isBlocked: false,
      timeToBlockExpire: 0,
    });
  });

  it('keeps each limit and each key apart', async () => {
    const storage = new PostgresThrottlerStorage(ds);
    await storage.increment('a', 60_000, 10, 60_000, 'default');
    await storage.increment('a', 60_000, 10, 60_000, 'default');
    expect((await storage.increment('a', 60_000, 10, 60_000, 'auth')).totalHits).toBe(1);
    expect((await storage.increment('b', 60_000, 10, 60_000, 'default')).totalHits).toBe(1);
    expect((await storage.increment('a', 60_000, 10, 60_000, 'default')).totalHits).toBe(3);
  });

  it('counts 50 requests arriving at once exactly once each (one atomic upsert per request)', async () => {
    const storage = new PostgresThrottlerStorage(ds);
    const records = await Promise.all(
      Array.from({ length: 50 }, () => storage.increment('burst', 60_000, 1000, 60_000, 'default')),
    );
    expect(records.map((r) => r.totalHits).sort((x, y) => x - y)).toEqual(
      Array.from({ length: 50 }, (_, i) => i + 1),
    );
  });

  it('sweeps counters whose window ended long ago, and keeps the rest', async () => {
    const storage = new PostgresThrottlerStorage(ds);
    await storage.increment('fresh', 60_000, 10, 60_000, 'default');
    await ds.query(
      `INSERT INTO rate_limit_hits (key, throttler, hits, expires_at) VALUES ('old', 'default', 3, now() - interval '2 hours')`,
    );
    await storage.sweep();
    const keys = (await ds.query(`SELECT key FROM rate_limit_hits ORDER BY key`)) as Array<{
      key: string;
    }>;
    expect(keys.map((k) => k.key)).toEqual(['fresh']);
  });
});
