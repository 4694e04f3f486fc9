import { Role } from '@nappe/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { bookingReceivedMail } from '../src/mail/booking-mail.js';
import { OutboxMessageEntity } from '../src/mail/entities/outbox-message.entity.js';
import { OutboxService } from '../src/mail/outbox.service.js';
import { OUTBOX_MAX_ATTEMPTS } from '../src/mail/outbox.worker.js';
import { User } from '../src/users/entities/user.entity.js';
import {
  bearer,
  bookOrder,
  createBookingApp,
  makeMenu,
  payOnPage,
  setStudio,
  signedIn,
  startPaymentFake,
  TEST_NOW,
  type BookingApp,
  type FakeHarness,
} from './factories/booking.js';

let app: BookingApp;
let pay: FakeHarness;
let menu: string;

beforeAll(async () => {
  app = await createBookingApp();
  pay = startPaymentFake(app);
  const chef = (await signedIn(app.t, Role.Chef)).token;
  menu = await makeMenu(app.t, chef, { name: 'Pear and bay supper' });
  await setStudio(app.t, { timeZone: 'Europe/Brussels', name: 'Atelier Test' });
});
afterAll(async () => {
  pay.close();
  await app.t.close();
});
beforeEach(async () => {
  app.clock.set(TEST_NOW);
  app.mail.down = false;
  app.mail.sent.length = 0;
  // Each test starts with an empty outbox.
  await app.drainOutbox();
  app.mail.sent.length = 0;
});

const messages = () => app.t.dataSource.getRepository(OutboxMessageEntity);

async function enqueue(subject = 'A note from the studio', to = 'someone@example.test') {
  const outbox = app.t.app.get(OutboxService);
  await app.t.dataSource.transaction((m) =>
    outbox.enqueue(m, {
      kind: 'test',
      orderId: null,
      to,
      content: { subject, text: 'Hello.', html: '<p>Hello.</p>' },
    }),
  );
  return messages().findOneOrFail({
    where: { subject: subject.replace(/[\r\n]+/g, ' ').trim() },
    order: { createdAt: 'DESC' },
  });
}

/** The header block of a raw MIME message (RFC 5322: headers end at the first empty line). */
const headersOf = (raw: string) => raw.slice(0, raw.indexOf('\r\n\r\n'));

describe('the outbox (FAKES.md: a slow or absent SMTP server never loses or repeats a message)', () => {
  it('keeps a message while SMTP is down, retries with backoff, and sends it once when it is back', async () => {
    const row = await enqueue('Waiting for the server');
    app.mail.down = true;
    expect(await app.drainOutbox()).toEqual({ sent: 0, retrying: 1, failed: 0 });
    let stored = await messages().findOneByOrFail({ id: row.id });
    expect(stored).toMatchObject({ status: 'pending', attempts: 1 });
    expect(stored.lastError).toMatch(/ECONNREFUSED/);
    expect(stored.nextAttemptAt.getTime() - app.clock.now().getTime()).toBe(30_000);

    expect(await app.drainOutbox()).toEqual({ sent: 0, retrying: 0, failed: 0 }); // not due yet
    app.clock.advance(30_000);
    await app.drainOutbox();
    stored = await messages().findOneByOrFail({ id: row.id });
    expect(stored.attempts).toBe(2);
    expect(stored.nextAttemptAt.getTime() - app.clock.now().getTime()).toBe(60_000); // doubled

    app.mail.down = false;
    app.clock.advance(60_000);
    expect(await app.drainOutbox()).toEqual({ sent: 1, retrying: 0, failed: 0 });
    expect(await app.drainOutbox()).toEqual({ sent: 0, retrying: 0, failed: 0 });
    expect(app.mail.sent.filter((s) => s.subject === 'Waiting for the server')).toHaveLength(1);
    stored = await messages().findOneByOrFail({ id: row.id });
    expect(stored).toMatchObject({ status: 'sent', attempts: 3, lastError: null });
    expect(stored.sentAt?.toISOString()).toBe(app.clock.now().toISOString());
  });

  it('sends each message exactly once when several drains run at the same time', async () => {
    for (let i = 0; i < 6; i += 1) await enqueue(`Concurrent ${i}`);
    const reports = await Promise.all(Array.from({ length: 5 }, () => app.drainOutbox()));
    expect(reports.reduce((sum, r) => sum + r.sent, 0)).toBe(6);
    const subjects = app.mail.sent.map((s) => s.subject).sort();
    expect(subjects).toEqual([0, 1, 2, 3, 4, 5].map((i) => `Concurrent ${i}`));
  });

  it('marks a message failed after the last attempt', async () => {
    const row = await enqueue('Never delivered');
    await messages().update({ id: row.id }, { attempts: OUTBOX_MAX_ATTEMPTS - 1 });
    app.mail.down = true;
    expect(await app.drainOutbox()).toEqual({ sent: 0, retrying: 0, failed: 1 });
    expect(await messages().findOneByOrFail({ id: row.id })).toMatchObject({ status: 'failed' });
    app.mail.down = false;
    app.clock.advance(24 * 3_600_000);
    expect((await app.drainOutbox()).sent).toBe(0);
  });

  it('sends again a message left "sending" by a process that died mid-send', async () => {
    const row = await enqueue('Interrupted');
    await messages().update(
      { id: row.id },
      {
        status: 'sending',
        attempts: 1,
        updatedAt: new Date(app.clock.now().getTime() - 11 * 60_000),
      },
    );
    expect((await app.drainOutbox()).sent).toBe(1);
    expect(await messages().findOneByOrFail({ id: row.id })).toMatchObject({
      status: 'sent',
      attempts: 2,
    });
  });

  it('cannot add headers through CR/LF in a subject or an address (QUALITY.md: injection)', async () => {
    const row = await enqueue('Hello\r\nBcc: victim@example.test');
    expect(row.subject).toBe('Hello Bcc: victim@example.test');
    await app.drainOutbox();
    const sent = app.mail.sent.at(-1)!;
    expect(sent.subject).toBe('Hello Bcc: victim@example.test');
    expect(headersOf(sent.raw)).not.toMatch(/^Bcc:/im);
    // An address that is not one plain address is never sent (a group could add recipients).
    const sneaky = await enqueue('To two people', 'guest@example.test\r\nBcc: victim@example.test');
    expect(sneaky).toMatchObject({ status: 'failed' });
    expect((await app.drainOutbox()).sent).toBe(0);
    expect(app.mail.sent.some((s) => s.to.includes('victim'))).toBe(false);
  });

  it('escapes names in the HTML and keeps them out of the headers', () => {
    const mail = bookingReceivedMail(
      { name: 'Atelier <Test>', storefrontUrl: 'http://localhost:5173' },
      {
        orderId: 'o1',
        reference: 'N-2026-0001',
        clientName: '<script>alert(1)</script>',
        menuName: 'Pear & bay',
        eventDate: '2026-06-20',
        serviceTime: '19:30',
        guestCount: 20,
        currency: 'EUR',
      },
      7200,
      'Deposit',
    );
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('&lt;script&gt;');
    expect(mail.html).toContain('Pear &amp; bay');
    expect(mail.subject).toBe('Booking received — N-2026-0001');
  });
});

describe('booking e-mails', () => {
  it('sends "booking received" after payment with the receipt attached, a link, and no guest details', async () => {
    const client = await signedIn(app.t, Role.Client);
    await app.t.dataSource
      .getRepository(User)
      .update({ id: client.user.id }, { name: 'Selma\r\nBcc: victim@example.test' });
    const { id } = await bookOrder(app.t, client.token, menu, {
      guestRequirements: [
        {
          label: 'Aunt Mireille',
          table: '3',
          allergens: ['peanuts'],
          diets: ['vegan'],
          notes: 'Carries an adrenaline pen',
        },
      ],
      guestDataConsent: true,
    });
    const co = await app.t.http
      .post(`/api/orders/${id}/checkout`)
      .set(bearer(client.token))
      .send({ plan: 'deposit' })
      .expect(200);
    expect((await payOnPage(co.body.checkoutUrl)).status).toBe(303);
    expect(await messages().countBy({ orderId: id, status: 'pending' })).toBe(1);

    await app.drainOutbox();
    const sent = app.mail.sent.find((s) => s.to === client.user.email)!;
    expect(sent.subject).toMatch(/^Booking received — N-2026-\d{4}$/);
    const headers = headersOf(sent.raw);
    expect(headers).not.toMatch(/^Bcc:/im);
    expect(sent.raw).toMatch(
      /Content-Type: application\/pdf; name=receipt-N-2026-\d{4}-[0-9A-F]{8}\.pdf/,
    );
    const pdf = sent.message.attachments?.[0]?.content as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = String(sent.message.text);
    expect(text).toContain(`http://localhost:5173/my-events/${id}`);
    expect(text).toContain('€72.00');
    for (const secret of ['Mireille', 'peanut', 'Peanut', 'vegan', 'adrenaline', 'Table 3']) {
      expect(sent.raw).not.toContain(secret);
    }
  });

  it('sends the cancellation with its refund amount, and the confirmation with the event file', async () => {
    const client = await signedIn(app.t, Role.Client);
    const chef = (await signedIn(app.t, Role.Chef)).token;
    const { id } = await bookOrder(app.t, client.token, menu, { eventDate: '2026-07-11' });
    const co = await app.t.http
      .post(`/api/orders/${id}/checkout`)
      .set(bearer(client.token))
      .send({ plan: 'deposit' })
      .expect(200);
    await payOnPage(co.body.checkoutUrl);
    await app.t.http.post(`/api/orders/${id}/confirm`).set(bearer(chef)).send({}).expect(200);
    app.clock.set('2026-06-01T08:00:00Z'); // 40 days before: 100 %
    await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(client.token))
      .send({})
      .expect(200);
    await app.drainOutbox();
    const mine = app.mail.sent.filter((s) => s.to === client.user.email);
    expect(mine.map((s) => s.subject.replace(/N-2026-\d{4}/, 'REF'))).toEqual([
      'Booking received — REF',
      'Your event is confirmed — REF',
      'Booking cancelled — REF',
    ]);
    expect(mine[1]!.raw).toMatch(
      /Content-Type: text\/calendar; charset=utf-8; name=event-N-2026-\d{4}\.ics/,
    );
    expect(String(mine[2]!.message.text)).toContain('€72.00 is refunded');
  });
});

describe('the worker on a timer', () => {
  it('starts with the app when enabled, sends on its own, and stops on shutdown', async () => {
    const own = await createBookingApp({
      OUTBOX_WORKER_ENABLED: 'true',
      OUTBOX_INTERVAL_MS: '100',
    });
    try {
      const outbox = own.t.app.get(OutboxService);
      await own.t.dataSource.transaction((m) =>
        outbox.enqueue(m, {
          kind: 'test',
          orderId: null,
          to: 'timer@example.test',
          content: { subject: 'By the timer', text: 'Hi', html: '<p>Hi</p>' },
        }),
      );
      const deadline = Date.now() + 3000;
      while (own.mail.sent.length === 0 && Date.now() < deadline) {
        await new Promise((r) => setTimeout(r, 50));
      }
      expect(own.mail.sent.map((s) => s.subject)).toEqual(['By the timer']);
    } finally {
      await own.t.close();
    }
    const attempts = own.mail.attempts;
    await new Promise((r) => setTimeout(r, 300));
    expect(own.mail.attempts).toBe(attempts);
  });
});
