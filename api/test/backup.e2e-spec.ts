import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Role } from '@nappe/shared';
// The same module `npm run backup` / `npm run restore` use.
import {
  backupDatabase,
  restoreDatabase,
  verifyDatabaseFile,
} from '@nappe/docker-free-scripts/lib/backup.mjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../src/users/entities/user.entity.js';
import {
  createTestApp,
  makeUser,
  signIn,
  TEST_DB_TYPE,
  type TestApp,
} from './factories/test-app.js';

let dir: string;
let t: TestApp;

// The backup and restore of the SQLite file (better-sqlite3's online backup API): a PostgreSQL
// server is backed up with its own tools (pg_dump, base backups), not by this script.
describe.skipIf(TEST_DB_TYPE !== 'sqlite')(
  'online backup while writing, and a restore drill (QUALITY.md Durability; SQLite backup API)',
  () => {
    beforeAll(async () => {
      dir = mkdtempSync(join(tmpdir(), 'nappe-backup-'));
      t = await createTestApp();
    });
    afterAll(async () => {
      await t.close();
      rmSync(dir, { recursive: true, force: true });
    });

    it('backs up a consistent copy while writes go on, and the API boots on the restored copy', async () => {
      const { user: chef, password } = await makeUser(t, {
        role: Role.Chef,
        email: 'drill-chef@example.test',
      });
      const users = t.dataSource.getRepository(User);
      let acknowledged = 0;
      let writing = true;
      const writer = (async () => {
        while (writing) {
          await users.insert(
            users.create({
              email: `w-${acknowledged}@example.test`,
              name: 'W',
              passwordHash: 'x',
              role: Role.Client,
            }),
          );
          acknowledged += 1;
          if (acknowledged % 20 === 0) await new Promise((r) => setImmediate(r));
        }
      })();
      await new Promise((r) => setTimeout(r, 100));
      const before = acknowledged;
      const backupPath = join(dir, 'nappe-backup.sqlite');
      const result = await backupDatabase(t.env.DATABASE_PATH, backupPath);
      const after = acknowledged;
      writing = false;
      await writer;

      // The copy is whole: integrity ok, and it holds at least every write acknowledged before it began.
      expect(verifyDatabaseFile(backupPath)).toEqual(result.tables);
      const copied = result.tables.users! - 1; // minus the chef
      expect(copied).toBeGreaterThanOrEqual(before);
      expect(copied).toBeLessThanOrEqual(after + 1);
      expect(acknowledged).toBeGreaterThan(before);

      // Restore drill: put the backup in place of a database file and boot the real app on it.
      const restoredPath = join(dir, 'restored.sqlite');
      const restored = await restoreDatabase(backupPath, restoredPath);
      expect(restored.tables).toEqual(result.tables);
      const drill = await createTestApp({ DATABASE_PATH: restoredPath });
      try {
        await drill.http.get('/api/health').expect(200);
        expect(await drill.dataSource.getRepository(User).count()).toBe(result.tables.users);
        const session = await signIn(drill, chef.email, password);
        await drill.http
          .get('/api/users')
          .set('Authorization', `Bearer ${session.token}`)
          .expect(200);
      } finally {
        await drill.close();
      }
    });

    it('refuses to restore a file that is not a healthy database, and changes nothing', async () => {
      const bogus = join(dir, 'not-a-db.sqlite');
      await import('node:fs/promises').then((fs) => fs.writeFile(bogus, 'this is not SQLite'));
      const target = join(dir, 'untouched.sqlite');
      await backupDatabase(t.env.DATABASE_PATH, target);
      const countsBefore = verifyDatabaseFile(target);
      await expect(restoreDatabase(bogus, target)).rejects.toThrow(/not a database|integrity/i);
      expect(verifyDatabaseFile(target)).toEqual(countsBefore);
    });
  },
);
