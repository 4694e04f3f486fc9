import { Role } from '@nappe/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Clock } from '../src/common/clock.js';
import { MAIL_TRANSPORT } from '../src/mail/mail-transport.js';
import { OutboxMessageEntity } from '../src/mail/entities/outbox-message.entity.js';
import { OutboxService } from '../src/mail/outbox.service.js';
import { OutboxWorker } from '../src/mail/outbox.worker.js';
import { OrderEntity } from '../src/orders/entities/order.entity.js';
import { OrderEventEntity } from '../src/orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../src/orders/entities/order-guest.entity.js';
import { GuestDataRetentionJob } from '../src/privacy/guest-data-retention.job.js';
import {
  bearer,
  ControlledClock,
  createBookingApp,
  makeMenu,
  newKey,
  orderBody,
  RecordingTransport,
  setStudio,
  signedIn,
  startPaymentFake,
  TEST_NOW,
  type BookingApp,
  type FakeHarness,
} from './factories/booking.js';
import { bookAndPayDeposit, distinctiveGuests, makeGuestMenu } from './factories/guest-data.js';
import { createTestApp, makeUser, TEST_DB_TYPE } from './factories/test-app.js';

/**
 * Two API processes on one PostgreSQL database (issue 6, "PostgreSQL path"): two Nest apps, each
 * with its own connection pool, clock, mail transport and memory, as two processes would have,
 * and one database between them. Whatever one of them may do only once happens once in all.
 */

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

let a: BookingApp;
let b: BookingApp;
let pay: FakeHarness;

/** The second process: the same setup as `createBookingApp`, on the first one's database. */
async function secondApp(first: BookingApp): Promise<BookingApp> {
  const clock = new ControlledClock(TEST_NOW);
  const mail = new RecordingTransport();
  const t = await createTestApp(
    { STRIPE_TIMEOUT_MS: '1500' },
    {
      database: first.t.database,
      configure: (builder) =>
        builder
          .overrideProvider(Clock)
          .useValue(clock)
          .overrideProvider(MAIL_TRANSPORT)
          .useValue(mail),
    },
  );
  const worker = t.app.get(OutboxWorker);
  return { t, clock, mail, drainOutbox: () => worker.drainOutbox() };
}

// Only PostgreSQL is shared by several processes: a SQLite file has one process, whose
// connection lock (in that process's memory) is what keeps its writes apart.
describe.skipIf(TEST_DB_TYPE !== 'postgres')('two API processes on one PostgreSQL database', () => {
  beforeAll(async () => {
    a = await createBookingApp({ THROTTLE_LIMIT: '10000' });
    b = await secondApp(a);
    pay = startPaymentFake(a);
    await setStudio(a.t, { timeZone: 'Europe/Brussels', dailyPlateCapacity: 1000 });
  }, 60_000);
  afterAll(async () => {
    pay?.close();
    await b?.t.close();
    await a?.t.close(); // drops the database
  });

  it('run on the same data: what one writes, the other reads', async () => {
    const { user } = await makeUser(a.t, { role: Role.Chef });
    const seen = await b.t.dataSource.getRepository('User').findOneBy({ id: user.id });
    expect(seen).toMatchObject({ email: user.email });
  });

  it('send each e-mail of the outbox exactly once when both drain at the same time', async () => {
    const outbox = a.t.app.get(OutboxService);
    const subjects = Array.from({ length: 12 }, (_, i) => `Two processes ${i}`);
    for (const subject of subjects) {
      await a.t.dataSource.transaction((m) =>
        outbox.enqueue(m, {
          kind: 'test',
          orderId: null,
          to: 'guest@example.test',
          content: { subject, text: 'Hello.', html: '<p>Hello.</p>' },
        }),
      );
    }
    a.mail.sent.length = 0;
    b.mail.sent.length = 0;
    // Small batches, several drains per process, all at once: the claims interleave.
    const workerA = a.t.app.get(OutboxWorker);
    const workerB = b.t.app.get(OutboxWorker);
    const reports = await Promise.all(
      [workerA, workerB, workerA, workerB, workerA, workerB].map((w) => w.drainOutbox(2)),
    );
    const more = await Promise.all([workerA.drainOutbox(), workerB.drainOutbox()]);
    const sent = [...a.mail.sent, ...b.mail.sent].map((m) => m.subject).sort();
    expect(sent).toEqual([...subjects].sort());
    expect([...reports, ...more].reduce((sum, r) => sum + r.sent, 0)).toBe(12);
    const rows = await a.t.dataSource
      .getRepository(OutboxMessageEntity)
      .findBy(subjects.map((subject) => ({ subject })));
    expect(rows.map((r) => [r.status, r.attempts])).toEqual(rows.map(() => ['sent', 1]));
  });

  it('remove expired guest data once when both purge jobs run at the same time', async () => {
    const chef = (await signedIn(a.t, Role.Chef)).token;
    const client = (await signedIn(a.t, Role.Client)).token;
    const menu = await makeGuestMenu(a.t, chef);
    const ids: string[] = [];
    for (const [i, date] of ['2026-06-18', '2026-06-19', '2026-06-20'].entries()) {
      ids.push(
        await bookAndPayDeposit(a, client, menu.menuId, {
          eventDate: date,
          guestRequirements: distinctiveGuests(`two-${i}`),
          guestDataConsent: true,
        }),
      );
    }
    // 21 July: every event is more than the 30 retention days past (DESIGN.md).
    for (const app of [a, b]) app.clock.set('2026-07-21T08:00:00Z');
    const [ra, rb] = await Promise.all(
      [a, b].map((app) => app.t.app.get(GuestDataRetentionJob).purgeExpired()),
    );
    expect(ra!.ordersPurged + rb!.ordersPurged).toBe(3);
    expect([...ra!.orders, ...rb!.orders].map((o) => o.orderId).sort()).toEqual([...ids].sort());
    const events = a.t.dataSource.getRepository(OrderEventEntity);
    for (const id of ids) {
      expect(await a.t.dataSource.getRepository(OrderGuestEntity).countBy({ orderId: id })).toBe(0);
      const removals = (await events.findBy({ orderId: id })).filter((e) =>
        e.summary.startsWith('Guest details removed'),
      );
      expect(removals).toHaveLength(1);
    }
    for (const app of [a, b]) app.clock.set(TEST_NOW);
  });

  it('let exactly one of two clients racing for the last plates book them, one through each', async () => {
    const chef = (await signedIn(a.t, Role.Chef)).token;
    const menu = await makeMenu(a.t, chef, { name: 'Two-process supper' });
    await setStudio(a.t, { dailyPlateCapacity: 40 });
    const viaA = (await signedIn(a.t, Role.Client)).token;
    const viaB = (await signedIn(b.t, Role.Client)).token;
    const date = '2026-08-15';
    const results = await Promise.all(
      [
        [a, viaA],
        [b, viaB],
      ].map(([app, token]) =>
        (app as BookingApp).t.http
          .post('/api/orders')
          .set(bearer(token as string))
          .set('Idempotency-Key', newKey('two'))
          .send(orderBody(menu, { eventDate: date, guestCount: 30 })),
      ),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await a.t.dataSource.getRepository(OrderEntity).countBy({ eventDate: date })).toBe(1);
    await setStudio(a.t, { dailyPlateCapacity: 1000 });
  });

  it('show a menu removed through one on the other’s public list within about a second', async () => {
    const chef = (await signedIn(a.t, Role.Chef)).token;
    const menu = await makeMenu(a.t, chef, { name: 'Short-lived supper' });
    const listedByB = async () =>
      (
        (await b.t.http.get('/api/menus?pageSize=100').expect(200)).body as {
          items: { id: string }[];
        }
      ).items.some((m) => m.id === menu);
    expect(await listedByB()).toBe(true); // B has the cards cached now
    await a.t.http.delete(`/api/menus/${menu}`).set(bearer(chef)).expect(204);
    const removedAt = Date.now();
    while ((await listedByB()) && Date.now() - removedAt < 3000) await pause(100);
    expect(await listedByB()).toBe(false);
    // B's cards follow a write it did not see within the second its revision lasts (plus a poll).
    expect(Date.now() - removedAt).toBeLessThan(1500);
  });

  it('hold the sign-in limit between them: attempts through either count once (OWASP ASVS 5.0 V6.3.1)', async () => {
    const { user } = await makeUser(a.t);
    const statuses: number[] = [];
    let retryAfter: string | undefined;
    for (let i = 0; i < 12; i += 1) {
      const app = i % 2 === 0 ? a : b; // alternately: each process alone sees only 6
      const res = await app.t.http
        .post('/api/auth/login')
        .send({ email: user.email, password: `wrong guess ${i}` });
      statuses.push(res.status);
      if (res.status === 429) retryAfter = res.headers['retry-after'] as string | undefined;
    }
    // AUTH_THROTTLE_LIMIT is 10 a minute by default (config/env.ts).
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(10)).toEqual([429, 429]);
    expect(Number(retryAfter)).toBeGreaterThan(0);
  });
});
