import { Role } from '@nappe/shared';
import type { LoggerService } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Clock } from '../src/common/clock.js';
import { MAIL_TRANSPORT } from '../src/mail/mail-transport.js';
import { OutboxWorker } from '../src/mail/outbox.worker.js';
import { GuestDataRetentionJob } from '../src/privacy/guest-data-retention.job.js';
import {
  bearer,
  ControlledClock,
  orderBody,
  newKey,
  RecordingTransport,
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
} from './factories/guest-data.js';
import { createTestApp, GOOD_PASSWORD, uniqueEmail } from './factories/test-app.js';

/**
 * Guest data never appears in logs (OWASP Logging Cheat Sheet, "Data to exclude": sensitive
 * personal data such as health; GDPR Art. 9 special-category data). The request log (pino-http,
 * at its most talkative level) and the Nest logger are captured while a client books with
 * distinctive guest names and notes, the studio works on the allergy notes and opens the
 * briefing, the purge runs, the client exports and deletes — then searched for every one of them.
 */

let app: BookingApp;
let pay: FakeHarness;
const requestLog: string[] = [];
const appLog: string[] = [];

const capture: LoggerService = {
  log: (m: unknown, ...rest: unknown[]) => appLog.push([m, ...rest].map(String).join(' ')),
  error: (m: unknown, ...rest: unknown[]) => appLog.push([m, ...rest].map(String).join(' ')),
  warn: (m: unknown, ...rest: unknown[]) => appLog.push([m, ...rest].map(String).join(' ')),
  debug: (m: unknown, ...rest: unknown[]) => appLog.push([m, ...rest].map(String).join(' ')),
  verbose: (m: unknown, ...rest: unknown[]) => appLog.push([m, ...rest].map(String).join(' ')),
};

beforeAll(async () => {
  const clock = new ControlledClock(TEST_NOW);
  const mail = new RecordingTransport();
  const t = await createTestApp(
    { STRIPE_TIMEOUT_MS: '1500', THROTTLE_LIMIT: '10000', LOG_LEVEL: 'trace' },
    {
      configure: (b) =>
        b.overrideProvider(Clock).useValue(clock).overrideProvider(MAIL_TRANSPORT).useValue(mail),
      logStream: { write: (line) => void requestLog.push(line) },
    },
  );
  t.app.useLogger(capture);
  const worker = t.app.get(OutboxWorker);
  app = { t, clock, mail, drainOutbox: () => worker.drainOutbox() };
  pay = startPaymentFake(app);
  await setStudio(t, { timeZone: 'Europe/Brussels', dailyPlateCapacity: 1000 });
});
afterAll(async () => {
  pay.close();
  await app.t.close();
});

describe('logs hold no guest data', () => {
  it('after booking, briefing, purge, export and deletion, no log line names a guest or their allergy notes', async () => {
    const chef = (await signedIn(app.t, Role.Chef)).token;
    const staff = (await signedIn(app.t, Role.Staff)).token;
    const menu = await makeGuestMenu(app.t, chef);
    const email = uniqueEmail('client');
    const client = (
      await app.t.http
        .post('/api/auth/register')
        .send({ email, name: 'Perpetua Langridge', password: GOOD_PASSWORD })
        .expect(201)
    ).body.accessToken as string;
    const guests = distinctiveGuests('logcheck');
    const secrets = [
      ...guests.map((g) => g.label),
      ...guests.flatMap((g) => (g.notes ? [g.notes] : [])),
      'Zephyrine',
      'anaphylaxis',
      'adrenaline',
      'Lactose',
      'Plated without the crumble for Zephyrine',
    ];

    // A booking refused for its guest list: the 400 is logged, its body is not.
    await app.t.http
      .post('/api/orders')
      .set(bearer(client))
      .set('Idempotency-Key', newKey())
      .send(
        orderBody(menu.menuId, {
          guestCount: 2,
          guestRequirements: guests,
          guestDataConsent: true,
        }),
      )
      .expect(400);
    const id = await bookAndPayDeposit(app, client, menu.menuId, {
      guestRequirements: guests,
      guestDataConsent: true,
    });
    await app.t.http.get(`/api/orders/${id}/allergy-notes`).set(bearer(chef)).expect(200);
    await substituteAndConfirm(app, chef, id, menu, 'Plated without the crumble for Zephyrine');
    await app.t.http.get(`/api/orders/${id}/briefing`).set(bearer(staff)).expect(200);
    await app.t.http.get(`/api/orders/${id}/briefing.pdf`).set(bearer(staff)).expect(200);
    await app.t.http.get(`/api/orders/${id}`).set(bearer(staff)).expect(200);
    await app.t.http.get('/api/me/export').set(bearer(client)).expect(200);
    await app.drainOutbox();

    // After the retention date: refused openings, then the purge.
    app.clock.set('2026-07-21T08:00:00Z');
    await app.t.http.get(`/api/orders/${id}/briefing`).set(bearer(staff)).expect(410);
    expect((await app.t.app.get(GuestDataRetentionJob).purgeExpired()).guestsRemoved).toBe(3);
    await app.t.http
      .delete('/api/me')
      .set(bearer(client))
      .send({ password: GOOD_PASSWORD })
      .expect(200);

    // The capture works: the request log has the requests (method, path, status) …
    const requests = requestLog.join('');
    expect(requestLog.length).toBeGreaterThan(15);
    expect(requests).toContain(`"path":"/api/orders/${id}/briefing"`);
    expect(requests).toContain('"statusCode":410');
    expect(requests).toContain('"statusCode":400');
    // … and the app log has the purge's line.
    expect(appLog.join('\n')).toMatch(/Guest data retention \(30 days; .*removed 3 guest entries/);

    for (const secret of secrets) {
      expect(requests, secret).not.toContain(secret);
      expect(appLog.join('\n'), secret).not.toContain(secret);
    }
    // E-mails carry no allergy details either (they link to the signed-in page).
    expect(app.mail.sent.length).toBeGreaterThan(0);
    for (const message of app.mail.sent) {
      for (const secret of secrets) expect(message.raw, secret).not.toContain(secret);
    }
  });
});
