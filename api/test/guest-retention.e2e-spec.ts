import { Role } from '@nappe/shared';
import type { LoggerService } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GuestDataAccessEntity } from '../src/allergy-notes/entities/guest-data-access.entity.js';
import { OrderSubstitutionEntity } from '../src/allergy-notes/entities/order-substitution.entity.js';
import { OrderEventEntity } from '../src/orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../src/orders/entities/order-guest.entity.js';
import { OrderGuestSummaryEntity } from '../src/privacy/entities/order-guest-summary.entity.js';
import { GuestDataRetentionJob } from '../src/privacy/guest-data-retention.job.js';
import { StudioSettings } from '../src/studio/entities/studio-settings.entity.js';
import {
  bearer,
  createBookingApp,
  setStudio,
  signedIn,
  startPaymentFake,
  TEST_NOW,
  type BookingApp,
  type FakeHarness,
} from './factories/booking.js';
import {
  bookAndPayDeposit,
  distinctiveGuests,
  makeGuestMenu,
  substituteAndConfirm,
  type GuestMenu,
} from './factories/guest-data.js';

/**
 * Retention of guests' health data (DESIGN.md "Guest data is health data"; GDPR Art. 5(1)(e)
 * storage limitation): held through the event date + the studio's retention days (default 30),
 * removed from the day after, anonymous counts kept. "Today" is controlled; the studio is in
 * Europe/Brussels, UTC+2 in summer (CEST, IANA tz database), so 21 July 2026 starts there at
 * 2026-07-20T22:00Z.
 */

let app: BookingApp;
let pay: FakeHarness;
let chef: string;
let staff: string;
let clientA: string;
let clientB: string;
let menu: GuestMenu;
let job: GuestDataRetentionJob;
const logs: string[] = [];
let x: string; // A's dinner on 20 June (confirmed, with a substitution)
let y: string; // A's dinner on 27 June (confirmed)
let z: string; // B's dinner on 20 June, cancelled by B
const guestsX = distinctiveGuests('x');
const guestsZ = distinctiveGuests('z');

const capture: LoggerService = {
  log: (m: unknown) => logs.push(String(m)),
  error: (m: unknown) => logs.push(String(m)),
  warn: (m: unknown) => logs.push(String(m)),
  debug: (m: unknown) => logs.push(String(m)),
  verbose: (m: unknown) => logs.push(String(m)),
};

beforeAll(async () => {
  app = await createBookingApp({ THROTTLE_LIMIT: '10000' });
  app.t.app.useLogger(capture);
  pay = startPaymentFake(app);
  await setStudio(app.t, { timeZone: 'Europe/Brussels', dailyPlateCapacity: 1000 });
  chef = (await signedIn(app.t, Role.Chef)).token;
  staff = (await signedIn(app.t, Role.Staff)).token;
  clientA = (await signedIn(app.t, Role.Client)).token;
  clientB = (await signedIn(app.t, Role.Client)).token;
  menu = await makeGuestMenu(app.t, chef);
  job = app.t.app.get(GuestDataRetentionJob);

  x = await bookAndPayDeposit(app, clientA, menu.menuId, {
    eventDate: '2026-06-20',
    guestRequirements: guestsX,
    guestDataConsent: true,
  });
  await substituteAndConfirm(app, chef, x, menu);
  y = await bookAndPayDeposit(app, clientA, menu.menuId, {
    eventDate: '2026-06-27',
    guestRequirements: distinctiveGuests('y'),
    guestDataConsent: true,
  });
  await substituteAndConfirm(app, chef, y, menu);
  z = await bookAndPayDeposit(app, clientB, menu.menuId, {
    eventDate: '2026-06-20',
    guestRequirements: guestsZ,
    guestDataConsent: true,
  });
  await app.t.http.post(`/api/orders/${z}/cancel`).set(bearer(clientB)).send({}).expect(200);
});
afterAll(async () => {
  pay.close();
  await app.t.close();
});

const guestRows = (orderId: string) =>
  app.t.dataSource.getRepository(OrderGuestEntity).countBy({ orderId });
const openings = () => app.t.dataSource.getRepository(GuestDataAccessEntity).count();

describe('least access before the retention date', () => {
  it('a client asking for another client’s guests gets 404, and the guests are unchanged', async () => {
    app.clock.set(TEST_NOW);
    for (const path of [`/api/orders/${x}`, `/api/orders/${x}/allergy-notes`]) {
      const res = await app.t.http.get(path).set(bearer(clientB)).expect(404);
      expect(JSON.stringify(res.body)).not.toContain(guestsX[0]!.label);
    }
    await app.t.http.get(`/api/orders/${x}/briefing`).set(bearer(clientB)).expect(403);
    const own = await app.t.http.get(`/api/orders/${x}`).set(bearer(clientA)).expect(200);
    expect(own.body.guests.map((g: { label: string }) => g.label)).toEqual(
      guestsX.map((g) => g.label),
    );
    expect(own.body.guestDetailsRemoved).toBeUndefined();
    expect(await guestRows(x)).toBe(3);
  });

  it('staff read the briefing through the last day: the event date + 30 days, in Brussels', async () => {
    // 23:59 on 20 July in Brussels = 21:59 UTC (CEST, UTC+2).
    app.clock.set('2026-07-20T21:59:00Z');
    const res = await app.t.http.get(`/api/orders/${x}/briefing`).set(bearer(staff)).expect(200);
    expect(JSON.stringify(res.body)).toContain(guestsX[0]!.label);
  });
});

describe('after the retention date, before the purge has run', () => {
  it('staff, chef and client lose the guest details: 410 with the reason, and an empty guest list', async () => {
    // 00:01 on 21 July in Brussels.
    app.clock.set('2026-07-20T22:01:00Z');
    expect(await guestRows(x)).toBe(3); // still stored: the purge has not run
    const before = await openings();
    for (const [token, path] of [
      [staff, `/api/orders/${x}/briefing`],
      [staff, `/api/orders/${x}/briefing.pdf`],
      [staff, `/api/orders/${x}/allergy-notes`],
      [chef, `/api/orders/${x}/allergy-notes`],
      [chef, `/api/orders/${x}/briefing`],
      [clientA, `/api/orders/${x}/allergy-notes`],
    ] as const) {
      const res = await app.t.http.get(path).set(bearer(token)).expect(410);
      expect(res.body.message).toMatch(/^Guest details removed after 30 days/);
      expect(res.body.guestDetails).toMatchObject({
        removed: true,
        reason: 'retention',
        retentionDays: 30,
        removedFrom: '2026-07-21',
      });
      expect(JSON.stringify(res.body)).not.toContain(guestsX[0]!.label);
    }
    await app.t.http
      .put(`/api/orders/${x}/guests/0/substitutions/${menu.dessertId}`)
      .set(bearer(chef))
      .send({ note: 'too late' })
      .expect(410);
    for (const token of [staff, chef, clientA]) {
      const detail = await app.t.http.get(`/api/orders/${x}`).set(bearer(token)).expect(200);
      expect(detail.body.guests).toEqual([]);
      expect(detail.body.guestDetailsRemoved).toMatchObject({ reason: 'retention' });
    }
    // Nothing was shown, so nothing was opened.
    expect(await openings()).toBe(before);
    // The later event (27 June) is still within its 30 days.
    await app.t.http.get(`/api/orders/${y}/briefing`).set(bearer(staff)).expect(200);
  });
});

describe('the purge job', () => {
  it('removes guests once, keeps the counts the dashboard and the plan need, and logs counts and ids only', async () => {
    app.clock.set('2026-07-21T08:00:00Z');
    const dashboard = async () =>
      (await app.t.http.get('/api/insights/dashboard').set(bearer(chef)).expect(200)).body;
    const plan = async () =>
      (
        await app.t.http
          .get('/api/prep/plan?from=2026-06-20&to=2026-06-20')
          .set(bearer(chef))
          .expect(200)
      ).body;
    const dashboardBefore = await dashboard();
    const planBefore = await plan();
    // The plan counts the substituted plate: the sugar crumble is produced for it.
    expect(JSON.stringify(planBefore)).toContain('Sugar crumble');
    const eventsBefore = await app.t.dataSource.getRepository(OrderEventEntity).countBy({});
    logs.length = 0;

    const first = await job.purgeExpired();
    expect(first).toMatchObject({
      today: '2026-07-21',
      retentionDays: 30,
      eventsUpTo: '2026-06-20',
      ordersPurged: 2,
      guestsRemoved: 6,
      substitutionsRemoved: 1,
      auditLinesRedacted: 1,
    });
    expect(first.orders.map((o) => o.orderId).sort()).toEqual([x, z].sort());
    expect(await guestRows(x)).toBe(0);
    expect(await guestRows(z)).toBe(0);
    expect(await guestRows(y)).toBe(3); // 27 June + 30 days is not yet past
    expect(
      await app.t.dataSource.getRepository(OrderSubstitutionEntity).countBy({ orderId: x }),
    ).toBe(0);

    // Anonymous counts kept: 3 guests, one per allergen group / diet, one changed plate.
    const kept = await app.t.dataSource
      .getRepository(OrderGuestSummaryEntity)
      .findOneByOrFail({ orderId: x });
    expect(kept).toMatchObject({
      guestsListed: 3,
      guestsWithNotes: 2,
      allergenCounts: { nuts: 1, gluten: 1 },
      dietCounts: { vegan: 1 },
      plateChanges: [
        {
          dessertId: menu.dessertId,
          plates: 1,
          changes: [
            { componentRecipeId: menu.almondCrumbleId, replacementRecipeId: menu.sugarCrumbleId },
          ],
        },
      ],
      reason: 'retention',
      retentionDays: 30,
    });
    expect(JSON.stringify(kept)).not.toMatch(
      /Zephyrine|Barnabus|Ottoline|anaphylaxis|Sugar crumble instead/,
    );

    // The figures are the same after as before.
    expect(await dashboard()).toEqual(dashboardBefore);
    expect(await plan()).toEqual(planBefore);

    // One audit line per purged order; the line that named the guest no longer does.
    const timeline = await app.t.dataSource
      .getRepository(OrderEventEntity)
      .find({ where: { orderId: x }, order: { seq: 'ASC' } });
    expect(timeline.at(-1)!.summary).toMatch(
      /^Guest details removed 30 days after the event \(retention setting\): 3 guest entries and 1 substitution;/,
    );
    expect(timeline.at(-1)!.actorRole).toBe('system');
    const text = JSON.stringify(timeline);
    expect(text).not.toContain('Zephyrine');
    expect(text).not.toContain('Sugar crumble instead');
    expect(text).toContain('Guest substitution recorded (guest details removed)');
    expect(await app.t.dataSource.getRepository(OrderEventEntity).countBy({})).toBe(
      eventsBefore + 2,
    );

    // The log: counts and order ids, never a guest.
    const line = logs.find((l) => l.startsWith('Guest data retention'))!;
    expect(line).toContain(
      'removed 6 guest entries and 1 substitution, redacted 1 audit line, from 2 orders',
    );
    expect(line).toContain(x);
    expect(line).toContain(z);
    expect(logs.join('\n')).not.toMatch(/Zephyrine|Barnabus|Ottoline|anaphylaxis|Lactose/);

    // Second run: nothing left to remove, it says 0 and writes no audit line.
    logs.length = 0;
    const second = await job.purgeExpired();
    expect(second).toMatchObject({ ordersPurged: 0, guestsRemoved: 0, substitutionsRemoved: 0 });
    expect(logs).toEqual([
      'Guest data retention (30 days; events up to 2026-06-20): removed 0 guest entries from 0 orders.',
    ]);
    expect(await app.t.dataSource.getRepository(OrderEventEntity).countBy({})).toBe(
      eventsBefore + 2,
    );
    expect(
      await app.t.dataSource.getRepository(OrderGuestSummaryEntity).findOneByOrFail({ orderId: x }),
    ).toEqual(kept);
  });

  it('after the purge the order says why its guests are gone; the client sees the same', async () => {
    const detail = await app.t.http.get(`/api/orders/${x}`).set(bearer(clientA)).expect(200);
    expect(detail.body.guests).toEqual([]);
    expect(detail.body.guestCount).toBe(20);
    expect(detail.body.guestDetailsRemoved).toEqual({
      removed: true,
      reason: 'retention',
      retentionDays: 30,
      removedFrom: '2026-07-21',
      message: expect.stringMatching(
        /^Guest details removed after 30 days: .* removed on Tuesday 21 July 2026\./,
      ),
    });
    await app.t.http.get(`/api/orders/${x}/briefing`).set(bearer(staff)).expect(410);
  });

  it('follows the studio’s setting: 7 days clears the 27 June dinner on 5 July already', async () => {
    await app.t.dataSource
      .getRepository(StudioSettings)
      .update({ id: 1 }, { guestDataRetentionDays: 7 });
    // 4 July is 27 June + 7: still held.
    app.clock.set('2026-07-04T10:00:00Z');
    await app.t.http.get(`/api/orders/${y}/briefing`).set(bearer(staff)).expect(200);
    expect((await job.purgeExpired()).ordersPurged).toBe(0);
    app.clock.set('2026-07-05T10:00:00Z');
    const res = await app.t.http.get(`/api/orders/${y}/briefing`).set(bearer(staff)).expect(410);
    expect(res.body.message).toMatch(/^Guest details removed after 7 days/);
    const report = await job.purgeExpired();
    expect(report).toMatchObject({ retentionDays: 7, ordersPurged: 1, guestsRemoved: 3 });
    expect(report.orders.map((o) => o.orderId)).toEqual([y]);
    expect(await guestRows(y)).toBe(0);
  });
});
