import 'reflect-metadata';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DiscoveryModule } from '@nestjs/core';
import { Test, type TestingModuleBuilder } from '@nestjs/testing';
import * as argon2 from 'argon2';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module.js';
import { configureApp } from '../../src/configure-app.js';
import { Env, validateEnv } from '../../src/config/env.js';
import { User } from '../../src/users/entities/user.entity.js';
import type { Role } from '@nappe/shared';

export const TEST_ORIGIN = 'http://localhost:5173';

export interface TestApp {
  app: NestExpressApplication;
  http: ReturnType<typeof request>;
  dataSource: DataSource;
  env: Env;
  close: () => Promise<void>;
}

export interface TestAppOptions {
  /** Replace providers before the module compiles (a clock, a mail transport). */
  configure?: (builder: TestingModuleBuilder) => TestingModuleBuilder;
  /** Where the request log (pino-http) writes; by default standard output, silenced by LOG_LEVEL. */
  logStream?: { write(line: string): void };
}

/** Boots the real AppModule on a fresh temporary SQLite file with the same middleware as main.ts. */
export async function createTestApp(
  overrides: Record<string, string> = {},
  options: TestAppOptions = {},
): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'nappe-e2e-'));
  const env = validateEnv({
    NODE_ENV: 'test',
    LOG_LEVEL: 'silent',
    DATABASE_PATH: join(dir, 'nappe.sqlite'),
    ...overrides,
  });
  const builder = Test.createTestingModule({ imports: [AppModule, DiscoveryModule] })
    .overrideProvider(Env)
    .useValue(env);
  const moduleRef = await (options.configure ? options.configure(builder) : builder).compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({
    rawBody: true,
    bodyParser: false,
    logger: false,
  });
  configureApp(app, env, { logStream: options.logStream });
  await app.init();
  const dataSource = app.get(DataSource);
  return {
    app,
    http: request(app.getHttpServer()),
    dataSource,
    env,
    close: async () => {
      await app.close();
      rmSync(dir, { recursive: true, force: true });
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
