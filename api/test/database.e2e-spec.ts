import { Role } from '@nappe/shared';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { DataSource } from 'typeorm';
import {
  assertDurableDatabase,
  assertDurablePostgres,
  assertDurableSqlite,
  readPragmas,
} from '../src/database/database-health.js';
import { dataSourceOptions, openDataSource } from '../src/database/data-source.js';
import {
  DEMO_ACCOUNTS,
  DEMO_STUDIO,
  seedDemo,
  SeedRefusedError,
} from '../src/database/demo-seed.js';
import { migrations } from '../src/database/migrations/index.js';
import { StudioSettings } from '../src/studio/entities/studio-settings.entity.js';
import { User } from '../src/users/entities/user.entity.js';
import { createTestDatabase, TEST_DB_TYPE, type TestDatabase } from './factories/test-app.js';

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

const newUser = (ds: DataSource, email: string) =>
  ds.getRepository(User).create({ email, name: 'N', passwordHash: 'x', role: Role.Client });

// SQLite's own settings: PostgreSQL has no pragmas; its boot check is tested below.
describe.skipIf(TEST_DB_TYPE !== 'sqlite')(
  'durability pragmas (SQLite docs: WAL, synchronous, foreign_keys, busy_timeout)',
  () => {
    it('opens in WAL with synchronous=FULL, foreign keys on, a busy timeout and a clean integrity check', async () => {
      const report = await assertDurableSqlite(ds);
      expect(report).toEqual({
        journalMode: 'wal',
        synchronous: 2,
        foreignKeys: 1,
        busyTimeout: 5000,
        integrity: 'ok',
      });
    });

    it('refuses a connection whose pragmas were changed', async () => {
      await ds.query('PRAGMA synchronous = NORMAL');
      expect((await readPragmas(ds)).synchronous).toBe(1);
      await expect(assertDurableSqlite(ds)).rejects.toThrow(/synchronous is 1, expected 2/);
    });

    it('enforces foreign keys', async () => {
      await expect(
        ds.query(
          `INSERT INTO auth_sessions (id, user_id, refresh_hash, expires_at, last_used_at) VALUES ('s', 'nobody', 'h', datetime('now'), datetime('now'))`,
        ),
      ).rejects.toThrow(/FOREIGN KEY/);
    });
  },
);

// PostgreSQL's boot check; SQLite's is the pragma check above.
describe.skipIf(TEST_DB_TYPE !== 'postgres')(
  'durability settings (PostgreSQL docs, 20.5 Write Ahead Log; 13.2 isolation)',
  () => {
    it('finds fsync, synchronous_commit and full_page_writes on, READ COMMITTED, version 13 or newer', async () => {
      const report = await assertDurablePostgres(ds);
      expect(report).toMatchObject({
        fsync: 'on',
        synchronousCommit: 'on',
        fullPageWrites: 'on',
        isolation: 'read committed',
      });
      expect(report.serverVersion).toBeGreaterThanOrEqual(130000);
      expect(await assertDurableDatabase(ds)).toEqual(report);
    });

    it('refuses a connection that would acknowledge commits before they are on disk', async () => {
      const target = db.target;
      if (target.type !== 'postgres') throw new Error('unreachable');
      // The same database, reached by connections that ask for synchronous_commit=off.
      const lax = new DataSource({
        ...dataSourceOptions(target),
        extra: {
          options: '-c synchronous_commit=off -c default_transaction_isolation=serializable',
        },
      });
      await lax.initialize();
      try {
        await expect(assertDurablePostgres(lax)).rejects.toThrow(
          /synchronous_commit is off, expected on; default_transaction_isolation is serializable/,
        );
      } finally {
        await lax.destroy();
      }
    });

    it('enforces foreign keys and the check constraints of the migrations', async () => {
      await expect(
        ds.query(
          `INSERT INTO auth_sessions (id, user_id, refresh_hash, expires_at, last_used_at) VALUES ('s', 'nobody', 'h', now(), now())`,
        ),
      ).rejects.toThrow(/foreign key constraint "FK_50ccaa6440288a06f0ba693ccc6"/);
      await expect(ds.query(`UPDATE studio_settings SET deposit_percent = 0`)).rejects.toThrow(
        /check constraint "CHK_studio_settings_deposit"/,
      );
    });
  },
);

describe('concurrent transactions: no collision, no lost write (QUALITY.md Durability; STACK.md measurement)', () => {
  it('commits 200 concurrent transactions with no collision', async () => {
    const results = await Promise.allSettled(
      Array.from({ length: 200 }, (_, i) =>
        ds.transaction(async (manager) => {
          const user = await manager.save(newUser(ds, `tx-${i}@example.test`));
          await manager.update(User, user.id, { name: `Named ${i}` });
          return user.id;
        }),
      ),
    );
    expect(results.filter((r) => r.status === 'rejected')).toEqual([]);
    expect(await ds.getRepository(User).count()).toBe(200);
    expect(await ds.getRepository(User).countBy({ name: 'N' })).toBe(0);
  });

  it('keeps a write made by another request while a transaction is open and then rolls back', async () => {
    let inside!: () => void;
    const transactionIsOpen = new Promise<void>((resolve) => (inside = resolve));
    const doomed = ds.transaction(async (manager) => {
      await manager.save(newUser(ds, 'rolled-back@example.test'));
      inside();
      await new Promise((resolve) => setTimeout(resolve, 50)); // the other request runs now
      throw new Error('the chef cancelled');
    });
    await transactionIsOpen;
    const outside = ds.getRepository(User).insert(newUser(ds, 'kept@example.test'));
    await expect(doomed).rejects.toThrow('the chef cancelled');
    await outside;
    const emails = (await ds.getRepository(User).find()).map((u) => u.email);
    expect(emails).toEqual(['kept@example.test']);
  });

  it('serialises the implicit transactions of concurrent save() calls', async () => {
    const saves = Array.from({ length: 100 }, (_, i) =>
      ds.getRepository(User).save(newUser(ds, `save-${i}@example.test`)),
    );
    const results = await Promise.allSettled(saves);
    expect(results.filter((r) => r.status === 'rejected')).toEqual([]);
    expect(await ds.getRepository(User).count()).toBe(100);
  });
});

// The connection lock is SQLite's alone: on PostgreSQL a nested `ds.transaction()` takes another
// pooled connection and cannot see the outer transaction's uncommitted row, by design.
describe.skipIf(TEST_DB_TYPE !== 'sqlite')(
  'the SQLite connection lock (sqlite-serializer.ts)',
  () => {
    it('lets a transaction run nested queries through the lock it already holds (no deadlock)', async () => {
      const count = await ds.transaction(async (manager) => {
        await manager.save(newUser(ds, 'nested@example.test'));
        return ds.transaction(async (inner) => inner.count(User)); // re-entrant: same async context
      });
      expect(count).toBe(1);
    });
  },
);

describe('migrations up, down and up again keep the rows (QUALITY.md Durability)', () => {
  /** Rows per table of every entity (the migrations table aside). */
  const rowCounts = async (): Promise<Record<string, number>> => {
    const counts: Record<string, number> = {};
    for (const table of ds.entityMetadatas.map((m) => m.tableName).sort()) {
      const rows = (await ds.query(`SELECT COUNT(*) AS n FROM "${table}"`)) as Array<{
        n: unknown;
      }>;
      counts[table] = Number(rows[0]?.n);
    }
    return counts;
  };

  it('reverts the last migration and re-applies it on a seeded database, every row kept', async () => {
    await seedDemo(ds, async () => 'hash', 'test');
    const before = await rowCounts();
    expect(before.users).toBe(3);
    expect(before.orders).toBeGreaterThan(0);
    await ds.undoLastMigration({ transaction: 'each' });
    await ds.runMigrations({ transaction: 'each' });
    expect(await rowCounts()).toEqual(before);
    await assertDurableDatabase(ds);
  });

  it('reverts every migration down to an empty database and re-applies them', async () => {
    await seedDemo(ds, async () => 'hash', 'test');
    const before = await rowCounts();
    // Down to nothing drops the tables, so the rows go with them: the seed puts them back, and
    // every table must hold as many rows as before.
    expect(migrations).toHaveLength((await ds.query(`SELECT * FROM migrations`)).length);
    for (let i = 0; i < migrations.length; i += 1)
      await ds.undoLastMigration({ transaction: 'each' });
    const runner = ds.createQueryRunner();
    try {
      for (const { tableName } of ds.entityMetadatas)
        expect(await runner.hasTable(tableName), tableName).toBe(false);
    } finally {
      await runner.release();
    }
    await ds.runMigrations({ transaction: 'each' });
    await seedDemo(ds, async () => 'hash', 'test');
    expect(await rowCounts()).toEqual(before);
    await assertDurableDatabase(ds);
  });
});

describe('demo seed', () => {
  it('fills an empty database once with the studio and the three demo roles', async () => {
    const first = await seedDemo(ds, async () => 'hash', 'development');
    expect(first.seeded).toBe(true);
    const users = await ds.getRepository(User).find({ order: { email: 'ASC' } });
    expect(users.map((u) => [u.email, u.role])).toEqual(
      DEMO_ACCOUNTS.map((a) => [a.email, a.role]).sort((a, b) => a[0]!.localeCompare(b[0]!)),
    );
    expect(await ds.getRepository(StudioSettings).findOneByOrFail({ id: 1 })).toMatchObject(
      DEMO_STUDIO,
    );
    const second = await seedDemo(ds, async () => 'hash', 'development');
    expect(second).toMatchObject({ seeded: false });
    expect(await ds.getRepository(User).count()).toBe(3);
  });

  it('refuses to create demo accounts in production', async () => {
    await expect(seedDemo(ds, async () => 'hash', 'production')).rejects.toBeInstanceOf(
      SeedRefusedError,
    );
    expect(await ds.getRepository(User).count()).toBe(0);
  });
});
