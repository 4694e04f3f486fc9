// Puts COUNT confirmed orders, with guests, requirements, a few recorded substitutions, a
// deposit in the ledger and their audit trail, into a seeded database, spread evenly over DAYS
// days starting START days from today (the studio's time zone). Written through the app's own
// TypeORM entities and data source from api/dist, in the shapes the demo seed writes
// (api/src/database/demo-orders-seed.ts), with the price computed by the shared quote function
// the booking path uses. Booking each through the API and confirming it as the chef would take
// minutes; the prep plan reads the same rows either way.
//   node seed-plan-orders.mjs <database> <count> <start> <days>  → one JSON line on stdout
import { randomUUID } from 'node:crypto';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ROOT } from '../lib/system.mjs';

const [databasePath, countArg, startArg, daysArg] = process.argv.slice(2);
const count = Number(countArg);
const start = Number(startArg);
const days = Number(daysArg);
if (!databasePath || !(count > 0) || !(start >= 0) || !(days > 0)) {
  console.error('usage: node seed-plan-orders.mjs <database> <count> <start> <days>');
  process.exit(2);
}

/** @param {string} path a module of the built API, relative to api/dist */
const apiModule = (path) => import(pathToFileURL(join(ROOT, 'api', 'dist', path)).href);
// @nappe/shared as the API resolves it (its built package).
const sharedSpecifier = '@nappe/shared';
/** @type {any} */
const shared = await import(sharedSpecifier);
const { openDataSource } = await apiModule('database/data-source.js');
const { loadStudio } = await apiModule('studio/booking-settings.js');
const { menuFromRows } = await apiModule('kitchen/catalogue/catalogue-rows.js');
const { MenuEntity } = await apiModule('kitchen/entities/menu.entity.js');
const { MenuDessertEntity } = await apiModule('kitchen/entities/menu-dessert.entity.js');
const { OrderEntity } = await apiModule('orders/entities/order.entity.js');
const { OrderGuestEntity } = await apiModule('orders/entities/order-guest.entity.js');
const { OrderEventEntity } = await apiModule('orders/entities/order-event.entity.js');
const { PaymentEntity } = await apiModule('payments/entities/payment.entity.js');
const { OrderSubstitutionEntity } = await apiModule(
  'allergy-notes/entities/order-substitution.entity.js',
);
const { User } = await apiModule('users/entities/user.entity.js');

/** Invented guest requirements, in the codes the demo bookings use. */
const GUESTS = [
  { label: 'Table 1, seat 2', table: '1', allergens: ['tree_nuts'], diets: [] },
  { label: 'Table 2, seat 5', table: '2', allergens: [], diets: ['vegetarian'] },
  { label: 'Table 3, seat 1', table: '3', allergens: ['gluten'], diets: [] },
  { label: 'Table 4, seat 4', table: '4', allergens: ['milk'], diets: ['vegan'] },
  { label: 'Table 5, seat 3', table: '5', allergens: [], diets: ['no_alcohol'] },
  { label: 'Table 6, seat 6', table: '6', allergens: ['sesame'], diets: [] },
  { label: 'Table 7, seat 2', table: '7', allergens: [], diets: ['no_gelatin'] },
];
const SERVICE_TIMES = ['12:30', '15:00', '18:30', '19:30', '20:00', '21:00'];
const CHUNK = 100;

/**
 * @param {any} m entity manager
 * @param {any} entity
 * @param {object[]} rows
 */
async function insertAll(m, entity, rows) {
  for (let i = 0; i < rows.length; i += CHUNK) await m.insert(entity, rows.slice(i, i + CHUNK));
}

const dataSource = await openDataSource(databasePath);
try {
  const result = await dataSource.transaction(async (/** @type {any} */ m) => {
    const studio = await loadStudio(m);
    const now = new Date();
    const today = shared.dateInTimeZone(now, studio.settings.timeZone);
    const from = shared.addIsoDays(today, start);
    const to = shared.addIsoDays(from, days - 1);
    const client = await m.findOneBy(User, { email: 'client@nappe.test' });
    const chef = await m.findOneBy(User, { role: 'chef' });
    if (!client || !chef) throw new Error('seed the demo studio first (no demo client or chef)');

    /** @type {any[]} */
    const menus = [];
    for (const row of await m.find(MenuEntity, { order: { name: 'ASC' } })) {
      if (!row.active) continue;
      const desserts = await m.find(MenuDessertEntity, {
        where: { menuId: row.id },
        order: { position: 'ASC' },
      });
      if (desserts.length > 0) menus.push(menuFromRows(row, desserts));
    }
    if (menus.length === 0) throw new Error('no active menu with desserts to book');

    // Substitutions the demo chef recorded, by menu: each is valid for that menu's desserts.
    /** @type {Map<string, any[]>} */
    const subsByMenu = new Map();
    for (const sub of await m.find(OrderSubstitutionEntity)) {
      const order = await m.findOneBy(OrderEntity, { id: sub.orderId });
      if (!order) continue;
      subsByMenu.set(order.menuId, [...(subsByMenu.get(order.menuId) ?? []), sub]);
    }

    const year = today.slice(0, 4);
    const last = await m
      .createQueryBuilder(OrderEntity, 'o')
      .select('MAX(CAST(SUBSTR(o.reference, 8) AS INTEGER))', 'last')
      .where('o.reference LIKE :p', { p: `N-${year}-%` })
      .getRawOne();
    const firstNumber = Number(last?.last ?? 0) + 1;

    /** @type {object[]} */
    const orders = [];
    /** @type {object[]} */
    const guests = [];
    /** @type {object[]} */
    const payments = [];
    /** @type {object[]} */
    const events = [];
    /** @type {object[]} */
    const substitutions = [];
    const at = (/** @type {number} */ minutesAgo) => new Date(now.getTime() - minutesAgo * 60_000);
    for (let i = 0; i < count; i += 1) {
      const menu = menus[i % menus.length];
      const rules = shared.menuBookingRules(menu);
      const guestCount = Math.min(rules.maxGuests, rules.minGuests + ((i * 7) % 31));
      const eventDate = shared.addIsoDays(from, i % days);
      const quote = shared.computeQuote({
        menu,
        settings: studio.settings,
        guestCount,
        eventDate,
        today,
      });
      const id = randomUUID();
      orders.push({
        id,
        reference: `N-${year}-${String(firstNumber + i).padStart(4, '0')}`,
        clientId: client.id,
        menuId: menu.id,
        status: shared.OrderStatus.Confirmed,
        eventDate,
        serviceTime: SERVICE_TIMES[i % SERVICE_TIMES.length],
        venueAddressLines: ['Bench Hall', `${i + 1} Long Table Street`, '9000 Gent'],
        occasion: `Bench plan event ${i + 1}`,
        contactPhone: '+32470000000',
        guestCount,
        plates: shared.platesForGuests(guestCount, rules.platesPerGuest),
        currency: quote.currency,
        totalMinor: quote.totalMinor,
        retainedMinor: 0,
        pricing: quote.pricing,
        quote,
        clientRequestId: `bench-plan-${id}`,
        requestHash: 'bench',
        holdExpiresAt: null,
        amountVersion: 2,
        createdAt: at(3 * 24 * 60),
        updatedAt: at(60),
      });
      const listed = Array.from(
        { length: Math.min(guestCount, 1 + (i % 3)) },
        (_, k) => /** @type {(typeof GUESTS)[number]} */ (GUESTS[(i + k) % GUESTS.length]),
      );
      listed.forEach((g, position) =>
        guests.push({
          orderId: id,
          position,
          label: g.label,
          tableLabel: g.table,
          allergens: g.allergens,
          diets: g.diets,
          notes: null,
        }),
      );
      // One order in five of a menu with recorded substitutions gets one for its first guest.
      const subs = subsByMenu.get(menu.id) ?? [];
      if (subs.length > 0 && i % 5 === 0) {
        const sub = subs[i % subs.length];
        substitutions.push({
          id: randomUUID(),
          orderId: id,
          guestPosition: 0,
          guestLabel: listed[0]?.label ?? 'Guest 1',
          dessertId: sub.dessertId,
          changes: sub.changes,
          note: null,
          recordedBy: chef.id,
          recordedAt: at(2 * 24 * 60),
        });
      }
      const paidAt = at(3 * 24 * 60 - 5);
      payments.push({
        id: randomUUID(),
        orderId: id,
        kind: quote.paymentPlan === 'full' ? 'full' : 'deposit',
        status: 'succeeded',
        amountMinor: quote.depositMinor,
        currency: quote.currency,
        idempotencyKey: `bench:${id}:deposit`,
        providerSessionId: null,
        checkoutUrl: null,
        checkoutExpiresAt: null,
        providerPaymentIntentId: null,
        providerRefundId: null,
        refundOfPaymentId: null,
        operation: null,
        targetGuestCount: null,
        failureMessage: null,
        seeded: true,
        createdAt: at(3 * 24 * 60),
        settledAt: paidAt,
        updatedAt: paidAt,
      });
      const trail = [
        [client.id, 'client', null, shared.OrderStatus.PendingPayment, 'Booked; awaiting payment'],
        [
          null,
          'system',
          shared.OrderStatus.PendingPayment,
          shared.OrderStatus.Requested,
          'Deposit received (benchmark record)',
        ],
        [
          chef.id,
          'chef',
          shared.OrderStatus.Requested,
          shared.OrderStatus.Confirmed,
          'Confirmed by the chef; added to the prep plan',
        ],
      ];
      trail.forEach(([actorUserId, actorRole, fromStatus, toStatus, summary], k) =>
        events.push({
          id: randomUUID(),
          orderId: id,
          seq: k + 1,
          actorUserId,
          actorRole,
          fromStatus,
          toStatus,
          summary,
          reason: null,
          at: at(3 * 24 * 60 - k * 60),
        }),
      );
    }
    await insertAll(m, OrderEntity, orders);
    await insertAll(m, OrderGuestEntity, guests);
    await insertAll(m, OrderSubstitutionEntity, substitutions);
    await insertAll(m, PaymentEntity, payments);
    await insertAll(m, OrderEventEntity, events);
    return {
      from,
      to,
      today,
      timeZone: studio.settings.timeZone,
      orders: orders.length,
      guests: guests.length,
      substitutions: substitutions.length,
      menus: menus.length,
    };
  });
  console.log(JSON.stringify(result));
} finally {
  await dataSource.destroy();
}
