// `npm run test:stress`: load and shutdown under load (QUALITY.md, Load and faults).
//   1. CLIENTS clients book for LOAD_SECONDS over loopback; every booking is sent twice with the
//      same Idempotency-Key (a client retrying). Checks: no 5xx; bookings in the database equal
//      the 201 answers; every retry answered 200 with the same booking (no duplicates).
//   2. SIGTERM in the middle of the same load: the process exits within its grace period and
//      every booking it acknowledged is in the database.
// Bounded in time and count; loopback only.
import { fork } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import autocannon from 'autocannon';
import Database from 'better-sqlite3';
import { assertPortsFree, migrateAndSeed, ROOT, systemConfig } from './lib/system.mjs';

const CLIENTS = Number(process.env.LOAD_CLIENTS ?? 200);
const SECONDS = Number(process.env.LOAD_SECONDS ?? 60);
const PORT = Number(process.env.LOAD_PORT ?? 3320);
const api = `http://127.0.0.1:${PORT}/api`;

const dataDir = mkdtempSync(join(tmpdir(), 'nappe-load-'));
const config = systemConfig({
  ...process.env,
  NAPPE_API_PORT: String(PORT),
  DATABASE_PATH: join(dataDir, 'load.sqlite'),
});
migrateAndSeed(config);
{
  // Room for every booking: capacity is not what this test is about.
  const db = new Database(config.databasePath);
  db.prepare('UPDATE studio_settings SET daily_plate_capacity = 100000 WHERE id = 1').run();
  db.close();
}

function startApi() {
  const child = fork(join(ROOT, 'api', 'dist', 'main.js'), [], {
    cwd: ROOT,
    stdio: 'ignore',
    env: {
      ...process.env,
      NODE_ENV: 'development',
      PORT: String(PORT),
      DATABASE_PATH: config.databasePath,
      LOG_LEVEL: 'silent',
      THROTTLE_LIMIT: '100000000',
      AUTH_THROTTLE_LIMIT: '100000',
      MAX_UNPAID_ORDERS_PER_CLIENT: '50',
      OUTBOX_WORKER_ENABLED: 'false',
    },
  });
  const exited = new Promise((resolve) =>
    child.once('exit', (code, signal) => resolve({ code, signal })),
  );
  return { child, exited };
}

async function waitForHealth() {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`${api}/health`)).ok) return;
    } catch {
      // starting
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the API did not come up');
}

/** @returns {Promise<string[]>} access tokens of `count` new clients */
async function registerClients(/** @type {number} */ count, /** @type {string} */ tag) {
  /** @type {string[]} */
  const tokens = [];
  for (let start = 0; start < count; start += 20) {
    const batch = await Promise.all(
      Array.from({ length: Math.min(20, count - start) }, async (_, i) => {
        const res = await fetch(`${api}/auth/register`, {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({
            name: `Load client ${tag}-${start + i}`,
            email: `load-${tag}-${start + i}-${Date.now()}@example.test`,
            password: 'two hundred guests and one kitchen',
          }),
        });
        if (res.status !== 201) throw new Error(`sign-up answered ${res.status}`);
        return /** @type {{ accessToken: string }} */ (await res.json()).accessToken;
      }),
    );
    tokens.push(...batch);
  }
  return tokens;
}

async function firstMenu() {
  const menus = /** @type {{ items: { id: string, minGuests: number, leadDays: number }[] }} */ (
    await (await fetch(`${api}/menus`)).json()
  );
  const menu = menus.items[0];
  if (!menu) throw new Error('no public menu to book');
  return menu;
}

const isoIn = (/** @type {number} */ days) =>
  new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/**
 * One autocannon run booking as `tokens`, each booking sent twice with the same key.
 * @param {string[]} tokens
 * @param {{ id: string, minGuests: number, leadDays: number }} menu
 * @param {number} seconds
 */
function bookingLoad(tokens, menu, seconds) {
  let next = 0;
  /** @type {Map<string, string>} key → booking id of its 201 */
  const created = new Map();
  /** @type {Set<string>} every key sent */
  const sent = new Set();
  const stats = {
    created: 0,
    replayed: 0,
    replayMismatch: 0,
    other: /** @type {Record<string, number>} */ ({}),
  };
  const instance = autocannon({
    url: api,
    connections: CLIENTS,
    duration: seconds,
    timeout: 20,
    requests: [
      {
        method: 'POST',
        path: '/api/orders',
        setupRequest: (/** @type {any} */ req, /** @type {any} */ context) => {
          next += 1;
          context.key = randomUUID();
          sent.add(/** @type {string} */ (context.key));
          context.token = tokens[next % tokens.length];
          context.body = JSON.stringify({
            menuId: menu.id,
            eventDate: isoIn(menu.leadDays + 2 + (next % 300)),
            serviceTime: '19:30',
            venueAddressLines: ['Load Hall', `${next} Busy Street`],
            occasion: `Load ${next}`,
            contactPhone: '+32 470 12 34 56',
            guestCount: menu.minGuests,
            guestRequirements: [{ label: 'Guest 1', allergens: ['milk'], diets: [] }],
            guestDataConsent: true,
            acceptTerms: true,
          });
          return {
            ...req,
            headers: {
              'content-type': 'application/json',
              authorization: `Bearer ${context.token}`,
              'idempotency-key': context.key,
            },
            body: context.body,
          };
        },
        onResponse: (
          /** @type {number} */ status,
          /** @type {string} */ body,
          /** @type {any} */ context,
        ) => {
          if (status === 201) {
            stats.created += 1;
            const id = JSON.parse(body).id;
            created.set(context.key, id);
            context.id = id;
          } else {
            stats.other[status] = (stats.other[status] ?? 0) + 1;
          }
        },
      },
      {
        // The same booking again, as a client whose connection dropped would retry it.
        method: 'POST',
        path: '/api/orders',
        setupRequest: (/** @type {any} */ req, /** @type {any} */ context) => ({
          ...req,
          headers: {
            'content-type': 'application/json',
            authorization: `Bearer ${context.token}`,
            'idempotency-key': context.key,
          },
          body: context.body,
        }),
        onResponse: (
          /** @type {number} */ status,
          /** @type {string} */ body,
          /** @type {any} */ context,
        ) => {
          if (context.id === undefined) return;
          if (status === 200 && JSON.parse(body).id === context.id) stats.replayed += 1;
          else stats.replayMismatch += 1;
        },
      },
    ],
  });
  return { instance, created, sent, stats };
}

/** The load's bookings in the file: id → the client request id (Idempotency-Key) it was made with. */
function storedBookings() {
  const db = new Database(config.databasePath, { readonly: true });
  const rows = /** @type {{ id: string, key: string }[]} */ (
    db.prepare(`SELECT id, client_request_id AS key FROM orders WHERE occasion LIKE 'Load %'`).all()
  );
  db.close();
  return new Map(rows.map((r) => [r.id, r.key]));
}

/**
 * Compares the file with what the clients saw. A request cut off when the load stops (or the
 * server goes down) may have committed without its answer arriving; those are counted apart.
 * @param {{ created: Map<string, string>, sent: Set<string> }} run
 * @param {Map<string, string>} stored
 */
function reconcile(run, stored) {
  const storedIds = new Set(stored.keys());
  const missing = [...run.created.values()].filter((id) => !storedIds.has(id));
  const answeredKeys = new Set(run.created.keys());
  const unanswered = [...stored.values()].filter((key) => !answeredKeys.has(key));
  const unknown = unanswered.filter((key) => !run.sent.has(key));
  const duplicates = stored.size - new Set(stored.values()).size;
  return {
    missing: missing.length,
    committedUnanswered: unanswered.length - unknown.length,
    unknown: unknown.length,
    duplicates,
  };
}

let failed = false;
try {
  await assertPortsFree([PORT]);

  // ---------------------------------------------------------------- 1. sustained load
  let server = startApi();
  await waitForHealth();
  const menu = await firstMenu();
  const tokens = await registerClients(CLIENTS, 'a');
  const run = bookingLoad(tokens, menu, SECONDS);
  const result = await run.instance;
  server.child.kill('SIGTERM');
  await server.exited;
  const stored = storedBookings();
  const check = reconcile(run, stored);
  const fivexx = result['5xx'] ?? 0;
  console.log(
    `\nLoad: ${CLIENTS} clients for ${SECONDS} s — ${result.requests.total} requests, ${Math.round(result.requests.average)} req/s, p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms`,
  );
  console.log(
    `  201 created ${run.stats.created}, retries answered 200 with the same booking ${run.stats.replayed}, mismatched ${run.stats.replayMismatch}, other statuses ${JSON.stringify(run.stats.other)}, 5xx ${fivexx}, errors ${result.errors}, timeouts ${result.timeouts}`,
  );
  console.log(
    `  bookings in the database: ${stored.size} = ${run.stats.created} answered 201 + ${check.committedUnanswered} cut off by the end of the run; missing ${check.missing}, duplicates ${check.duplicates}, unknown ${check.unknown}`,
  );
  if (
    fivexx > 0 ||
    check.missing > 0 ||
    check.duplicates > 0 ||
    check.unknown > 0 ||
    check.committedUnanswered > CLIENTS ||
    stored.size !== run.stats.created + check.committedUnanswered ||
    run.stats.replayMismatch > 0
  )
    failed = true;

  // ---------------------------------------------------------------- 2. SIGTERM under load
  server = startApi();
  await waitForHealth();
  const tokens2 = await registerClients(Math.min(CLIENTS, 50), 'b');
  const before = storedBookings();
  const run2 = bookingLoad(tokens2, menu, 10);
  await new Promise((r) => setTimeout(r, 4000));
  const termAt = performance.now();
  server.child.kill('SIGTERM');
  const exit = /** @type {{ code: number | null, signal: string | null }} */ (await server.exited);
  const exitMs = performance.now() - termAt;
  run2.instance.stop?.();
  await run2.instance;
  const after = storedBookings();
  const check2 = reconcile(run2, new Map([...after].filter(([id]) => !before.has(id))));
  const other5xx = Object.entries(run2.stats.other)
    .filter(([status]) => status.startsWith('5') && status !== '503')
    .reduce((sum, [, n]) => sum + n, 0);
  console.log(
    `\nSIGTERM under load: exited (${exit.code ?? exit.signal}) ${Math.round(exitMs)} ms after the signal; ${run2.created.size} bookings acknowledged, ${check2.missing} missing, ${check2.duplicates} duplicates; answered 503 while stopping: ${run2.stats.other['503'] ?? 0}; other 5xx: ${other5xx}`,
  );
  if (check2.missing > 0 || check2.duplicates > 0 || other5xx > 0 || exitMs > 10_000) failed = true;
} finally {
  rmSync(dataDir, { recursive: true, force: true });
}
console.log(failed ? '\n✖ stress test failed' : '\n✔ stress test passed');
process.exit(failed ? 1 : 0);
