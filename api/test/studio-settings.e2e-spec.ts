import { DEFAULT_STUDIO_SETTINGS, Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SettingsChangeEntity } from '../src/studio/entities/settings-change.entity.js';
import {
  bearer,
  bookOrder,
  createBookingApp,
  makeMenu,
  signedIn,
  type BookingApp,
} from './factories/booking.js';

/**
 * The chef's studio settings. Values are invented; the checks are the API's own rules (the
 * shared settings schema) and the rule that a booked order keeps its price snapshot.
 */

let b: BookingApp;
let chef: Awaited<ReturnType<typeof signedIn>>;

/** A complete, valid settings body (every field is required on PUT). */
function settingsBody(patch: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    name: 'Atelier Nappe',
    tagline: 'Plated desserts for your table',
    city: 'Ghent',
    ...DEFAULT_STUDIO_SETTINGS,
    workingHours: { start: '07:00', end: '19:00' },
    platingBufferMinutes: 60,
    ...patch,
  };
}

beforeAll(async () => {
  b = await createBookingApp();
  chef = await signedIn(b.t, Role.Chef);
});
afterAll(async () => b.t.close());

describe('GET and PUT /api/studio/settings', () => {
  it('is 401 without a token and 403 for staff and clients, reading or writing', async () => {
    await b.t.http.get('/api/studio/settings').expect(401);
    for (const role of [Role.Staff, Role.Client]) {
      const who = await signedIn(b.t, role);
      await b.t.http.get('/api/studio/settings').set(bearer(who.token)).expect(403);
      await b.t.http
        .put('/api/studio/settings')
        .set(bearer(who.token))
        .send(settingsBody())
        .expect(403);
    }
  });

  it('reads every setting, including the kitchen’s working hours and plating buffer', async () => {
    const res = await b.t.http.get('/api/studio/settings').set(bearer(chef.token)).expect(200);
    expect(Object.keys(res.body as object).sort()).toEqual(
      [
        'balanceDueDaysBefore',
        'blackoutDates',
        'cancellationTiers',
        'city',
        'currency',
        'dailyPlateCapacity',
        'depositPercent',
        'finalGuestCountDaysBefore',
        'guestDataRetentionDays',
        'lastChange',
        'name',
        'platingBufferMinutes',
        'pricesIncludeTax',
        'sparePercent',
        'tagline',
        'taxRateBp',
        'timeZone',
        'updatedAt',
        'workingHours',
      ].sort(),
    );
    // The migration's defaults (DEFAULT_WORKING_HOURS and DEFAULT_PLATING_BUFFER_MINUTES).
    expect(res.body).toMatchObject({
      workingHours: { start: '07:00', end: '19:00' },
      platingBufferMinutes: 60,
    });
  });

  it('refuses bad values with messages a chef can read (400), and changes nothing', async () => {
    const before = await b.t.http.get('/api/studio/settings').set(bearer(chef.token)).expect(200);
    const cases: Array<[Record<string, unknown>, RegExp]> = [
      [{ depositPercent: 0 }, /depositPercent: The deposit must be 1 % or more/],
      [{ depositPercent: 30.5 }, /depositPercent: The deposit must be a whole number/],
      [{ currency: 'EURO' }, /currency: Use a three-letter ISO 4217 currency code/],
      [{ timeZone: 'Mars/Olympus' }, /timeZone: Use a time-zone name/],
      [
        { cancellationTiers: [{ daysBefore: 30, refundPercent: 100 }] },
        /Add a last tier that starts 0 days before the event/,
      ],
      [
        {
          cancellationTiers: [
            { daysBefore: 30, refundPercent: 50 },
            { daysBefore: 0, refundPercent: 100 },
          ],
        },
        /Cancelling earlier must never refund less/,
      ],
      [{ blackoutDates: ['2026-02-30'] }, /Write each closed day as a real date/],
      [{ blackoutDates: ['2026-12-25', '2026-12-25'] }, /A closed day is listed twice/],
      [
        { workingHours: { start: '19:00', end: '07:00' } },
        /Working hours must end after they start/,
      ],
      [
        { workingHours: { start: '7am', end: '19:00' } },
        /The opening time is a time written HH:MM/,
      ],
      [{ platingBufferMinutes: -5 }, /The plating time cannot be negative/],
      [{ name: '' }, /name: The studio name needs at least 1 character/],
      [{ name: 'Atelier\r\nBcc: x@example.test' }, /must be on one line/],
      [{ taxRateBp: 10_001 }, /taxRateBp: The tax rate .* must be 10000 or less/],
      [{ status: 'open' }, /Unrecognized key/i],
    ];
    for (const [patch, message] of cases) {
      const res = await b.t.http
        .put('/api/studio/settings')
        .set(bearer(chef.token))
        .send(settingsBody(patch));
      expect(res.status, `${JSON.stringify(patch)} → ${JSON.stringify(res.body)}`).toBe(400);
      expect((res.body as { message: string[] }).message.join('\n'), JSON.stringify(patch)).toMatch(
        message,
      );
    }
    const missing = settingsBody();
    delete missing.sparePercent;
    const res = await b.t.http
      .put('/api/studio/settings')
      .set(bearer(chef.token))
      .send(missing)
      .expect(400);
    expect((res.body as { message: string[] }).message.join('\n')).toMatch(/sparePercent/);
    const after = await b.t.http.get('/api/studio/settings').set(bearer(chef.token)).expect(200);
    expect(after.body).toEqual(before.body);
  });

  it('saves a change in one go and records who changed which fields', async () => {
    await b.t.http
      .put('/api/studio/settings')
      .set(bearer(chef.token))
      .send(settingsBody())
      .expect(200);
    const res = await b.t.http
      .put('/api/studio/settings')
      .set(bearer(chef.token))
      .send(
        settingsBody({
          tagline: 'Desserts, plated at your table',
          sparePercent: 8,
          blackoutDates: ['2026-12-25', '2026-12-24'],
          workingHours: { start: '06:30', end: '18:00' },
          platingBufferMinutes: 45,
        }),
      )
      .expect(200);
    expect(res.body).toMatchObject({
      tagline: 'Desserts, plated at your table',
      sparePercent: 8,
      blackoutDates: ['2026-12-24', '2026-12-25'],
      workingHours: { start: '06:30', end: '18:00' },
      platingBufferMinutes: 45,
      lastChange: { changedBy: chef.user.name },
    });
    expect(
      [...(res.body as { lastChange: { fields: string[] } }).lastChange.fields].sort(),
    ).toEqual(['blackoutDates', 'platingBufferMinutes', 'sparePercent', 'tagline', 'workingHours']);
    const rows = await b.t.dataSource.getRepository(SettingsChangeEntity).find();
    const last = rows.find((r) => r.fields.includes('platingBufferMinutes'));
    expect(last?.changedById).toBe(chef.user.id);
    expect(last?.changedAt.toISOString()).toBe(b.clock.now().toISOString());
    // Saving the same values again changes nothing and records nothing.
    const count = rows.length;
    await b.t.http
      .put('/api/studio/settings')
      .set(bearer(chef.token))
      .send(
        settingsBody({
          tagline: 'Desserts, plated at your table',
          sparePercent: 8,
          blackoutDates: ['2026-12-24', '2026-12-25'],
          workingHours: { start: '06:30', end: '18:00' },
          platingBufferMinutes: 45,
        }),
      )
      .expect(200);
    expect(await b.t.dataSource.getRepository(SettingsChangeEntity).count()).toBe(count);
  });

  it('leaves a booked order’s price and deposit as they were when it was booked', async () => {
    const menuId = await makeMenu(b.t, chef.token, { pricePerGuestMinor: 1200 });
    const client = await signedIn(b.t, Role.Client);
    const order = await bookOrder(b.t, client.token, menuId, { guestCount: 20 });
    const before = await b.t.http
      .get(`/api/orders/${order.id}`)
      .set(bearer(chef.token))
      .expect(200);
    const quoteBefore = (before.body as { quote: { depositMinor: number; totalMinor: number } })
      .quote;
    // 20 guests × 12.00 = 240.00 with tax included; 30 % deposit = 72.00 (arithmetic).
    expect(quoteBefore.totalMinor).toBe(24_000);
    expect(quoteBefore.depositMinor).toBe(7_200);

    await b.t.http
      .put('/api/studio/settings')
      .set(bearer(chef.token))
      .send(settingsBody({ depositPercent: 50, taxRateBp: 600, pricesIncludeTax: false }))
      .expect(200);
    const after = await b.t.http.get(`/api/orders/${order.id}`).set(bearer(chef.token)).expect(200);
    expect((after.body as { quote: unknown }).quote).toEqual(quoteBefore);

    // A new booking takes the new terms: 6 % added on 240.00 = 254.40; half of it = 127.20.
    const fresh = await bookOrder(b.t, client.token, menuId, { guestCount: 20 });
    const freshQuote = (fresh.body as { quote: { depositMinor: number; totalMinor: number } })
      .quote;
    expect(freshQuote.totalMinor).toBe(25_440);
    expect(freshQuote.depositMinor).toBe(12_720);
  });

  it('shows a new currency on the public menu cards at once (their cache is dropped)', async () => {
    const menuId = await makeMenu(b.t, chef.token, { name: 'Currency check supper' });
    const card = async () => {
      const res = await b.t.http.get(`/api/menus/${menuId}`).expect(200);
      return JSON.stringify(res.body);
    };
    expect(await card()).toMatch(/EUR/);
    await b.t.http
      .put('/api/studio/settings')
      .set(bearer(chef.token))
      .send(settingsBody({ currency: 'GBP', depositPercent: 50 }))
      .expect(200);
    const after = await card();
    expect(after).toMatch(/GBP/);
    expect(after).not.toMatch(/EUR/);
  });
});
