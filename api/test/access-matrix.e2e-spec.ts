import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants.js';
import { DiscoveryService, MetadataScanner } from '@nestjs/core';
import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDemoStudio, type DemoStudio } from './factories/demo-studio.js';
import { ANY, POLICY, type Caller } from './factories/access-policy.js';
import { makeSignedInUser, TEST_ORIGIN } from './factories/test-app.js';

let s: DemoStudio;
let tokens: Record<Caller, string>;

beforeAll(async () => {
  s = await createDemoStudio();
  tokens = { client: s.client, staff: s.staff, chef: s.chef };
}, 120_000);
afterAll(async () => s.t.close());

/** Every route of the running app, from the controllers' own metadata. */
function routeTable(): string[] {
  const discovery = s.t.app.get(DiscoveryService);
  const scanner = s.t.app.get(MetadataScanner);
  const routes: string[] = [];
  for (const { instance, metatype } of discovery.getControllers()) {
    if (!instance || !metatype) continue;
    const prefix = String(Reflect.getMetadata(PATH_METADATA, metatype) ?? '');
    const proto = Object.getPrototypeOf(instance) as object;
    for (const name of scanner.getAllMethodNames(proto)) {
      const handler = (proto as Record<string, unknown>)[name] as object;
      const path = Reflect.getMetadata(PATH_METADATA, handler) as string | undefined;
      if (path === undefined) continue;
      const method = RequestMethod[Reflect.getMetadata(METHOD_METADATA, handler) as number];
      routes.push(`${method} ${`/api/${prefix}/${path}`.replace(/\/+/g, '/').replace(/\/$/, '')}`);
    }
  }
  return routes.sort();
}

const UNKNOWN_ID = '00000000-0000-4000-8000-000000000000';

function send(route: string, token?: string, ids: Record<string, string> = {}, body: object = {}) {
  const [method, pattern] = route.split(' ') as [string, string];
  const path = pattern.replace(/:(\w+)/g, (_m, name: string) => ids[name] ?? UNKNOWN_ID);
  const verb = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let req = s.t.http[verb](path).set('Origin', TEST_ORIGIN);
  if (token) req = req.set('Authorization', `Bearer ${token}`);
  // A syntactically valid JSON body: authorisation must answer before validation does.
  return method === 'GET' || method === 'DELETE' ? req : req.send(body);
}

describe('the access policy (OWASP API Top 10 2023 API1/API5; ASVS V4.1.3)', () => {
  it('names every route of the app, and no route that does not exist', () => {
    expect(routeTable()).toEqual(Object.keys(POLICY).sort());
  });

  it('answers 401 without a token on every route that is not public', async () => {
    const failures: string[] = [];
    for (const [route, allowed] of Object.entries(POLICY)) {
      if (allowed === 'public') continue;
      const res = await send(route);
      if (res.status !== 401) failures.push(`${route} → ${res.status}`);
    }
    expect(failures).toEqual([]);
  });

  it('answers 403 to every role the policy leaves out, and lets the others through', async () => {
    const failures: string[] = [];
    let checked = 0;
    for (const [route, allowed] of Object.entries(POLICY)) {
      if (allowed === 'public') continue;
      for (const caller of ANY) {
        const res = await send(route, tokens[caller]);
        checked += 1;
        const denied = res.status === 403;
        if (allowed.includes(caller) ? denied || res.status === 401 : !denied) {
          failures.push(`${caller} ${route} → ${res.status}`);
        }
      }
    }
    expect(failures).toEqual([]);
    expect(checked).toBeGreaterThan(200);
  }, 60_000);
});

describe("object-level access: another client's order is not found (API1; ASVS V4.2.1)", () => {
  it('every order route with an id answers 404 to a client who does not own it, and changes nothing', async () => {
    const other = await makeSignedInUser(s.t, Role.Client);
    // A demo order of client@nappe.test with guests and a payment.
    const list = await s.t.http
      .get('/api/orders?pageSize=100')
      .set('Authorization', `Bearer ${s.client}`)
      .expect(200);
    let owner: { body: { id: string; payments?: Array<{ id: string }> } } | undefined;
    for (const item of list.body.items as Array<{ id: string }>) {
      const res = await s.t.http
        .get(`/api/orders/${item.id}`)
        .set('Authorization', `Bearer ${s.client}`)
        .expect(200);
      if ((res.body.payments?.length ?? 0) > 0) {
        owner = res;
        break;
      }
    }
    expect(owner, 'the demo client has a paid order').toBeDefined();
    const orderId = owner!.body.id;
    const before = JSON.stringify(owner!.body);
    const ids = {
      id: orderId,
      paymentId: owner!.body.payments![0]!.id,
    };
    const clientRoutes = Object.entries(POLICY).filter(
      ([route, allowed]) =>
        route.includes('/api/orders/:id') && allowed !== 'public' && allowed.includes('client'),
    );
    expect(clientRoutes.length).toBeGreaterThanOrEqual(9);
    // Valid bodies, so that only ownership can refuse them.
    const bodies: Record<string, object> = {
      'POST /api/orders/:id/checkout': { plan: 'deposit' },
      'POST /api/orders/:id/checkout/return': { sessionId: 'cs_test_not_theirs' },
      'POST /api/orders/:id/guest-change-preview': { guestCount: 30 },
      'PUT /api/orders/:id/guests': { guestCount: 30 },
      'POST /api/orders/:id/cancel': { reason: 'Not mine to cancel' },
    };
    const failures: string[] = [];
    for (const [route] of clientRoutes) {
      const res = await send(route, other.token, ids, bodies[route]);
      if (res.status !== 404) failures.push(`${route} → ${res.status}`);
    }
    expect(failures).toEqual([]);
    const after = await s.t.http
      .get(`/api/orders/${orderId}`)
      .set('Authorization', `Bearer ${s.client}`)
      .expect(200);
    expect(JSON.stringify(after.body)).toBe(before);
  }, 60_000);

  it('the order list shows a client only their own orders', async () => {
    const other = await makeSignedInUser(s.t, Role.Client);
    const mine = await s.t.http
      .get('/api/orders?pageSize=100')
      .set('Authorization', `Bearer ${other.token}`)
      .expect(200);
    expect(mine.body.items).toEqual([]);
    const owner = await s.t.http
      .get('/api/orders?pageSize=100')
      .set('Authorization', `Bearer ${s.client}`)
      .expect(200);
    expect(owner.body.items.length).toBeGreaterThan(0);
  });
});
