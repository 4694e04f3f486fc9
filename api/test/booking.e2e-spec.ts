import { addIsoDays, OrderStatus, Role } from '@nappe/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { OrderEntity } from '../src/orders/entities/order.entity.js';
import { OrderEventEntity } from '../src/orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../src/orders/entities/order-guest.entity.js';
import {
  bearer,
  bookOrder,
  createBookingApp,
  makeMenu,
  newKey,
  orderBody,
  setStudio,
  signedIn,
  TEST_NOW,
  type BookingApp,
} from './factories/booking.js';

let app: BookingApp;
let chef: string;
let staff: string;
let menu: string;

beforeAll(async () => {
  app = await createBookingApp();
  chef = (await signedIn(app.t, Role.Chef)).token;
  staff = (await signedIn(app.t, Role.Staff)).token;
  menu = await makeMenu(app.t, chef, { pricePerGuestMinor: 1200, minGuests: 2, leadDays: 3 });
});
afterAll(async () => app.t.close());
beforeEach(async () => {
  app.clock.set(TEST_NOW);
  await setStudio(app.t, {
    timeZone: 'Europe/Brussels',
    dailyPlateCapacity: 240,
    taxRateBp: 2100,
    pricesIncludeTax: true,
    depositPercent: 30,
    balanceDueDaysBefore: 14,
    blackoutDates: [],
  });
});

const client = async () => (await signedIn(app.t, Role.Client)).token;

describe('GET /api/booking-terms', () => {
  it('is public and states the studio’s terms and tiers in words', async () => {
    const res = await app.t.http.get('/api/booking-terms').expect(200);
    expect(res.body).toMatchObject({
      currency: 'EUR',
      pricesIncludeTax: true,
      taxRateBp: 2100,
      depositPercent: 30,
      balanceDueDaysBefore: 14,
    });
    expect(res.body.cancellationPolicy).toEqual([
      'Cancel 30 days or more before the event: 100 % of what you paid is refunded.',
      'Cancel 14 to 29 days before the event: 50 % of what you paid is refunded.',
      'Cancel less than 14 days before the event, up to the day itself: nothing is refunded.',
    ]);
    expect(res.body.terms.join(' ')).toMatch(/deposit of 30 %/);
  });
});

describe('POST /api/quotes (computed by the server only)', () => {
  it('prices 20 guests at €12.00 with 21 % VAT included, a 30 % deposit and the balance date', async () => {
    const res = await app.t.http
      .post('/api/quotes')
      .send({ menuId: menu, eventDate: '2026-06-20', guestCount: 20 })
      .expect(200);
    // Council Directive 2006/112/EC Art. 73 and 78: the taxable amount excludes the VAT itself,
    // so the VAT inside a gross price is gross × r / (1 + r) — here 24000 × 21 / 121 = 4165.29…
    // cents, rounded to 4165. Worked out independently with integers:
    const gross = 20n * 1200n;
    const vat = (gross * 2100n * 2n + 12100n) / (12100n * 2n); // half up
    expect(res.body).toMatchObject({
      subtotalMinor: 24000,
      totalMinor: 24000,
      taxMinor: Number(vat),
      netMinor: 24000 - Number(vat),
      depositMinor: 7200, // 30 % of 24000
      balanceMinor: 16800,
      paymentPlan: 'deposit_and_balance',
      quotedOn: '2026-03-06',
    });
    expect(res.body.taxMinor).toBe(4165);
    // 14 days before 2026-06-20, by the proleptic Gregorian calendar (Date.UTC as the oracle).
    const due = new Date(Date.UTC(2026, 5, 20) - 14 * 86_400_000).toISOString().slice(0, 10);
    expect(res.body.balanceDueDate).toBe(due);
    expect(due).toBe('2026-06-06');
  });

  it('adds the tax when prices exclude it', async () => {
    await setStudio(app.t, { pricesIncludeTax: false });
    const res = await app.t.http
      .post('/api/quotes')
      .send({ menuId: menu, eventDate: '2026-06-20', guestCount: 20 })
      .expect(200);
    // 21 % of €240.00 is €50.40, exactly.
    expect(res.body).toMatchObject({ netMinor: 24000, taxMinor: 5040, totalMinor: 29040 });
  });

  it('refuses a price, a total or a status sent by the client (400)', async () => {
    for (const extra of [{ totalMinor: 1 }, { pricePerGuestMinor: 1 }, { status: 'confirmed' }]) {
      const res = await app.t.http
        .post('/api/quotes')
        .send({ menuId: menu, eventDate: '2026-06-20', guestCount: 20, ...extra })
        .expect(400);
      expect(res.body.message.join(' ')).toMatch(/not accepted here/);
    }
  });

  it('answers 404 for an unknown menu and 409 for one the chef switched off', async () => {
    await app.t.http
      .post('/api/quotes')
      .send({
        menuId: '00000000-0000-4000-8000-000000000000',
        eventDate: '2026-06-20',
        guestCount: 20,
      })
      .expect(404);
    const off = await makeMenu(app.t, chef, { name: 'Resting menu', active: false });
    const res = await app.t.http
      .post('/api/quotes')
      .send({ menuId: off, eventDate: '2026-06-20', guestCount: 20 })
      .expect(409);
    expect(res.body.code).toBe('menu_not_offered');
  });

  it('refuses a past date and a party outside the menu’s limits (400)', async () => {
    const past = await app.t.http
      .post('/api/quotes')
      .send({ menuId: menu, eventDate: '2026-03-05', guestCount: 20 })
      .expect(400);
    expect(past.body.code).toBe('event_date_passed');
    const few = await app.t.http
      .post('/api/quotes')
      .send({ menuId: menu, eventDate: '2026-06-20', guestCount: 1 })
      .expect(400);
    expect(few.body.message).toMatch(/at least 2 guests/);
  });
});

describe('POST /api/orders', () => {
  it('books: 201, awaiting payment, a reference, the price snapshot, the guests and the audit line', async () => {
    const token = await client();
    const res = await app.t.http
      .post('/api/orders')
      .set(bearer(token))
      .set('Idempotency-Key', newKey())
      .send(
        orderBody(menu, {
          guestRequirements: [
            { label: 'Aunt Mireille', table: '2', allergens: ['nuts'], diets: ['vegetarian'] },
          ],
          guestDataConsent: true,
        }),
      )
      .expect(201);
    expect(res.body).toMatchObject({
      status: 'pending_payment',
      guestCount: 20,
      totalMinor: 24000,
      paidMinor: 0,
      balanceMinor: 24000,
      contactPhone: '+32470123456',
      actions: { pay: 'deposit_or_full', cancel: true, changeGuests: false },
    });
    expect(res.body.reference).toMatch(/^N-2026-\d{4}$/);
    expect(res.body.quote.pricing).toMatchObject({ pricePerGuestMinor: 1200, depositPercent: 30 });
    expect(res.body.guests).toEqual([
      { label: 'Aunt Mireille', table: '2', allergens: ['nuts'], diets: ['vegetarian'] },
    ]);
    expect(res.body.timeline).toHaveLength(1);
    expect(res.body.timeline[0]).toMatchObject({
      actor: { role: 'client' },
      fromStatus: null,
      toStatus: 'pending_payment',
    });
  });

  it('keeps the snapshot when the menu price changes later', async () => {
    const token = await client();
    const own = await makeMenu(app.t, chef, {
      name: 'Price change menu',
      pricePerGuestMinor: 1000,
    });
    const { id } = await bookOrder(app.t, token, own, { guestCount: 10 });
    const card = await app.t.http.get(`/api/menus/admin/${own}`).set(bearer(chef)).expect(200);
    const {
      id: _id,
      photos: _p,
      referenceNames: _r,
      createdAt: _c,
      updatedAt: _u,
      ...editable
    } = card.body as Record<string, unknown>;
    await app.t.http
      .put(`/api/menus/${own}`)
      .set(bearer(chef))
      .send({ ...editable, pricePerGuestMinor: 5000 })
      .expect(200);
    const quote = await app.t.http
      .post('/api/quotes')
      .send({ menuId: own, eventDate: '2026-06-20', guestCount: 10 })
      .expect(200);
    expect(quote.body.totalMinor).toBe(50_000);
    const res = await app.t.http.get(`/api/orders/${id}`).set(bearer(token)).expect(200);
    expect(res.body.totalMinor).toBe(10_000);
    expect(res.body.quote.pricing.pricePerGuestMinor).toBe(1000);
  });

  it('refuses a price, a total or a status in the body (400, OWASP API3 mass assignment)', async () => {
    const token = await client();
    for (const extra of [
      { totalMinor: 1 },
      { priceMinor: 1 },
      { status: 'confirmed' },
      { depositMinor: 0 },
    ]) {
      const res = await app.t.http
        .post('/api/orders')
        .set(bearer(token))
        .set('Idempotency-Key', newKey())
        .send(orderBody(menu, extra))
        .expect(400);
      expect(res.body.message.join(' ')).toMatch(/not accepted here/);
    }
    expect(await app.t.dataSource.getRepository(OrderEntity).countBy({ totalMinor: 1 })).toBe(0);
  });

  it('needs an Idempotency-Key of at most 64 printable characters', async () => {
    const token = await client();
    const missing = await app.t.http.post('/api/orders').set(bearer(token)).send(orderBody(menu));
    expect(missing.status).toBe(400);
    expect(missing.body.message.join(' ')).toMatch(/Idempotency-Key/);
    await app.t.http
      .post('/api/orders')
      .set(bearer(token))
      .set('Idempotency-Key', 'k'.repeat(65))
      .send(orderBody(menu))
      .expect(400);
  });

  it('is idempotent: the same key and body return the same order; another body is refused', async () => {
    const token = await client();
    const key = newKey('retry');
    const body = orderBody(menu, { eventDate: '2026-07-04' });
    const first = await app.t.http
      .post('/api/orders')
      .set(bearer(token))
      .set('Idempotency-Key', key)
      .send(body);
    expect(first.status).toBe(201);
    const retries = await Promise.all(
      Array.from({ length: 5 }, () =>
        app.t.http.post('/api/orders').set(bearer(token)).set('Idempotency-Key', key).send(body),
      ),
    );
    for (const r of retries) {
      expect(r.status).toBe(200);
      expect(r.body.id).toBe(first.body.id);
    }
    const other = await app.t.http
      .post('/api/orders')
      .set(bearer(token))
      .set('Idempotency-Key', key)
      .send({ ...body, guestCount: 21 })
      .expect(409);
    expect(other.body.message).toMatch(/already used for a different booking/);
    expect(
      await app.t.dataSource.getRepository(OrderEntity).countBy({ clientRequestId: key }),
    ).toBe(1);
  });

  it('lets exactly one of two clients racing for the last plates of a day book them', async () => {
    await setStudio(app.t, { dailyPlateCapacity: 40 });
    const [a, b] = [await client(), await client()];
    const date = '2026-08-01';
    const results = await Promise.all(
      [a, b].map((token) =>
        app.t.http
          .post('/api/orders')
          .set(bearer(token))
          .set('Idempotency-Key', newKey('race'))
          .send(orderBody(menu, { eventDate: date, guestCount: 30 })),
      ),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    const refused = results.find((r) => r.status === 409)!;
    expect(refused.body.message).toMatch(/Only 10 plates are left on Saturday 1 August 2026/);
    expect(await app.t.dataSource.getRepository(OrderEntity).countBy({ eventDate: date })).toBe(1);
  });

  it('never books more plates than the capacity when many clients race (45 plates, 10 × 10)', async () => {
    await setStudio(app.t, { dailyPlateCapacity: 45 });
    const tokens = await Promise.all(Array.from({ length: 10 }, client));
    const date = '2026-08-08';
    const results = await Promise.all(
      tokens.map((token) =>
        app.t.http
          .post('/api/orders')
          .set(bearer(token))
          .set('Idempotency-Key', newKey('crowd'))
          .send(orderBody(menu, { eventDate: date, guestCount: 10 })),
      ),
    );
    expect(results.filter((r) => r.status === 201)).toHaveLength(4);
    expect(results.filter((r) => r.status === 409)).toHaveLength(6);
    const rows = await app.t.dataSource.getRepository(OrderEntity).findBy({ eventDate: date });
    expect(rows.reduce((sum, o) => sum + o.plates, 0)).toBe(40);
  });

  it('counts every dessert of a menu as a plate (3 desserts × 20 guests = 60 plates)', async () => {
    await setStudio(app.t, { dailyPlateCapacity: 100 });
    const trio = await makeMenu(app.t, chef, { name: 'Trio', desserts: 3 });
    const token = await client();
    const { id } = await bookOrder(app.t, token, trio, { eventDate: '2026-08-15', guestCount: 20 });
    expect((await app.t.dataSource.getRepository(OrderEntity).findOneByOrFail({ id })).plates).toBe(
      60,
    );
    const res = await app.t.http
      .post('/api/orders')
      .set(bearer(await client()))
      .set('Idempotency-Key', newKey())
      .send(orderBody(trio, { eventDate: '2026-08-15', guestCount: 14 }))
      .expect(409);
    expect(res.body.message).toMatch(
      /Only 40 plates are left.*14 guests need 42 \(3 desserts for each guest\)/,
    );
  });

  it('refuses blackout days and dates inside the menu’s lead time (409)', async () => {
    await setStudio(app.t, { blackoutDates: ['2026-09-05'] });
    const token = await client();
    const closed = await app.t.http
      .post('/api/orders')
      .set(bearer(token))
      .set('Idempotency-Key', newKey())
      .send(orderBody(menu, { eventDate: '2026-09-05' }))
      .expect(409);
    expect(closed.body.message).toMatch(/takes no events on Saturday 5 September 2026/);
    const soon = await app.t.http
      .post('/api/orders')
      .set(bearer(token))
      .set('Idempotency-Key', newKey())
      .send(orderBody(menu, { eventDate: '2026-03-08' }))
      .expect(409);
    expect(soon.body.message).toMatch(/needs 3 days’ notice/);
  });

  it('caps unpaid bookings per client (QUALITY.md abuse: 3 open checkouts, then 429)', async () => {
    const token = await client();
    for (const date of ['2026-10-01', '2026-10-02', '2026-10-03']) {
      await bookOrder(app.t, token, menu, { eventDate: date, guestCount: 2 });
    }
    const res = await app.t.http
      .post('/api/orders')
      .set(bearer(token))
      .set('Idempotency-Key', newKey())
      .send(orderBody(menu, { eventDate: '2026-10-04', guestCount: 2 }))
      .expect(429);
    expect(res.body.message).toMatch(/3 bookings waiting for payment/);
    app.clock.advance(31 * 60_000); // their holds end
    await bookOrder(app.t, token, menu, { eventDate: '2026-10-04', guestCount: 2 });
  });

  it('keeps a menu that has bookings: deleting it is refused (409, ON DELETE RESTRICT)', async () => {
    const own = await makeMenu(app.t, chef, { name: 'Booked menu' });
    await bookOrder(app.t, await client(), own, { eventDate: '2026-10-17' });
    const res = await app.t.http.delete(`/api/menus/${own}`).set(bearer(chef)).expect(409);
    expect(res.body.message).toMatch(/still used/);
    await app.t.http.get(`/api/menus/${own}`).expect(200);
  });

  it('only clients book (chef and staff 403)', async () => {
    for (const token of [chef, staff]) {
      await app.t.http
        .post('/api/orders')
        .set(bearer(token))
        .set('Idempotency-Key', newKey())
        .send(orderBody(menu))
        .expect(403);
    }
  });
});

describe('GET /api/availability (capacity minus held plates, in the studio’s time zone)', () => {
  const ask = (query: string) => app.t.http.get(`/api/availability?${query}`);

  it('shows remaining plates, blackout, lead time and whether a party fits', async () => {
    await setStudio(app.t, { dailyPlateCapacity: 50, blackoutDates: ['2026-11-07'] });
    const token = await client();
    await bookOrder(app.t, token, menu, { eventDate: '2026-11-06', guestCount: 30 });
    const res = await ask(`menuId=${menu}&from=2026-11-05&to=2026-11-07&guests=25`).expect(200);
    expect(res.body).toMatchObject({
      menuId: menu,
      timeZone: 'Europe/Brussels',
      today: '2026-03-06',
      earliestDate: '2026-03-09',
      platesPerGuest: 1,
    });
    expect(res.body.days).toEqual([
      { date: '2026-11-05', status: 'open', remainingPlates: 50, fitsGuests: true },
      { date: '2026-11-06', status: 'open', remainingPlates: 20, fitsGuests: false },
      { date: '2026-11-07', status: 'blackout', remainingPlates: 0, fitsGuests: false },
    ]);
    const early = await ask(`menuId=${menu}&from=2026-03-05&to=2026-03-09`).expect(200);
    expect(early.body.days.map((d: { status: string }) => d.status)).toEqual([
      'past',
      'too_soon',
      'too_soon',
      'too_soon',
      'open',
    ]);
  });

  it('releases the plates of an unpaid booking when its hold ends', async () => {
    await setStudio(app.t, { dailyPlateCapacity: 50 });
    await bookOrder(app.t, await client(), menu, { eventDate: '2026-11-13', guestCount: 40 });
    const held = await ask(`menuId=${menu}&from=2026-11-13&to=2026-11-13`).expect(200);
    expect(held.body.days[0].remainingPlates).toBe(10);
    app.clock.advance(31 * 60_000);
    const free = await ask(`menuId=${menu}&from=2026-11-13&to=2026-11-13`).expect(200);
    expect(free.body.days[0].remainingPlates).toBe(50);
  });

  it('takes "today" on the studio’s wall clock', async () => {
    // 23:30 UTC on 6 March is 00:30 on 7 March in Brussels (CET = UTC+1 until the last Sunday
    // of March — IANA tz database).
    app.clock.set('2026-03-06T23:30:00Z');
    const res = await ask(`menuId=${menu}&from=2026-03-06&to=2026-03-07`).expect(200);
    expect(res.body.today).toBe('2026-03-07');
    expect(res.body.days[0].status).toBe('past');
  });

  it('validates the range and the menu', async () => {
    await ask(`menuId=${menu}&from=2026-02-30&to=2026-03-02`).expect(400);
    await ask(`menuId=${menu}&from=2026-05-02&to=2026-05-01`).expect(400);
    const long = await ask(`menuId=${menu}&from=2026-05-01&to=${addIsoDays('2026-05-01', 92)}`);
    expect(long.status).toBe(400);
    await ask(`menuId=${menu}&from=2026-05-01&to=${addIsoDays('2026-05-01', 91)}`).expect(200);
    await ask(`menuId=${menu}&menuId=${menu}&from=2026-05-01&to=2026-05-02`).expect(400);
    await ask(`menuId=00000000-0000-4000-8000-000000000000&from=2026-05-01&to=2026-05-02`).expect(
      404,
    );
  });
});

describe('who sees which order (OWASP API1: object-level access)', () => {
  it('hides another client’s order, receipt, event file and actions (404) and leaves it unchanged', async () => {
    const [a, b] = [await client(), await client()];
    const { id } = await bookOrder(app.t, a, menu, { eventDate: '2026-09-12' });
    await app.t.http.get(`/api/orders/${id}`).set(bearer(a)).expect(200);
    for (const req of [
      app.t.http.get(`/api/orders/${id}`),
      app.t.http.get(`/api/orders/${id}/event.ics`),
      app.t.http.get(`/api/orders/${id}/receipts/00000000-0000-4000-8000-000000000000.pdf`),
      app.t.http.post(`/api/orders/${id}/cancel`).send({}),
      app.t.http.post(`/api/orders/${id}/cancellation-preview`),
      app.t.http.post(`/api/orders/${id}/checkout`).send({ plan: 'deposit' }),
      app.t.http.put(`/api/orders/${id}/guests`).send({ guestCount: 3 }),
    ]) {
      const res = await req.set(bearer(b));
      expect(res.status).toBe(404);
    }
    const own = await app.t.http.get('/api/orders').set(bearer(b)).expect(200);
    expect(own.body.items.map((o: { id: string }) => o.id)).not.toContain(id);
    const row = await app.t.dataSource.getRepository(OrderEntity).findOneByOrFail({ id });
    expect(row.status).toBe(OrderStatus.PendingPayment);
  });

  it('lists a client’s own orders; the chef and staff see all, filtered by status, paged', async () => {
    const a = await client();
    const first = await bookOrder(app.t, a, menu, { eventDate: '2026-09-19' });
    const mine = await app.t.http.get('/api/orders').set(bearer(a)).expect(200);
    expect(mine.body).toMatchObject({ total: 1, page: 1, pageSize: 20 });
    expect(mine.body.items[0]).toMatchObject({
      id: first.id,
      status: 'pending_payment',
      menuName: 'Winter tuile supper',
    });
    const all = await app.t.http.get('/api/orders?pageSize=100').set(bearer(chef)).expect(200);
    expect(all.body.total).toBeGreaterThan(1);
    expect(all.body.items.map((o: { id: string }) => o.id)).toContain(first.id);
    const byStaff = await app.t.http.get(`/api/orders/${first.id}`).set(bearer(staff)).expect(200);
    expect(byStaff.body.id).toBe(first.id);
    const pending = await app.t.http
      .get('/api/orders?status=pending_payment&pageSize=2')
      .set(bearer(chef))
      .expect(200);
    expect(pending.body.items).toHaveLength(2);
    expect(
      pending.body.items.every((o: { status: string }) => o.status === 'pending_payment'),
    ).toBe(true);
    await app.t.http.get('/api/orders?status=lost').set(bearer(chef)).expect(400);
    await app.t.http.get('/api/orders?pageSize=101').set(bearer(chef)).expect(400);
    await app.t.http
      .get('/api/orders/00000000-0000-4000-8000-000000000000')
      .set(bearer(chef))
      .expect(404);
  });
});

describe('the lifecycle (one transition table; every change audited)', () => {
  it('answers an illegal transition with 409 and changes nothing', async () => {
    const token = await client();
    const { id } = await bookOrder(app.t, token, menu, { eventDate: '2026-09-26' });
    const confirm = await app.t.http
      .post(`/api/orders/${id}/confirm`)
      .set(bearer(chef))
      .send({})
      .expect(409);
    expect(confirm.body).toMatchObject({ code: 'illegal_transition' });
    expect(confirm.body.message).toMatch(/cannot become confirmed/);
    await app.t.http.post(`/api/orders/${id}/confirm`).set(bearer(staff)).send({}).expect(403);
    await app.t.http.post(`/api/orders/${id}/confirm`).set(bearer(token)).send({}).expect(403);
    const cancelled = await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(token))
      .send({ reason: 'Plans changed' })
      .expect(200);
    expect(cancelled.body.status).toBe('cancelled');
    const again = await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(token))
      .send({})
      .expect(409);
    expect(again.body.message).toBe('This order is already cancelled.');
    const events = await app.t.dataSource
      .getRepository(OrderEventEntity)
      .find({ where: { orderId: id }, order: { seq: 'ASC' } });
    expect(events.map((e) => [e.seq, e.fromStatus, e.toStatus, e.actorRole, e.reason])).toEqual([
      [1, null, 'pending_payment', 'client', null],
      [2, 'pending_payment', 'cancelled', 'client', 'Plans changed'],
    ]);
    await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(token))
      .send({ status: 'x' })
      .expect(400);
  });

  it('keeps guest details with the order for the client who entered them', async () => {
    const token = await client();
    const { id } = await bookOrder(app.t, token, menu, {
      eventDate: '2026-10-10',
      guestRequirements: [{ label: 'Table 1, seat 4', allergens: ['milk'], diets: [] }],
      guestDataConsent: true,
    });
    expect(await app.t.dataSource.getRepository(OrderGuestEntity).countBy({ orderId: id })).toBe(1);
    const noConsent = await app.t.http
      .post('/api/orders')
      .set(bearer(token))
      .set('Idempotency-Key', newKey())
      .send(orderBody(menu, { guestRequirements: [{ label: 'X', allergens: ['milk'] }] }))
      .expect(400);
    expect(noConsent.body.message.join(' ')).toMatch(/guests agreed/);
  });
});

describe('GET /api/orders/:id/event.ics', () => {
  it('writes the service time on the studio’s wall clock as UTC', async () => {
    const token = await client();
    const summer = await bookOrder(app.t, token, menu, {
      eventDate: '2026-06-27',
      serviceTime: '19:30',
    });
    const res = await app.t.http
      .get(`/api/orders/${summer.id}/event.ics`)
      .set(bearer(token))
      .expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/calendar/);
    const text = res.text ?? String(res.body);
    // 19:30 in Brussels in June is CEST, UTC+2 (IANA tz database) → 17:30 UTC.
    expect(text).toMatch(/DTSTART:20260627T173000Z/);
    expect(text).toMatch(/DTEND:20260627T183000Z/);
    expect(text).not.toMatch(/Aunt|allerg/i);
    const winter = await bookOrder(app.t, token, menu, {
      eventDate: '2026-12-05',
      serviceTime: '19:30',
    });
    const w = await app.t.http
      .get(`/api/orders/${winter.id}/event.ics`)
      .set(bearer(staff))
      .expect(200);
    // In December, CET is UTC+1 → 18:30 UTC.
    expect(w.text ?? String(w.body)).toMatch(/DTSTART:20261205T183000Z/);
  });
});
