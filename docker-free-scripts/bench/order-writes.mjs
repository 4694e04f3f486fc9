// Durable order writes through the whole app: signed-in clients POST /api/orders with autocannon,
// each request with its own Idempotency-Key and a valid body on a date with room, then the
// database is compared with the 201 answers.
import { randomUUID } from 'node:crypto';
import autocannon from 'autocannon';
import Database from 'better-sqlite3';
import { fetchIdempotent } from './stats.mjs';

/** How many unpaid bookings one client may hold (the API's MAX_UNPAID_ORDERS_PER_CLIENT cap). */
export const UNPAID_PER_CLIENT = 50;

/**
 * Signs up `count` new clients through the API, a few at a time (each sign-up hashes a password
 * with argon2id), and returns their access tokens.
 * @param {string} api e.g. http://127.0.0.1:3202/api
 * @param {number} count
 * @param {string} tag
 */
export async function registerClients(api, count, tag) {
  /** @type {string[]} */
  const tokens = [];
  for (let start = 0; start < count; start += 8) {
    const batch = await Promise.all(
      Array.from({ length: Math.min(8, count - start) }, async (_, i) => {
        const res = await fetch(`${api}/auth/register`, {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({
            name: `Bench client ${tag}-${start + i}`,
            email: `bench-${tag}-${start + i}@example.test`,
            password: 'a long table of plated desserts',
          }),
          signal: AbortSignal.timeout(30_000),
        });
        if (res.status !== 201)
          throw new Error(`sign-up answered ${res.status}: ${await res.text()}`);
        return /** @type {{ accessToken: string }} */ (await res.json()).accessToken;
      }),
    );
    tokens.push(...batch);
  }
  return tokens;
}

/**
 * The first public menu: what every benchmark booking books.
 * @param {string} api
 */
export async function firstMenu(api) {
  const res = await fetchIdempotent(`${api}/menus`, { signal: AbortSignal.timeout(10_000) });
  const menus = /** @type {{ items: { id: string, minGuests: number, leadDays: number }[] }} */ (
    await res.json()
  );
  const menu = menus.items[0];
  if (!menu) throw new Error('no public menu to book');
  return menu;
}

const isoIn = (/** @type {number} */ days) =>
  new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/**
 * @param {{ api: string, databasePath: string, seconds: number, connections: number, clients: number }} options
 * `clients`: how many clients to sign up; each may hold UNPAID_PER_CLIENT unpaid bookings, so
 * clients × 50 must exceed what the run can write (the caller sizes it from the SQLite ceiling).
 */
export async function measureOrderWrites({ api, databasePath, seconds, connections, clients }) {
  const tag = randomUUID().slice(0, 8);
  const tokens = await registerClients(api, clients, tag);
  const menu = await firstMenu(api);
  // Dates from the first bookable day onwards, one after another: the default daily capacity
  // (240 plates) takes several bookings of the smallest party, so a date fills only after the
  // run has wrapped round this many days.
  const spreadDays = 2000;
  let next = 0;
  /** @type {Map<string, string>} Idempotency-Key → order id of its 201 */
  const created = new Map();
  /** @type {Set<string>} */
  const sent = new Set();
  /** @type {Record<string, number>} */
  const statuses = {};
  const instance = autocannon({
    url: api,
    connections,
    duration: seconds,
    timeout: 20,
    requests: [
      {
        method: 'POST',
        path: '/api/orders',
        setupRequest: (req, context) => {
          next += 1;
          const key = randomUUID();
          sent.add(key);
          context.key = key;
          return {
            ...req,
            headers: {
              'content-type': 'application/json',
              authorization: `Bearer ${tokens[next % tokens.length]}`,
              'idempotency-key': key,
            },
            body: JSON.stringify({
              menuId: menu.id,
              eventDate: isoIn(menu.leadDays + 2 + (next % spreadDays)),
              serviceTime: '19:30',
              venueAddressLines: ['Bench Hall', `${next} Long Table Street`],
              occasion: `Bench ${tag} ${next}`,
              contactPhone: '+32 470 12 34 56',
              guestCount: menu.minGuests,
              guestRequirements: [{ label: 'Guest 1', allergens: ['milk'], diets: [] }],
              guestDataConsent: true,
              acceptTerms: true,
            }),
          };
        },
        onResponse: (status, body, context) => {
          statuses[status] = (statuses[status] ?? 0) + 1;
          if (status === 201) created.set(String(context.key), JSON.parse(body).id);
        },
      },
    ],
  });
  const result = await instance;

  // The file against the answers. A request still in flight when autocannon stops may commit
  // without its answer being read: counted apart, at most one per connection.
  const db = new Database(databasePath, { readonly: true });
  const rows = /** @type {{ id: string, key: string }[]} */ (
    db
      .prepare('SELECT id, client_request_id AS key FROM orders WHERE occasion LIKE ?')
      .all(`Bench ${tag} %`)
  );
  db.close();
  const storedIds = new Set(rows.map((r) => r.id));
  const missing = [...created.values()].filter((id) => !storedIds.has(id)).length;
  const unanswered = rows.filter((r) => !created.has(r.key));
  const unknown = unanswered.filter((r) => !sent.has(r.key)).length;
  const duplicates = rows.length - new Set(rows.map((r) => r.key)).size;
  const cutOff = unanswered.length - unknown;
  const ok =
    missing === 0 &&
    duplicates === 0 &&
    unknown === 0 &&
    cutOff <= connections &&
    rows.length === created.size + cutOff;
  return {
    clients,
    connections,
    seconds: result.duration,
    created: created.size,
    perSecond: created.size / result.duration,
    p50: result.latency.p50,
    p99: result.latency.p99,
    statuses,
    errors: result.errors,
    timeouts: result.timeouts,
    stored: rows.length,
    cutOff,
    missing,
    duplicates,
    unknown,
    ok,
  };
}
