// The kitchen engine against a plain read: GET /api/prep/plan as the chef over a range holding
// many confirmed orders, against the time to SELECT the same order, guest and substitution rows
// from the same SQLite file with better-sqlite3.
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import Database from 'better-sqlite3';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, ROOT } from '../lib/system.mjs';
import { median, runJsonScript } from './stats.mjs';

/** @param {string} api */
export async function signInAsChef(api) {
  const chef = DEMO_ACCOUNTS.find((a) => a.role === 'chef');
  const res = await fetch(`${api}/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: chef?.email, password: DEMO_PASSWORD }),
    signal: AbortSignal.timeout(30_000),
  });
  if (res.status !== 200) throw new Error(`chef sign-in answered ${res.status}`);
  return /** @type {{ accessToken: string }} */ (await res.json()).accessToken;
}

/**
 * Times `runs` plan requests one after another (after one unmeasured warm-up request).
 * @param {{ api: string, token: string, from: string, to: string, runs: number }} options
 */
export async function timePlan({ api, token, from, to, runs }) {
  const url = `${api}/prep/plan?from=${from}&to=${to}`;
  /** @type {number[]} */
  const times = [];
  let bytes = 0;
  let orders = 0;
  let failures = 0;
  for (let i = 0; i <= runs; i += 1) {
    const started = performance.now();
    /** @type {Response} */
    let res;
    try {
      res = await fetch(url, {
        headers: { authorization: `Bearer ${token}` },
        signal: AbortSignal.timeout(120_000),
      });
    } catch (error) {
      // A kept-alive socket closed by the server as it was reused: run this one again.
      failures += 1;
      if (failures > 3) throw error;
      i -= 1;
      continue;
    }
    const body = await res.text();
    const ms = performance.now() - started;
    if (res.status !== 200) throw new Error(`GET ${url} answered ${res.status}: ${body}`);
    if (i === 0) continue;
    times.push(ms);
    bytes = Buffer.byteLength(body);
    orders = /** @type {{ orders: unknown[] }} */ (JSON.parse(body)).orders.length;
  }
  return { runs, medianMs: median(times), maxMs: Math.max(...times), bytes, orders };
}

/**
 * The same rows the plan reads from the order tables, with better-sqlite3 on its own read-only
 * connection: the confirmed orders in the range, their guests and their substitutions.
 * @param {{ databasePath: string, from: string, to: string, runs: number }} options
 */
export function timeSelect({ databasePath, from, to, runs }) {
  const db = new Database(databasePath, { readonly: true });
  try {
    const inRange = `SELECT id FROM orders WHERE status = 'confirmed' AND event_date BETWEEN ? AND ?`;
    const orders = db.prepare(
      `SELECT * FROM orders WHERE status = 'confirmed' AND event_date BETWEEN ? AND ?
       ORDER BY event_date, service_time`,
    );
    const guests = db.prepare(`SELECT * FROM order_guests WHERE order_id IN (${inRange})`);
    const subs = db.prepare(`SELECT * FROM order_substitutions WHERE order_id IN (${inRange})`);
    /** @type {number[]} */
    const times = [];
    let counts = { orders: 0, guests: 0, substitutions: 0 };
    for (let i = 0; i <= runs; i += 1) {
      const started = performance.now();
      const o = orders.all(from, to);
      const g = guests.all(from, to);
      const s = subs.all(from, to);
      const ms = performance.now() - started;
      if (i === 0) continue;
      times.push(ms);
      counts = { orders: o.length, guests: g.length, substitutions: s.length };
    }
    return { runs, medianMs: median(times), maxMs: Math.max(...times), ...counts };
  } finally {
    db.close();
  }
}

/**
 * Adds `count` confirmed orders over `days` days starting `startDays` from today (past the demo
 * range), then times the plan of the demo range (today and the next 13 days: the seeded demo
 * studio's confirmed events only) and the plan of the added range against the plain read.
 * @param {{ api: string, databasePath: string, count: number, days: number, startDays: number, runs: number }} options
 */
export async function measurePrepPlan({ api, databasePath, count, days, startDays, runs }) {
  if (startDays < 14) throw new Error('the added orders must start after the 14-day demo range');
  const token = await signInAsChef(api);
  const seeded =
    /** @type {{ from: string, to: string, today: string, orders: number, guests: number, substitutions: number }} */ (
      await runJsonScript(
        join(ROOT, 'docker-free-scripts', 'bench', 'seed-plan-orders.mjs'),
        [databasePath, String(count), String(startDays), String(days)],
        { timeoutMs: 180_000, cwd: ROOT },
      )
    );
  if (seeded.orders !== count) throw new Error(`seeded ${seeded.orders} orders, not ${count}`);
  const demoTo = new Date(Date.parse(`${seeded.today}T00:00:00Z`) + 13 * 86_400_000)
    .toISOString()
    .slice(0, 10);
  const demo = await timePlan({ api, token, from: seeded.today, to: demoTo, runs });
  const plan = await timePlan({ api, token, from: seeded.from, to: seeded.to, runs });
  const select = timeSelect({ databasePath, from: seeded.from, to: seeded.to, runs: runs * 3 });
  if (plan.orders !== count || select.orders !== count) {
    throw new Error(
      `the plan holds ${plan.orders} orders and the SELECT ${select.orders}; ${count} were seeded`,
    );
  }
  return { seeded, demo: { ...demo, from: seeded.today, to: demoTo }, plan, select };
}
