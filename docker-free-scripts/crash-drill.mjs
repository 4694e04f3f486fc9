// Durability drill: SIGKILL the API in the middle of a stream of bookings, again and again,
// then check the database file directly: integrity ok, every booking the API acknowledged
// (201) is there, and no booking is half-written (each has its audit event and all its guests).
// QUALITY.md, Durability. Needs the built API (`npm run build`); run by `npm test`.
import { fork } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { assertPortsFree, migrateAndSeed, ROOT, systemConfig } from './lib/system.mjs';

const ROUNDS = Number(process.env.DRILL_ROUNDS ?? 5);
const CONCURRENCY = 8;
const PORT = Number(process.env.DRILL_PORT ?? 3310);
const api = `http://127.0.0.1:${PORT}/api`;

const dataDir = mkdtempSync(join(tmpdir(), 'nappe-drill-'));
const config = systemConfig({
  ...process.env,
  NAPPE_API_PORT: String(PORT),
  DATABASE_PATH: join(dataDir, 'drill.sqlite'),
});
migrateAndSeed(config);

function startApi() {
  return fork(join(ROOT, 'api', 'dist', 'main.js'), [], {
    cwd: ROOT,
    stdio: 'ignore',
    env: {
      ...process.env,
      NODE_ENV: 'development',
      PORT: String(PORT),
      DATABASE_PATH: config.databasePath,
      LOG_LEVEL: 'silent',
      THROTTLE_LIMIT: '1000000',
      AUTH_THROTTLE_LIMIT: '1000',
      MAX_UNPAID_ORDERS_PER_CLIENT: '50',
      OUTBOX_WORKER_ENABLED: 'false',
    },
  });
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

/** @param {string} path @param {RequestInit} init */
async function json(path, init = {}) {
  const res = await fetch(`${api}${path}`, {
    ...init,
    headers: { 'content-type': 'application/json', ...(init.headers ?? {}) },
  });
  return { status: res.status, body: /** @type {any} */ (await res.json().catch(() => null)) };
}

const addDays = (/** @type {string} */ iso, /** @type {number} */ days) =>
  new Date(Date.parse(`${iso}T12:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

/** @type {Set<string>} */
const acknowledged = new Set();
/** @type {Map<string, number>} */
const guestsOf = new Map();
let sequence = 0;
const report = [];

for (let round = 1; round <= ROUNDS; round += 1) {
  await assertPortsFree([PORT]);
  const child = startApi();
  const exited = new Promise((r) => child.once('exit', r));
  await waitForHealth();
  // One new client per worker and round: each may hold at most 50 unpaid bookings.
  const tokens = await Promise.all(
    Array.from({ length: CONCURRENCY }, async (_, w) => {
      const res = await json('/auth/register', {
        method: 'POST',
        body: JSON.stringify({
          name: `Drill client ${round}-${w}`,
          email: `drill-${round}-${w}-${Date.now()}@example.test`,
          password: 'crash the kitchen, keep every booking',
        }),
      });
      if (res.status !== 201)
        throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
      return /** @type {string} */ (res.body.accessToken);
    }),
  );
  const menus = (await json('/menus')).body.items;
  const menu = menus[0];
  const terms = await json(
    `/availability?menuId=${menu.id}&from=${addDays(new Date().toISOString().slice(0, 10), 0)}&to=${addDays(new Date().toISOString().slice(0, 10), 1)}`,
  );
  const firstDate = terms.body?.earliestDate ?? addDays(new Date().toISOString().slice(0, 10), 30);

  let killed = false;
  const killAfter = 800 + Math.floor(Math.random() * 1700);
  const before = acknowledged.size;
  setTimeout(() => {
    killed = true;
    child.kill('SIGKILL');
  }, killAfter);

  const worker = async (/** @type {number} */ w) => {
    const auth = { Authorization: `Bearer ${tokens[w]}` };
    let mine = 0;
    while (!killed && mine < 50) {
      mine += 1;
      sequence += 1;
      const n = sequence;
      const guests = 1 + (n % 3);
      const body = {
        menuId: menu.id,
        eventDate: addDays(firstDate, 1 + (n % 300)),
        serviceTime: '19:30',
        venueAddressLines: ['Drill Hall', `${n} Crash Street`],
        occasion: `Drill ${n}`,
        contactPhone: '+32 470 12 34 56',
        guestCount: Math.max(menu.minGuests, guests),
        guestRequirements: Array.from({ length: guests }, (_, i) => ({
          label: `Guest ${i + 1}`,
          allergens: i === 0 ? ['tree_nuts'] : [],
          diets: [],
        })),
        guestDataConsent: true,
        acceptTerms: true,
      };
      try {
        const res = await json('/orders', {
          method: 'POST',
          headers: { ...auth, 'Idempotency-Key': `drill-${n}` },
          body: JSON.stringify(body),
        });
        if (res.status === 201 || res.status === 200) {
          acknowledged.add(res.body.id);
          guestsOf.set(res.body.id, guests);
        } else if (res.status >= 500) {
          throw new Error(
            `round ${round}: booking answered ${res.status}: ${JSON.stringify(res.body)}`,
          );
        }
      } catch (error) {
        if (!killed) throw error;
      }
    }
  };
  await Promise.all(Array.from({ length: CONCURRENCY }, (_, w) => worker(w)));
  await exited;

  // The API is dead: read the file directly, as a restart would.
  const db = new Database(config.databasePath, { fileMustExist: true });
  const integrity = /** @type {{ integrity_check: string }[]} */ (db.pragma('integrity_check'))[0]
    ?.integrity_check;
  const ids = new Set(
    /** @type {{ id: string }[]} */ (db.prepare('SELECT id FROM orders').all()).map((r) => r.id),
  );
  const missing = [...acknowledged].filter((id) => !ids.has(id));
  const withoutEvent = /** @type {{ n: number }} */ (
    db
      .prepare(
        'SELECT count(*) AS n FROM orders o WHERE NOT EXISTS (SELECT 1 FROM order_events e WHERE e.order_id = o.id)',
      )
      .get()
  ).n;
  const guestRows = /** @type {{ order_id: string, n: number }[]} */ (
    db.prepare('SELECT order_id, count(*) AS n FROM order_guests GROUP BY order_id').all()
  );
  const guestCount = new Map(guestRows.map((r) => [r.order_id, r.n]));
  const wrongGuests = [...guestsOf].filter(([id, n]) => (guestCount.get(id) ?? 0) !== n);
  db.close();
  report.push({
    round,
    killAfterMs: killAfter,
    acknowledgedThisRound: acknowledged.size - before,
    inFile: ids.size,
    missing: missing.length,
    withoutEvent,
    wrongGuests: wrongGuests.length,
    integrity,
  });
  if (integrity !== 'ok' || missing.length > 0 || withoutEvent > 0 || wrongGuests.length > 0) {
    console.table(report);
    console.error(`✖ durability drill failed in round ${round}`);
    rmSync(dataDir, { recursive: true, force: true });
    process.exit(1);
  }
}

console.table(report);
console.log(
  `✔ durability drill: ${ROUNDS} SIGKILLs, ${acknowledged.size} acknowledged bookings all present, none half-written, integrity ok`,
);
rmSync(dataDir, { recursive: true, force: true });
