import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DiscoveryModule } from '@nestjs/core';
import { Test, type TestingModuleBuilder } from '@nestjs/testing';
import * as argon2 from 'argon2';
import pg from 'pg';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module.js';
import { configureApp } from '../../src/configure-app.js';
import { Env, validateEnv } from '../../src/config/env.js';
import type { DatabaseTarget } from '../../src/database/data-source.js';
import { SCHEMA_DB_TYPE } from '../../src/database/portable-schema.js';
import { User } from '../../src/users/entities/user.entity.js';
import type { Role } from '@nappe/shared';

export const TEST_ORIGIN = 'http://localhost:5173';

export interface TestApp {
  app: NestExpressApplication;
  http: ReturnType<typeof request>;
  dataSource: DataSource;
  env: Env;
  /** The database it runs on (its own, unless `TestAppOptions.database` shared another's). */
  database: TestDatabase;
  close: () => Promise<void>;
}

export interface TestAppOptions {
  /** Replace providers before the module compiles (a clock, a mail transport). */
  configure?: (builder: TestingModuleBuilder) => TestingModuleBuilder;
  /** Where the request log (pino-http) writes; by default standard output, silenced by LOG_LEVEL. */
  logStream?: { write(line: string): void };
  /**
   * Run on this database instead of a fresh one, as a second API process on the same database
   * would (PostgreSQL). Its owner drops it; this app's `close()` leaves it.
   */
  database?: TestDatabase;
}

/** The database the tests run on: `DB_TYPE` of the environment (`npm run test:pg` sets it). */
export const TEST_DB_TYPE = SCHEMA_DB_TYPE;

export interface TestDatabase {
  target: DatabaseTarget;
  /** The settings that point the API at it. */
  env: Record<string, string>;
  /** Deletes it (the file, or the PostgreSQL database). */
  drop: () => Promise<void>;
}

let databases = 0;

/**
 * A fresh, empty database of the type under test. SQLite: a file in a new temporary directory.
 * PostgreSQL: a new database on the server of `DATABASE_URL` (a role that may create databases),
 * with a name of its own, so test files and the apps within them never share data.
 */
export async function createTestDatabase(): Promise<TestDatabase> {
  if (TEST_DB_TYPE === 'sqlite') {
    const dir = mkdtempSync(join(tmpdir(), 'nappe-e2e-'));
    const path = join(dir, 'nappe.sqlite');
    return {
      target: { type: 'sqlite', path },
      env: { DATABASE_PATH: path },
      drop: async () => rmSync(dir, { recursive: true, force: true }),
    };
  }
  const adminUrl = process.env.DATABASE_URL;
  if (!adminUrl)
    throw new Error('DB_TYPE=postgres tests need DATABASE_URL (npm run test:pg sets it)');
  databases += 1;
  const name = `nappe_test_${process.pid}_${databases}_${randomBytes(3).toString('hex')}`;
  await withAdminClient(adminUrl, (c) => c.query(`CREATE DATABASE "${name}"`));
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  // Uploaded photos still go to files beside DATABASE_PATH: a folder of this test's own.
  const dir = mkdtempSync(join(tmpdir(), 'nappe-e2e-pg-'));
  const dataPath = join(dir, 'data');
  return {
    target: { type: 'postgres', url: url.href, dataPath },
    env: { DB_TYPE: 'postgres', DATABASE_URL: url.href, DATABASE_PATH: dataPath },
    drop: async () => {
      await withAdminClient(adminUrl, async (c) => {
        try {
          // A plain drop: the app has closed its pool, and PostgreSQL cancels an autovacuum
          // worker in the database itself. WITH (FORCE) would need the right to signal that
          // worker, which a CREATEDB role lacks (pg_signal_backend), so it comes second.
          await c.query(`DROP DATABASE IF EXISTS "${name}"`);
        } catch (error) {
          // 55006 object_in_use: a session is still connected (a test that left one open).
          if ((error as { code?: string }).code !== '55006') throw error;
          await c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
        }
      });
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

async function withAdminClient<T>(
  url: string,
  work: (client: pg.Client) => Promise<T>,
): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/**
 * Boots the real AppModule on a fresh temporary database (see `createTestDatabase`) with the same
 * middleware as main.ts.
 */
export async function createTestApp(
  overrides: Record<string, string> = {},
  options: TestAppOptions = {},
): Promise<TestApp> {
  const shared = options.database;
  const database = shared ?? (await createTestDatabase());
  const dropOwn = async () => {
    if (!shared) await database.drop();
  };
  const env = validateEnv({
    NODE_ENV: 'test',
    LOG_LEVEL: 'silent',
    ...database.env,
    ...overrides,
  });
  const builder = Test.createTestingModule({ imports: [AppModule, DiscoveryModule] })
    .overrideProvider(Env)
    .useValue(env);
  let app: NestExpressApplication;
  try {
    const moduleRef = await (options.configure ? options.configure(builder) : builder).compile();
    app = moduleRef.createNestApplication<NestExpressApplication>({
      rawBody: true,
      bodyParser: false,
      logger: false,
    });
    configureApp(app, env, { logStream: options.logStream });
    await app.init();
  } catch (error) {
    await dropOwn();
    throw error;
  }
  const dataSource = app.get(DataSource);
  return {
    app,
    http: request(app.getHttpServer()),
    dataSource,
    env,
    database,
    close: async () => {
      await app.close();
      await dropOwn();
    },
  };
}

let counter = 0;
/** A unique e-mail per call, so tests never collide on the unique index or the login throttle. */
export function uniqueEmail(prefix = 'guest'): string {
  counter += 1;
  return `${prefix}-${process.pid}-${counter}-${Date.now()}@example.test`;
}

export const GOOD_PASSWORD = 'poached pear with bay leaf';

/** Creates a user with any role straight in the database (registration only makes clients). */
export async function makeUser(
  t: TestApp,
  overrides: Partial<Pick<User, 'email' | 'name' | 'role'>> & { password?: string } = {},
): Promise<{ user: User; password: string }> {
  const password = overrides.password ?? GOOD_PASSWORD;
  const passwordHash = await argon2.hash(password, {
    type: argon2.argon2id,
    memoryCost: 19456,
    timeCost: 2,
    parallelism: 1,
  });
  const repo = t.dataSource.getRepository(User);
  const user = await repo.save(
    repo.create({
      email: overrides.email ?? uniqueEmail(overrides.role ?? 'user'),
      name: overrides.name ?? 'Test Person',
      role: overrides.role ?? ('client' as Role),
      passwordHash,
    }),
  );
  return { user, password };
}

/** Signs in through the API and returns the access token and the refresh cookie. */
export async function signIn(
  t: TestApp,
  email: string,
  password: string,
): Promise<{ token: string; cookie: string }> {
  const res = await t.http.post('/api/auth/login').send({ email, password }).expect(200);
  const setCookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const cookie = setCookie.find((c) => c.startsWith('nappe_refresh='))?.split(';')[0] ?? '';
  return { token: (res.body as { accessToken: string }).accessToken, cookie };
}

export async function makeSignedInUser(t: TestApp, role: Role) {
  const { user, password } = await makeUser(t, { role });
  const session = await signIn(t, user.email, password);
  return { user, password, ...session };
}

/**
 * A fingerprint of every write since the app started: it changes whenever a row is inserted,
 * updated or deleted, and stays the same otherwise (reads, refused requests).
 * SQLite: `total_changes()`, the rows changed on the app's one connection (SQLite docs, "Core
 * Functions"). PostgreSQL has no such counter: per table, the row count and the newest row
 * version's transaction id (`xmin`; PostgreSQL docs, 5.5 "System Columns") — an insert or an
 * update writes a row version with a newer transaction id, a delete lowers the count. The
 * rate-limit counters are left out (see below).
 */
export async function writeFingerprint(t: Pick<TestApp, 'dataSource'>): Promise<string> {
  const ds = t.dataSource;
  if (ds.options.type !== 'postgres') {
    const [row] = (await ds.query('SELECT total_changes() AS n')) as Array<{ n: number }>;
    return String(row!.n);
  }
  // The rate-limit counters count every request, refused or not: the throttler's bookkeeping,
  // which on SQLite lives in memory and which total_changes() never sees either.
  const tables = ds.entityMetadatas
    .map((m) => m.tableName)
    .filter((table) => table !== 'rate_limit_hits')
    .sort();
  const rows = (await ds.query(
    tables
      .map(
        (table) =>
          `SELECT '${table}' AS t, COUNT(*) AS n, MAX(xmin::text::bigint) AS x FROM "${table}"`,
      )
      .join(' UNION ALL '),
  )) as Array<{ t: string; n: string; x: string | null }>;
  return rows.map((r) => `${r.t}:${r.n}:${r.x ?? '-'}`).join(' ');
}
