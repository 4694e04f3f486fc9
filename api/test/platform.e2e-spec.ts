import { RequestMethod } from '@nestjs/common';
import { DiscoveryService, MetadataScanner, Reflector } from '@nestjs/core';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { IS_PUBLIC_KEY } from '../src/auth/decorators/public.decorator.js';
import { ROLES_KEY } from '../src/auth/decorators/roles.decorator.js';
import { createTestApp, TEST_ORIGIN, type TestApp } from './factories/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => t.close());

interface RouteInfo {
  method: string;
  path: string;
  isPublic: boolean;
  roles: string[] | undefined;
}

/** Every route of the running app, read from the controllers' own metadata. */
function routeTable(): RouteInfo[] {
  const discovery = t.app.get(DiscoveryService);
  const scanner = t.app.get(MetadataScanner);
  const reflector = t.app.get(Reflector);
  const routes: RouteInfo[] = [];
  for (const wrapper of discovery.getControllers()) {
    const { instance, metatype } = wrapper;
    if (!instance || !metatype) continue;
    const prefix = String(Reflect.getMetadata(PATH_METADATA, metatype) ?? '');
    const proto = Object.getPrototypeOf(instance) as object;
    for (const name of scanner.getAllMethodNames(proto)) {
      const handler = (proto as Record<string, unknown>)[name] as (...args: unknown[]) => unknown;
      const path = Reflect.getMetadata(PATH_METADATA, handler) as string | undefined;
      if (path === undefined) continue;
      const method =
        RequestMethod[Reflect.getMetadata(METHOD_METADATA, handler) as number] ?? 'GET';
      routes.push({
        method,
        path: `/api/${prefix}/${path}`.replace(/\/+/g, '/').replace(/\/$/, ''),
        isPublic: reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [handler, metatype]) === true,
        roles: reflector.getAllAndOverride<string[] | undefined>(ROLES_KEY, [handler, metatype]),
      });
    }
  }
  return routes;
}

describe('deny by default (QUALITY.md, OWASP API Security Top 10 2023 API5)', () => {
  it('every route declares @Public() or its roles', () => {
    const routes = routeTable();
    expect(routes.length).toBeGreaterThanOrEqual(8);
    const undeclared = routes.filter((r) => !r.isPublic && (!r.roles || r.roles.length === 0));
    expect(undeclared.map((r) => `${r.method} ${r.path}`)).toEqual([]);
  });

  it('every protected route answers 401 without a token', async () => {
    const protectedRoutes = routeTable().filter((r) => !r.isPublic);
    expect(protectedRoutes.length).toBeGreaterThan(0);
    for (const route of protectedRoutes) {
      const path = route.path.replace(/:(\w+)/g, '00000000-0000-4000-8000-000000000000');
      const res = await t.http[route.method.toLowerCase() as 'get' | 'post'](path).set(
        'Origin',
        TEST_ORIGIN,
      );
      expect(res.status, `${route.method} ${route.path}`).toBe(401);
    }
  });
});

describe('health (@nestjs/terminus)', () => {
  it('is ready when the database answers and the data folder’s disk has room', async () => {
    for (const path of ['/api/health', '/api/health/ready']) {
      const res = await t.http.get(path).expect(200);
      expect(res.body).toMatchObject({
        status: 'ok',
        info: { database: { status: 'up' }, disk: { status: 'up' } },
        error: {},
      });
    }
  });

  it('is live on a heap check alone, and answers 503 naming the database when it is gone', async () => {
    const own = await createTestApp();
    try {
      await own.http.get('/api/health/live').expect(200, {
        status: 'ok',
        info: { heap: { status: 'up' } },
        error: {},
        details: { heap: { status: 'up' } },
      });
      await own.dataSource.destroy();
      const res = await own.http.get('/api/health/ready').expect(503);
      expect(res.body).toMatchObject({ status: 'error', error: { database: { status: 'down' } } });
      // Liveness does not depend on the database: the supervisor must not restart for it.
      await own.http.get('/api/health/live').expect(200);
    } finally {
      await own.close().catch(() => undefined);
    }
  });
});

describe('GET /api/studio', () => {
  it('is public and shows the studio card', async () => {
    const res = await t.http.get('/api/studio').expect(200);
    expect(Object.keys(res.body).sort()).toEqual([
      'city',
      'currency',
      'name',
      'tagline',
      'timeZone',
    ]);
  });
});

describe('OpenAPI outside production', () => {
  it('serves the document with the auth routes', async () => {
    const res = await t.http.get('/api/docs-json').expect(200);
    expect(Object.keys(res.body.paths)).toEqual(
      expect.arrayContaining([
        '/api/auth/login',
        '/api/auth/register',
        '/api/auth/me',
        '/api/users',
        '/api/health',
      ]),
    );
  });
});

describe('bodies and headers (QUALITY.md: validation, headers and config)', () => {
  it('refuses a non-JSON body with 415', async () => {
    await t.http
      .post('/api/auth/login')
      .set('Content-Type', 'text/plain')
      .send('email=a&password=b')
      .expect(415);
    await t.http
      .post('/api/auth/login')
      .set('Content-Type', 'application/x-www-form-urlencoded')
      .send('email=a@b.test&password=b')
      .expect(415);
  });

  it('refuses an oversized body with 413', async () => {
    const big = { email: 'a@b.test', password: 'x'.repeat(300 * 1024) };
    await t.http.post('/api/auth/login').send(big).expect(413);
  });

  it('answers malformed JSON with 400, not 500', async () => {
    await t.http
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email":')
      .expect(400);
  });

  it('sets helmet headers and no stack traces in errors', async () => {
    const res = await t.http.get('/api/nowhere').expect(404);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/frame-ancestors 'none'/);
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['x-powered-by']).toBeUndefined();
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+/);
  });

  it('allows CORS for our two apps only, never for "null" or a foreign origin', async () => {
    const ok = await t.http
      .options('/api/auth/login')
      .set('Origin', TEST_ORIGIN)
      .set('Access-Control-Request-Method', 'POST');
    expect(ok.headers['access-control-allow-origin']).toBe(TEST_ORIGIN);
    expect(ok.headers['access-control-allow-credentials']).toBe('true');
    for (const origin of ['null', 'https://evil.example', 'http://localhost:9999']) {
      const res = await t.http
        .options('/api/auth/login')
        .set('Origin', origin)
        .set('Access-Control-Request-Method', 'POST');
      expect(res.headers['access-control-allow-origin'], origin).toBeUndefined();
    }
  });
});
