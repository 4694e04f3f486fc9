import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { openDataSource } from '../src/database/data-source.js';
import { lockFor, lockKey } from '../src/database/serialized-writes.js';
import { StudioSettings } from '../src/studio/entities/studio-settings.entity.js';
import { createTestDatabase, TEST_DB_TYPE, type TestDatabase } from './factories/test-app.js';

/**
 * The writes that must not interleave (serialized-writes.ts). On SQLite the connection lock
 * serialises every transaction, so these hold with `lockFor` doing nothing; on PostgreSQL they
 * hold because of it. The same tests run on both (`npm test -w api`, `npm run test:pg`).
 */

let db: TestDatabase;
let ds: DataSource;

beforeEach(async () => {
  db = await createTestDatabase();
  ds = await openDataSource(db.target);
});
afterEach(async () => {
  if (ds.isInitialized) await ds.destroy();
  await db.drop();
});

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe(`serialised writes on ${TEST_DB_TYPE} (lockFor)`, () => {
  it('loses none of 20 concurrent read-then-write changes of one row taken under its lock', async () => {
    const start = (await ds.getRepository(StudioSettings).findOneByOrFail({ id: 1 }))
      .dailyPlateCapacity;
    await Promise.all(
      Array.from({ length: 20 }, () =>
        ds.transaction(async (m) => {
          await lockFor(m, { row: StudioSettings, id: '1' });
          const row = await m.findOneByOrFail(StudioSettings, { id: 1 });
          await pause(5); // the read and the write far apart: another writer would slip in here
          await m.update(
            StudioSettings,
            { id: 1 },
            { dailyPlateCapacity: row.dailyPlateCapacity + 1 },
          );
        }),
      ),
    );
    const end = await ds.getRepository(StudioSettings).findOneByOrFail({ id: 1 });
    expect(end.dailyPlateCapacity).toBe(start + 20);
  });

  it('runs two transactions that take the same named lock one after the other', async () => {
    const steps: string[] = [];
    const holder = (name: string) =>
      ds.transaction(async (m) => {
        await lockFor(m, lockKey('test', 'same'));
        steps.push(`${name} in`);
        await pause(50);
        steps.push(`${name} out`);
      });
    await Promise.all([holder('first'), pause(10).then(() => holder('second'))]);
    expect(steps).toEqual(['first in', 'first out', 'second in', 'second out']);
  });
});

// What only PostgreSQL has: a pool of connections, so unrelated transactions overlap, and locks
// that live in the database (SQLite's lock is in the process and wraps every transaction).
describe.skipIf(TEST_DB_TYPE !== 'postgres')('PostgreSQL locks', () => {
  it('lets transactions with different named locks run side by side', async () => {
    const steps: string[] = [];
    const holder = (name: string) =>
      ds.transaction(async (m) => {
        await lockFor(m, lockKey('test', name));
        steps.push(`${name} in`);
        await pause(50);
        steps.push(`${name} out`);
      });
    await Promise.all([holder('first'), pause(10).then(() => holder('second'))]);
    expect(steps).toEqual(['first in', 'second in', 'first out', 'second out']);
  });

  it('refuses to lock outside a transaction, where the lock would end at once', async () => {
    await expect(lockFor(ds.manager, lockKey('test', 'outside'))).rejects.toThrow(
      /inside a transaction/,
    );
  });
});
