import { randomUUID } from 'node:crypto';
import { OrderStatus, Role, type PaymentKind, type PaymentRecordStatus } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OrderGuestEntity } from '../src/orders/entities/order-guest.entity.js';
import { OrderEntity } from '../src/orders/entities/order.entity.js';
import { PaymentEntity } from '../src/payments/entities/payment.entity.js';
import { User } from '../src/users/entities/user.entity.js';
import {
  bookOrder,
  createBookingApp,
  setStudio,
  signedIn,
  type BookingApp,
} from './factories/booking.js';
import { bearer, create, ingredientLine, recipeBody } from './factories/kitchen.js';

/**
 * The chef's dashboard against hand sums over orders and ledger lines written straight into the
 * database. "Today" is Friday 2026-03-06, 10:00 in Brussels (TEST_NOW). Every expected figure
 * below is worked out by hand in the comment beside it.
 */

let b: BookingApp;
let chef: Awaited<ReturnType<typeof signedIn>>;
let template: OrderEntity;
let menuId: string;
const ids: Record<string, string> = {};

async function seedOrder(
  key: string,
  patch: Partial<OrderEntity>,
  balanceDueDate: string | null,
): Promise<void> {
  const id = randomUUID();
  ids[key] = id;
  const repo = b.t.dataSource.getRepository(OrderEntity);
  await repo.insert({
    ...template,
    id,
    reference: `N-2026-01${String(Object.keys(ids).length).padStart(2, '0')}`,
    clientRequestId: `seed-${id}`,
    quote: { ...template.quote, balanceDueDate },
    holdExpiresAt: null,
    createdAt: new Date(`2026-02-0${Object.keys(ids).length}T08:00:00Z`),
    ...patch,
  });
}

async function pay(
  key: string,
  kind: PaymentKind,
  amountMinor: number,
  settledAt: string,
  status: PaymentRecordStatus = 'succeeded',
  refundOf: string | null = null,
): Promise<string> {
  const at = new Date(settledAt);
  const id = randomUUID();
  await b.t.dataSource.getRepository(PaymentEntity).insert({
    id,
    orderId: ids[key]!,
    kind,
    status,
    amountMinor,
    currency: 'EUR',
    idempotencyKey: `seed-${randomUUID()}`,
    providerSessionId: null,
    checkoutUrl: null,
    checkoutExpiresAt: null,
    providerPaymentIntentId: null,
    providerRefundId: null,
    refundOfPaymentId: refundOf,
    operation: kind === 'refund' ? 'cancel' : null,
    targetGuestCount: null,
    failureMessage: null,
    seeded: true,
    createdAt: at,
    settledAt: status === 'succeeded' ? at : null,
    updatedAt: at,
  });
  return id;
}

beforeAll(async () => {
  b = await createBookingApp();
  chef = await signedIn(b.t, Role.Chef);
  await setStudio(b.t, { timeZone: 'Europe/Brussels' });
  // Almonds at 20.00 a kilo = 2 cents a gram; the crumble yields what goes in, so it costs
  // 2 cents a gram too; a plate carries 10 g of it: 20 cents a plate.
  const almonds = await create(b.t, chef.token, '/api/ingredients', {
    name: 'Ground almonds',
    purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 2000 },
    allergens: { contains: [{ food: 'almond' }], mayContain: [] },
    dietary: { animalOrigins: [], alcohol: false },
  });
  const crumble = await create(
    b.t,
    chef.token,
    '/api/recipes',
    recipeBody([ingredientLine(almonds, 100)], {
      name: 'Almond crumble',
      yieldG: 100,
      storage: 'dry',
      shelfLifeHours: 72,
      steps: [
        { name: 'Bake', kind: 'bake', activeMinutes: 30, waitMinutes: 20, temperatureC: 160 },
      ],
    }),
  );
  const dessert = await create(b.t, chef.token, '/api/desserts', {
    name: 'Almond plate',
    components: [{ recipeId: crumble, quantity: 10, unit: 'g' }],
  });
  menuId = await create(b.t, chef.token, '/api/menus', {
    name: 'Almond supper',
    dessertIds: [dessert],
    pricePerGuestMinor: 1200,
    minGuests: 2,
    maxGuests: 200,
    leadDays: 3,
    active: true,
  });
  const client = await signedIn(b.t, Role.Client);
  const booked = await bookOrder(b.t, client.token, menuId, { guestCount: 20 });
  template = await b.t.dataSource.getRepository(OrderEntity).findOneByOrFail({ id: booked.id });

  // A: served in February, paid in full in January.
  await seedOrder('A', { status: OrderStatus.Completed, eventDate: '2026-02-10' }, null);
  await pay('A', 'full', 24_000, '2026-01-15T10:00:00Z');
  // B: served in February; the deposit settled 23:30 UTC on 31 January = 00:30 on 1 February
  // in Brussels (UTC+1 in winter, IANA tz database), so it counts for February.
  await seedOrder('B', { status: OrderStatus.Completed, eventDate: '2026-02-25' }, '2026-02-11');
  await pay('B', 'deposit', 7_200, '2026-01-31T23:30:00Z');
  await pay('B', 'balance', 16_800, '2026-02-11T09:00:00Z');
  // C: cancelled; deposit in February, half refunded in March; a refund still pending is not
  // money out yet, and an expired checkout is not money in.
  await seedOrder('C', { status: OrderStatus.Cancelled, eventDate: '2026-03-20' }, '2026-03-06');
  const cDeposit = await pay('C', 'deposit', 7_200, '2026-02-03T12:00:00Z');
  await pay('C', 'refund', 3_600, '2026-03-01T12:00:00Z', 'succeeded', cDeposit);
  await pay('C', 'refund', 1_000, '2026-03-02T12:00:00Z', 'pending', cDeposit);
  await pay('C', 'full', 5_000, '2026-03-02T12:00:00Z', 'expired');
  // D: confirmed for Tuesday 10 March; balance was due 24 February and 16 800 is still open;
  // a guest who cannot eat tree nuts has the almond plate.
  await seedOrder('D', { status: OrderStatus.Confirmed, eventDate: '2026-03-10' }, '2026-02-24');
  await pay('D', 'deposit', 7_200, '2026-02-20T12:00:00Z');
  await b.t.dataSource.getRepository(OrderGuestEntity).insert({
    orderId: ids.D!,
    position: 0,
    label: 'Uncle Bram',
    tableLabel: '3',
    allergens: ['tree_nuts'],
    diets: [],
    notes: null,
  });
  // E: requested (waiting for the chef) for 12 March, paid in full in March.
  await seedOrder('E', { status: OrderStatus.Requested, eventDate: '2026-03-12' }, null);
  await pay('E', 'full', 24_000, '2026-03-02T10:00:00Z');
  // F: confirmed for today at 10:30; with 30 + 20 minutes of crumble and 60 minutes for
  // plating it needed to start by 08:40 — too late now at 10:00.
  await seedOrder(
    'F',
    { status: OrderStatus.Confirmed, eventDate: '2026-03-06', serviceTime: '10:30' },
    null,
  );
  await pay('F', 'full', 24_000, '2026-03-03T10:00:00Z');
  // G: an expired booking on Sunday 8 March is not an event.
  await seedOrder('G', { status: OrderStatus.Expired, eventDate: '2026-03-08' }, null);
  // H: money settled before the 12-month window (April 2025 – March 2026) is left out.
  await seedOrder('H', { status: OrderStatus.Completed, eventDate: '2025-03-10' }, null);
  await pay('H', 'full', 24_000, '2025-02-28T10:00:00Z');
});
afterAll(async () => b.t.close());

interface DashboardBody {
  today: string;
  upcoming: Array<{
    reference: string;
    eventDate: string;
    status: string;
    guests: number;
    menuName: string;
  }>;
  requests: Array<{ id: string; totalMinor: number }>;
  revenueByMonth: Array<{
    month: string;
    receivedMinor: number;
    refundedMinor: number;
    revenueMinor: number;
  }>;
  platesByWeek: Array<{ weekStart: string; plates: number }>;
  foodCost: {
    basis: string;
    months: Array<{
      month: string;
      costMinor: number;
      netRevenueMinor: number;
      percent: number | null;
    }>;
  };
  alerts: Array<{ kind: string; orderId: string; message: string; balanceMinor?: number }>;
}

async function dashboard(): Promise<DashboardBody> {
  const res = await b.t.http.get('/api/insights/dashboard').set(bearer(chef.token)).expect(200);
  return res.body as DashboardBody;
}

describe('GET /api/insights/dashboard', () => {
  it('is for the chef only (401 / 403)', async () => {
    await b.t.http.get('/api/insights/dashboard').expect(401);
    for (const role of [Role.Staff, Role.Client]) {
      const who = await signedIn(b.t, role);
      await b.t.http.get('/api/insights/dashboard').set(bearer(who.token)).expect(403);
    }
  });

  it('lists the next 14 days of events and the requests waiting for a decision', async () => {
    const d = await dashboard();
    expect(d.today).toBe('2026-03-06');
    // 6 March to 19 March: F (today), D (10th), E (12th); G expired, C cancelled.
    expect(d.upcoming.map((e) => [e.eventDate, e.status])).toEqual([
      ['2026-03-06', 'confirmed'],
      ['2026-03-10', 'confirmed'],
      ['2026-03-12', 'requested'],
    ]);
    expect(d.upcoming[0]).toMatchObject({ guests: 20, menuName: 'Almond supper' });
    expect(d.requests.map((r) => r.id)).toEqual([ids.E]);
  });

  it('sums the ledger by settled month in the studio’s zone (payments in − refunds out)', async () => {
    const d = await dashboard();
    expect(d.revenueByMonth).toHaveLength(12);
    expect(d.revenueByMonth[0]!.month).toBe('2025-04');
    expect(d.revenueByMonth[11]!.month).toBe('2026-03');
    const byMonth = Object.fromEntries(d.revenueByMonth.map((r) => [r.month, r]));
    // January: A 24 000.
    expect(byMonth['2026-01']).toEqual({
      month: '2026-01',
      receivedMinor: 24_000,
      refundedMinor: 0,
      revenueMinor: 24_000,
    });
    // February: B 7 200 + 16 800, C 7 200, D 7 200 = 38 400.
    expect(byMonth['2026-02']).toEqual({
      month: '2026-02',
      receivedMinor: 38_400,
      refundedMinor: 0,
      revenueMinor: 38_400,
    });
    // March: E 24 000 + F 24 000 = 48 000 in; C's settled refund 3 600 out = 44 400.
    expect(byMonth['2026-03']).toEqual({
      month: '2026-03',
      receivedMinor: 48_000,
      refundedMinor: 3_600,
      revenueMinor: 44_400,
    });
    const total = d.revenueByMonth.reduce((s, r) => s + r.revenueMinor, 0);
    expect(total).toBe(24_000 + 38_400 + 44_400);
  });

  it('counts confirmed and completed plates by ISO week (weeks start on Monday)', async () => {
    const d = await dashboard();
    // 12 weeks back, this week, 4 ahead = 17 Mondays, from 8 December 2025.
    expect(d.platesByWeek).toHaveLength(17);
    expect(d.platesByWeek[0]!.weekStart).toBe('2025-12-08');
    const plates = Object.fromEntries(d.platesByWeek.map((w) => [w.weekStart, w.plates]));
    expect(plates['2026-02-09']).toBe(20); // A, Tuesday 10 Feb
    expect(plates['2026-02-23']).toBe(20); // B, Wednesday 25 Feb
    expect(plates['2026-03-02']).toBe(20); // F, Friday 6 Mar
    expect(plates['2026-03-09']).toBe(20); // D, Tuesday 10 Mar (E is only requested)
    expect(d.platesByWeek.reduce((s, w) => s + w.plates, 0)).toBe(80);
  });

  it('works out food cost % of the events served from the recipes’ current costs', async () => {
    const d = await dashboard();
    expect(d.foodCost.basis).toMatch(/current/);
    const feb = d.foodCost.months.find((m) => m.month === '2026-02')!;
    // A and B: 2 × 20 plates × 20 cents = 800. Net of tax: 240.00 with 21 % VAT included holds
    // 240.00 × 21/121 = 41.65 of tax (EU VAT arithmetic), so 198.35 each: 2 × 19 835 = 39 670.
    expect(feb.costMinor).toBe(800);
    expect(feb.netRevenueMinor).toBe(39_670);
    // 800 / 39 670 = 2.017 % → 2.0 to one decimal.
    expect(feb.percent).toBe(2);
    // March: F is today, not yet served; nothing else. No revenue → no percentage.
    expect(d.foodCost.months.find((m) => m.month === '2026-03')).toMatchObject({
      costMinor: 0,
      percent: null,
    });

    // Current costs: almonds doubling in price doubles February's food cost.
    const ingredients = await b.t.http
      .get('/api/ingredients?pageSize=100')
      .set(bearer(chef.token))
      .expect(200);
    const almond = (ingredients.body as { items: Array<Record<string, unknown>> }).items.find(
      (i) => i.name === 'Ground almonds',
    )!;
    await b.t.http
      .put(`/api/ingredients/${String(almond.id)}`)
      .set(bearer(chef.token))
      .send({
        name: 'Ground almonds',
        purchase: { packSize: 1, packUnit: 'kg', packPriceMinor: 4000 },
        allergens: { contains: [{ food: 'almond' }], mayContain: [] },
        dietary: { animalOrigins: [], alcohol: false },
      })
      .expect(200);
    const after = await dashboard();
    expect(after.foodCost.months.find((m) => m.month === '2026-02')).toMatchObject({
      costMinor: 1_600,
      percent: 4,
    });
  });

  it('raises alerts: lead time too short, balance overdue, unresolved allergy conflict', async () => {
    const d = await dashboard();
    const kinds = (id: string) =>
      d.alerts
        .filter((a) => a.orderId === id)
        .map((a) => a.kind)
        .sort();
    expect(kinds(ids.F!)).toEqual(['lead_time']);
    expect(kinds(ids.D!)).toEqual(['allergy_conflict', 'balance_overdue']);
    // 24 000 − 7 200 paid = 16 800 still open.
    expect(d.alerts.find((a) => a.kind === 'balance_overdue')?.balanceMinor).toBe(16_800);
    expect(d.alerts.find((a) => a.kind === 'allergy_conflict')?.message).toMatch(
      /1 guest plate still conflicts/,
    );
    // E is paid in full and has no guests with requirements; A–C, G, H are not live.
    expect(new Set(d.alerts.map((a) => a.orderId))).toEqual(new Set([ids.D, ids.F]));
    // The clock moves on past D's event: its alerts go with it.
    b.clock.set('2026-03-11T09:00:00.000Z');
    try {
      const later = await dashboard();
      expect(later.alerts.some((a) => a.orderId === ids.D)).toBe(false);
    } finally {
      b.clock.set('2026-03-06T09:00:00.000Z');
    }
  });
});

describe('GET /api/orders: event date range and search (the order inbox)', () => {
  const list = async (query: string, token = chef.token) => {
    const res = await b.t.http
      .get(`/api/orders?pageSize=100&${query}`)
      .set(bearer(token))
      .expect(200);
    return res.body as { items: Array<{ id: string }>; total: number };
  };

  it('filters by event date, both ends included, with status and pagination', async () => {
    // 6–12 March: F (6th), G (8th), D (10th), E (12th).
    const week = await list('from=2026-03-06&to=2026-03-12');
    expect(new Set(week.items.map((o) => o.id))).toEqual(new Set([ids.F, ids.G, ids.D, ids.E]));
    expect(week.total).toBe(4);
    const confirmed = await list('from=2026-03-06&to=2026-03-12&status=confirmed');
    expect(new Set(confirmed.items.map((o) => o.id))).toEqual(new Set([ids.F, ids.D]));
    const page = await b.t.http
      .get('/api/orders?from=2026-03-06&to=2026-03-12&pageSize=3&page=2')
      .set(bearer(chef.token))
      .expect(200);
    expect((page.body as { items: unknown[]; total: number }).items).toHaveLength(1);
    expect((await list('from=2026-06-01')).items.map((o) => o.id)).toEqual([template.id]);
    expect((await list('to=2025-12-31')).items.map((o) => o.id)).toEqual([ids.H]);
  });

  it('searches the reference or the client’s name, any case, with % and _ taken literally', async () => {
    const named = await signedIn(b.t, Role.Client);
    await b.t.dataSource
      .getRepository(OrderEntity)
      .update({ id: ids.E! }, { clientId: named.user.id });
    await b.t.dataSource
      .getRepository(User)
      .update({ id: named.user.id }, { name: 'Margaux Dewilde' });
    expect((await list('q=dewil')).items.map((o) => o.id)).toEqual([ids.E]);
    const reference = (
      await b.t.dataSource.getRepository(OrderEntity).findOneByOrFail({ id: ids.D! })
    ).reference;
    expect((await list(`q=${reference.toLowerCase()}`)).items.map((o) => o.id)).toEqual([ids.D]);
    expect((await list('q=%25')).total).toBe(0);
    expect((await list('q=_')).total).toBe(0);
    // A client's search stays inside their own orders.
    expect((await list(`q=${reference}`, named.token)).total).toBe(0);
    expect((await list('q=margaux', named.token)).items.map((o) => o.id)).toEqual([ids.E]);
  });

  it('refuses malformed dates, a reversed range and an over-long search (400)', async () => {
    const auth = bearer(chef.token);
    for (const query of [
      'from=2026-02-30',
      'to=06/03/2026',
      'from=2026-03-12&to=2026-03-06',
      `q=${'x'.repeat(101)}`,
      'from=2026-03-01&from=2026-03-02',
    ]) {
      const res = await b.t.http.get(`/api/orders?${query}`).set(auth);
      expect(res.status, query).toBe(400);
    }
  });
});
