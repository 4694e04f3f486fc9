import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ANY, POLICY, type Caller } from './factories/access-policy.js';
import { createDemoStudio, demoId, type DemoStudio } from './factories/demo-studio.js';
import { bearer, ingredientBody } from './factories/kitchen.js';
import { TEST_ORIGIN, writeFingerprint } from './factories/test-app.js';

/**
 * Property-based fuzzing of every route that takes a body (QUALITY.md; OWASP API Top 10 2023
 * API8 security misconfiguration and ASVS 4.0.3 V5.1 input validation): generated JSON, from
 * noise to near-valid bodies built from the field names our schemas use, sent by a role the
 * policy lets through so that the body reaches validation. Whatever comes in:
 * - the answer is never a 5xx;
 * - a refused request (4xx) writes nothing: the write fingerprint (SQLite's total_changes(), rows
 *   inserted, updated or deleted on the connection; its PostgreSQL equivalent in `writeFingerprint`)
 *   is the same before and after.
 */
let s: DemoStudio;
let tokens: Record<Caller, string>;

beforeAll(async () => {
  s = await createDemoStudio();
  tokens = { client: s.client, staff: s.staff, chef: s.chef };
}, 120_000);
afterAll(async () => s.t.close());

/** Real ids, so that bodies reach the handlers rather than stopping at a 404. */
function idsFor(route: string): Record<string, string> {
  const resource = route.split(' ')[1]!.split('/')[2]!;
  const byResource: Record<string, string> = {
    orders: demoId('order-plan-wedding'),
    recipes: demoId('rec-almond-crumble'),
    ingredients: demoId('ing-whole-milk'),
    desserts: demoId('des-pistachio-frost'),
  };
  return {
    id: byResource[resource] ?? '00000000-0000-4000-8000-000000000000',
    dessertId: demoId('des-pistachio-frost'),
    guestId: '00000000-0000-4000-8000-000000000001',
    taskKey: 'not-a-task',
    photoId: '00000000-0000-4000-8000-000000000002',
  };
}

/** Field names our request schemas use: near-valid bodies get past the first check. */
const FIELD_NAMES = [
  'name',
  'email',
  'password',
  'currentPassword',
  'token',
  'role',
  'reason',
  'override',
  'plan',
  'sessionId',
  'menuId',
  'eventDate',
  'serviceTime',
  'guestCount',
  'guestRequirements',
  'guestDataConsent',
  'allergens',
  'diets',
  'note',
  'lines',
  'steps',
  'quantity',
  'unit',
  'yieldG',
  'storage',
  'shelfLifeHours',
  'pricePerGuestMinor',
  'desserts',
  'portions',
  'purchase',
  'composition',
  'leaveOut',
  'replace',
  'timeZone',
  'currency',
  'depositPercent',
  'cancellationTiers',
  'blackoutDates',
  'dailyPlateCapacity',
  'retentionDays',
  'done',
];

const value = fc.oneof(
  fc.jsonValue({ maxDepth: 2 }),
  fc.constantFrom(
    -1,
    0,
    1e308,
    Number.MAX_SAFE_INTEGER + 2,
    '',
    ' ',
    '2026-02-30',
    '25:61',
    'x'.repeat(20_000),
    '<script>alert(1)</script>',
    "'; DROP TABLE orders; --",
    '../../etc/passwd',
    '\u0000',
    [],
    {},
    null,
    true,
  ),
);
const nearValid = fc.dictionary(fc.constantFrom(...FIELD_NAMES), value, { maxKeys: 6 });
const body = fc.oneof(
  { weight: 3, arbitrary: nearValid },
  { weight: 1, arbitrary: fc.dictionary(fc.string({ maxLength: 12 }), value, { maxKeys: 4 }) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
);

const totalChanges = () => writeFingerprint(s.t);

// DELETE routes take no body, except the account deletion, which takes the password.
const writeRoutes = Object.entries(POLICY).filter(
  ([route]) => /^(POST|PUT|PATCH) /.test(route) || route === 'DELETE /api/me',
);

describe('generated bodies to every write route (fast-check)', () => {
  it('covers the write routes of the policy', () => {
    expect(writeRoutes.length).toBeGreaterThanOrEqual(30);
  });

  it('the probe sees a write: an accepted ingredient changes the write fingerprint', async () => {
    const before = await totalChanges();
    await s.t.http
      .post('/api/ingredients')
      .set(bearer(s.chef))
      .send(ingredientBody({ name: 'Probe ingredient (fuzz)' }))
      .expect(201);
    expect(await totalChanges()).not.toBe(before);
  });

  it.each(writeRoutes)(
    '%s: never a 5xx, and a refused body writes nothing',
    async (route, allowed) => {
      const caller: Caller | null = allowed === 'public' ? null : (allowed[0] ?? ANY[0]!);
      const [method, pattern] = route.split(' ') as [string, string];
      const ids = idsFor(route);
      const path = pattern.replace(/:(\w+)/g, (_m, name: string) => ids[name]!);
      const verb = method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
      await fc.assert(
        fc.asyncProperty(body, async (payload) => {
          const before = await totalChanges();
          let req = s.t.http[verb](path)
            .set('Origin', TEST_ORIGIN)
            .set('Content-Type', 'application/json')
            .set('Idempotency-Key', `fuzz-${Math.random().toString(36).slice(2)}`);
          if (caller) req = req.set('Authorization', `Bearer ${tokens[caller]}`);
          const res = await req.send(JSON.stringify(payload));
          expect(res.status, `${route} with ${JSON.stringify(payload).slice(0, 200)}`).toBeLessThan(
            500,
          );
          if (res.status >= 400) {
            expect(await totalChanges(), `${route} → ${res.status} wrote rows`).toBe(before);
          }
        }),
        { numRuns: 25, seed: 20261202 },
      );
    },
    60_000,
  );
});
