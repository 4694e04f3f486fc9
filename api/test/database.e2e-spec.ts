import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Role } from '@nappe/shared';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { assertDurableSqlite, readPragmas } from '../src/database/database-health.js';
import { openDataSource } from '../src/database/data-source.js';
import {
  DEMO_ACCOUNTS,
  DEMO_STUDIO,
  seedDemo,
  SeedRefusedError,
} from '../src/database/demo-seed.js';
import { migrations } from '../src/database/migrations/index.js';
import { StudioSettings } from '../src/studio/entities/studio-settings.entity.js';
import { User } from '../src/users/entities/user.entity.js';

let dir: string;
let ds: DataSource;

beforeEach(async () => {
  dir = mkdtempSync(join(tmpdir(), 'nappe-db-'));
  ds = await openDataSource(join(dir, 'test.sqlite'));
});
afterEach(async () => {
  if (ds.isInitialized) await ds.destroy();
  rmSync(dir, { recursive: true, force: true });
});

const newUser = (ds: DataSource, email: string) =>
  ds.getRepository(User).create({ email, name: 'N', passwordHash: 'x', role: Role.Client });

describe('durability pragmas (SQLite docs: WAL, synchronous, foreign_keys, busy_timeout)', () => {
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
});

describe('one shared SQLite connection, serialised (QUALITY.md Durability; STACK.md measurement)', () => {
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

  it('lets a transaction run nested queries through the lock it already holds (no deadlock)', async () => {
    const count = await ds.transaction(async (manager) => {
      await manager.save(newUser(ds, 'nested@example.test'));
      return ds.transaction(async (inner) => inner.count(User)); // re-entrant: same async context
    });
    expect(count).toBe(1);
  });
});

describe('migrations up, down and up again keep the rows (QUALITY.md Durability)', () => {
  it('reverts every migration and re-applies them', async () => {
    await seedDemo(ds, async () => 'hash', 'test');
    const before = await ds.getRepository(User).count();
    expect(before).toBe(3);
    // Down to nothing would drop the tables: test down/up of the last migration on a copy with data,
    // which for the first migration means re-creating the schema and re-seeding.
    expect(migrations).toHaveLength((await ds.query(`SELECT * FROM migrations`)).length);
    for (let i = 0; i < migrations.length; i += 1)
      await ds.undoLastMigration({ transaction: 'each' });
    expect(
      await ds.query(`SELECT name FROM sqlite_master WHERE type = 'table' AND name = 'users'`),
    ).toEqual([]);
    await ds.runMigrations({ transaction: 'each' });
    await seedDemo(ds, async () => 'hash', 'test');
    expect(await ds.getRepository(User).count()).toBe(before);
    await assertDurableSqlite(ds);
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
