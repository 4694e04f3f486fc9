import { Role } from '@nappe/shared';
import { In } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { OrderSubstitutionEntity } from '../src/allergy-notes/entities/order-substitution.entity.js';
import { AuthService } from '../src/auth/auth.service.js';
import { PasswordResetTokenEntity } from '../src/auth/entities/password-reset-token.entity.js';
import { AuthSession } from '../src/auth/entities/auth-session.entity.js';
import { OutboxMessageEntity } from '../src/mail/entities/outbox-message.entity.js';
import { OrderEventEntity } from '../src/orders/entities/order-event.entity.js';
import { OrderGuestEntity } from '../src/orders/entities/order-guest.entity.js';
import { OrderEntity } from '../src/orders/entities/order.entity.js';
import { PaymentEntity } from '../src/payments/entities/payment.entity.js';
import { ConsentRecordEntity } from '../src/privacy/entities/consent-record.entity.js';
import { OrderGuestSummaryEntity } from '../src/privacy/entities/order-guest-summary.entity.js';
import { PrivacyAuditEntity } from '../src/privacy/entities/privacy-audit.entity.js';
import { User } from '../src/users/entities/user.entity.js';
import {
  bearer,
  bookOrder,
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
import { pdfText } from './factories/pdf-text.js';
import { GOOD_PASSWORD, signIn, uniqueEmail } from './factories/test-app.js';

/**
 * A client's rights over their data (GDPR Art. 15 access, Art. 20 portability, Art. 17 erasure)
 * without losing the studio's payment records (Art. 17(3)(b): a legal obligation to keep them).
 * The ledger check follows Stripe's reconciliation guidance (QUALITY.md, Payments): settled
 * payments − settled refunds per order = what the payment service holds for it.
 */

let app: BookingApp;
let pay: FakeHarness;
let chef: string;
let menu: GuestMenu;

beforeAll(async () => {
  app = await createBookingApp({ THROTTLE_LIMIT: '10000', AUTH_THROTTLE_LIMIT: '1000' });
  pay = startPaymentFake(app);
  await setStudio(app.t, { timeZone: 'Europe/Brussels', dailyPlateCapacity: 1000 });
  chef = (await signedIn(app.t, Role.Chef)).token;
  menu = await makeGuestMenu(app.t, chef);
});
afterAll(async () => {
  pay.close();
  await app.t.close();
});

const repo = <T extends object>(entity: new () => T) => app.t.dataSource.getRepository(entity);

/** A client who registered through the API, with a name and e-mail of their own. */
async function registeredClient(name: string) {
  const email = uniqueEmail('client');
  const res = await app.t.http
    .post('/api/auth/register')
    .send({ email, name, password: GOOD_PASSWORD })
    .expect(201);
  const cookie = ([] as string[])
    .concat(res.headers['set-cookie'] ?? [])
    .find((c) => c.startsWith('nappe_refresh='))!
    .split(';')[0]!;
  return {
    id: res.body.user.id as string,
    email,
    name,
    token: res.body.accessToken as string,
    cookie,
  };
}

/** What the payment service holds for an order: charges minus what was refunded from them. */
function heldByService(orderId: string): number {
  let held = 0;
  for (const charge of pay.fake.state.charges.values()) {
    if (charge.metadata.orderId === orderId) held += charge.amount - charge.amount_refunded;
  }
  return held;
}

async function ledgerNet(orderId: string): Promise<number> {
  let net = 0;
  for (const p of await repo(PaymentEntity).findBy({ orderId, status: 'succeeded' })) {
    net += p.kind === 'refund' ? -p.amountMinor : p.amountMinor;
  }
  return net;
}

describe('GET /api/me/export', () => {
  it('gives the client everything held about them as a JSON attachment, and nothing of anyone else', async () => {
    app.clock.set(TEST_NOW);
    const ada = await registeredClient('Ada Pemberton-Vale');
    const bea = await registeredClient('Beatrix Holloway-Crane');
    const adaGuests = distinctiveGuests('ada');
    const beaGuests = distinctiveGuests('bea');
    const adaOrder = await bookAndPayDeposit(app, ada.token, menu.menuId, {
      guestRequirements: adaGuests,
      guestDataConsent: true,
      occasion: 'Ada’s garden supper',
    });
    await substituteAndConfirm(app, chef, adaOrder, menu);
    const beaOrder = await bookAndPayDeposit(app, bea.token, menu.menuId, {
      guestRequirements: beaGuests,
      guestDataConsent: true,
      occasion: 'Beatrix’s retirement',
    });
    await app.drainOutbox();
    // The chef opens Ada's guest list: the export tells her, by role and time.
    await app.t.http.get(`/api/orders/${adaOrder}/allergy-notes`).set(bearer(chef)).expect(200);

    const res = await app.t.http.get('/api/me/export').set(bearer(ada.token)).expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.headers['content-disposition']).toBe(
      'attachment; filename="nappe-my-data-2026-03-06.json"',
    );
    expect(res.headers['cache-control']).toBe('no-store');
    const data = res.body;
    expect(data).toMatchObject({
      format: 'nappe-personal-data-export',
      version: 1,
      account: { id: ada.id, name: 'Ada Pemberton-Vale', email: ada.email, role: 'client' },
    });
    expect(data.sessions.length).toBeGreaterThanOrEqual(1);
    expect(data.orders).toHaveLength(1);
    const order = data.orders[0];
    expect(order).toMatchObject({
      id: adaOrder,
      status: 'confirmed',
      occasion: 'Ada’s garden supper',
      guestCount: 20,
      menu: { name: 'Crumble supper' },
      guestDetailsRemoved: null,
    });
    expect(order.guests.map((g: { label: string }) => g.label)).toEqual(
      adaGuests.map((g) => g.label),
    );
    expect(order.guests[0].notes).toBe(adaGuests[0]!.notes);
    expect(order.substitutions).toEqual([
      expect.objectContaining({
        guestLabel: adaGuests[0]!.label,
        dessert: 'Crumble and tuile',
        changes: [{ component: 'Almond crumble', replacement: 'Sugar crumble' }],
      }),
    ]);
    // €15.00 × 20 guests = €300.00; the studio's 30 % deposit = €90.00, paid and settled.
    expect(order.totalMinor).toBe(30_000);
    expect(order.payments).toEqual([
      expect.objectContaining({ kind: 'deposit', status: 'succeeded', amountMinor: 9000 }),
    ]);
    expect(order.timeline.map((e: { toStatus: string | null }) => e.toStatus)).toEqual(
      expect.arrayContaining(['pending_payment', 'requested', 'confirmed']),
    );
    expect(order.guestDataOpenings).toEqual(
      expect.arrayContaining([expect.objectContaining({ role: 'chef', what: 'allergy_notes' })]),
    );
    expect(data.consents.map((c: { kind: string }) => c.kind).sort()).toEqual([
      'booking_terms',
      'guest_data',
    ]);
    expect(data.consents[0].statement).toMatch(/booking terms|guests agreed/);
    expect(data.emails.length).toBeGreaterThan(0);
    expect(data.emails.every((e: { to: string }) => e.to === ada.email)).toBe(true);

    // Nothing of the other client: not her name, e-mail, order, guests or occasion.
    const text = JSON.stringify(data);
    for (const other of [
      bea.email,
      bea.name,
      bea.id,
      beaOrder,
      'Beatrix’s retirement',
      ...beaGuests.map((g) => g.label),
    ]) {
      expect(text).not.toContain(other);
    }
    expect(
      await repo(PrivacyAuditEntity).countBy({ userId: ada.id, action: 'data_exported' }),
    ).toBe(1);
  });

  it('is the client’s own: 401 without a token, 403 for the studio’s accounts', async () => {
    await app.t.http.get('/api/me/export').expect(401);
    await app.t.http.get('/api/me/export').set(bearer(chef)).expect(403);
    const staff = (await signedIn(app.t, Role.Staff)).token;
    await app.t.http.get('/api/me/export').set(bearer(staff)).expect(403);
  });
});

describe('DELETE /api/me', () => {
  it('asks for the current password: missing or unknown fields 400, a wrong one 403, nothing changes', async () => {
    const c = await registeredClient('Cosima Threlkeld');
    await app.t.http.delete('/api/me').set(bearer(c.token)).send({}).expect(400);
    await app.t.http
      .delete('/api/me')
      .set(bearer(c.token))
      .send({ password: GOOD_PASSWORD, userId: 'someone-else' })
      .expect(400);
    const wrong = await app.t.http
      .delete('/api/me')
      .set(bearer(c.token))
      .send({ password: 'not my password at all' })
      .expect(403);
    expect(wrong.body.message).toBe(
      'That is not your current password. Your account was not deleted.',
    );
    await app.t.http.get('/api/auth/me').set(bearer(c.token)).expect(200);
    expect(await repo(User).findOneByOrFail({ id: c.id })).toMatchObject({
      email: c.email,
      removedAt: null,
    });
    await app.t.http.delete('/api/me').set(bearer(chef)).send({ password: 'x' }).expect(403);
  });

  it('refuses with 409 while an event is upcoming — requested, or a checkout still open — saying to cancel first', async () => {
    app.clock.set(TEST_NOW);
    const d = await registeredClient('Dorian Ashcombe');
    const booked = await bookAndPayDeposit(app, d.token, menu.menuId, {
      guestRequirements: distinctiveGuests('dorian'),
      guestDataConsent: true,
    });
    const res = await app.t.http
      .delete('/api/me')
      .set(bearer(d.token))
      .send({ password: GOOD_PASSWORD })
      .expect(409);
    expect(res.body.message).toMatch(
      /^Your account cannot be deleted while you have an upcoming booking: N-2026-\d{4} on Saturday 20 June 2026\. Cancel it first in My events/,
    );
    expect(res.body.upcoming).toEqual([
      expect.objectContaining({ id: booked, status: 'requested', eventDate: '2026-06-20' }),
    ]);
    expect(await repo(OrderGuestEntity).countBy({ orderId: booked })).toBe(3);
    await app.t.http.get('/api/auth/me').set(bearer(d.token)).expect(200);

    // Cancelled, the booking no longer blocks; an unpaid booking with its checkout open does.
    await app.t.http.post(`/api/orders/${booked}/cancel`).set(bearer(d.token)).send({}).expect(200);
    const { id: unpaid } = await bookOrder(app.t, d.token, menu.menuId, {
      eventDate: '2026-07-04',
    });
    await app.t.http
      .post(`/api/orders/${unpaid}/checkout`)
      .set(bearer(d.token))
      .send({ plan: 'deposit' })
      .expect(200);
    const open = await app.t.http
      .delete('/api/me')
      .set(bearer(d.token))
      .send({ password: GOOD_PASSWORD })
      .expect(409);
    expect(open.body.upcoming).toEqual([expect.objectContaining({ id: unpaid })]);
    // Once the 30-minute hold has lapsed, the unpaid booking holds nothing.
    app.clock.advance(31 * 60_000);
    await app.t.http
      .delete('/api/me')
      .set(bearer(d.token))
      .send({ password: GOOD_PASSWORD })
      .expect(200);
  });

  it('is one transaction: a failure half-way leaves the account and its guests as they were', async () => {
    app.clock.set(TEST_NOW);
    const f = await registeredClient('Florian Marchbanks');
    const { id } = await bookOrder(app.t, f.token, menu.menuId, {
      guestRequirements: distinctiveGuests('florian'),
      guestDataConsent: true,
    });
    await app.t.http.post(`/api/orders/${id}/cancel`).set(bearer(f.token)).send({}).expect(200);
    const auth = app.t.app.get(AuthService);
    const spy = vi
      .spyOn(auth, 'revokeAllSessions')
      .mockRejectedValueOnce(new Error('disk full (simulated)'));
    await app.t.http
      .delete('/api/me')
      .set(bearer(f.token))
      .send({ password: GOOD_PASSWORD })
      .expect(500);
    spy.mockRestore();
    expect(await repo(OrderGuestEntity).countBy({ orderId: id })).toBe(3);
    expect(await repo(OrderGuestSummaryEntity).countBy({ orderId: id })).toBe(0);
    expect(await repo(OrderEntity).findOneByOrFail({ id })).toMatchObject({
      occasion: 'Birthday dinner',
    });
    expect(await repo(User).findOneByOrFail({ id: f.id })).toMatchObject({
      email: f.email,
      name: 'Florian Marchbanks',
      removedAt: null,
    });
    await app.t.http.get('/api/auth/me').set(bearer(f.token)).expect(200);
  });

  it('erases the person, keeps the payments with an anonymous reference, and the ledger still reconciles', async () => {
    app.clock.set(TEST_NOW);
    const e = await registeredClient('Evangeline Fairweather');
    const guests = distinctiveGuests('evangeline');
    const orderId = await bookAndPayDeposit(app, e.token, menu.menuId, {
      guestRequirements: guests,
      guestDataConsent: true,
      occasion: 'Evangeline’s fortieth',
      venueAddressLines: ['Hollyhock Lane 7', '9000 Gent'],
    });
    await substituteAndConfirm(app, chef, orderId, menu);
    // 106 days before the event: the 30-day tier refunds 100 % of the €90.00 deposit.
    await app.t.http
      .post(`/api/orders/${orderId}/cancel`)
      .set(bearer(e.token))
      .send({ reason: 'Evangeline moved abroad' })
      .expect(200);
    await app.drainOutbox();
    expect(await repo(OutboxMessageEntity).countBy({ toAddress: e.email })).toBeGreaterThan(0);
    const paymentsBefore = await repo(PaymentEntity).find({
      where: { orderId },
      order: { createdAt: 'ASC' },
    });
    expect(paymentsBefore.map((p) => [p.kind, p.status, p.amountMinor])).toEqual([
      ['deposit', 'succeeded', 9000],
      ['refund', 'succeeded', 9000],
    ]);
    const dashboardBefore = (
      await app.t.http.get('/api/insights/dashboard').set(bearer(chef)).expect(200)
    ).body;
    // A password-reset link asked for and never used.
    await app.t.http.post('/api/auth/password-reset').send({ email: e.email }).expect(202);
    expect(await repo(PasswordResetTokenEntity).countBy({ userId: e.id })).toBe(1);

    const res = await app.t.http
      .delete('/api/me')
      .set(bearer(e.token))
      .set('Origin', 'http://localhost:5173')
      .send({ password: GOOD_PASSWORD })
      .expect(200);
    expect(res.body).toMatchObject({
      deleted: true,
      ordersAnonymised: 1,
      guestEntriesRemoved: 3,
      paymentRecordsKept: 2,
    });
    expect(res.body.kept[0]).toMatch(/bookkeeping and tax \(GDPR Art\. 17\(3\)\(b\)\)/);
    expect(String(res.headers['set-cookie'])).toMatch(/nappe_refresh=;/);

    // The person is gone: name, e-mail, password, sessions.
    const user = await repo(User).findOneByOrFail({ id: e.id });
    expect(user).toMatchObject({
      name: 'Deleted client',
      email: `erased-${e.id}@erased.invalid`,
      passwordHash: '',
    });
    expect(user.removedAt).not.toBeNull();
    const sessions = await repo(AuthSession).find({ where: { userId: e.id } });
    expect(sessions.length).toBeGreaterThan(0);
    expect(
      sessions.every((s) => s.revokedAt !== null && s.revokedReason === 'account_deleted'),
    ).toBe(true);
    expect(await repo(OutboxMessageEntity).countBy({ toAddress: e.email })).toBe(0);
    expect(await repo(PasswordResetTokenEntity).countBy({ userId: e.id })).toBe(0);

    // The guests are gone, their anonymous counts kept.
    expect(await repo(OrderGuestEntity).countBy({ orderId })).toBe(0);
    expect(await repo(OrderSubstitutionEntity).countBy({ orderId })).toBe(0);
    expect(await repo(OrderGuestSummaryEntity).findOneByOrFail({ orderId })).toMatchObject({
      reason: 'account_deleted',
      guestsListed: 3,
      allergenCounts: { nuts: 1, gluten: 1 },
    });

    // The client cannot come back: the old token, the refresh cookie and the password all fail.
    await app.t.http.get('/api/auth/me').set(bearer(e.token)).expect(401);
    await app.t.http
      .post('/api/auth/refresh')
      .set('Origin', 'http://localhost:5173')
      .set('Cookie', e.cookie)
      .expect(401);
    await app.t.http
      .post('/api/auth/login')
      .send({ email: e.email, password: GOOD_PASSWORD })
      .expect(401);

    // The studio keeps the booking and its payments, with no one named.
    const detail = await app.t.http.get(`/api/orders/${orderId}`).set(bearer(chef)).expect(200);
    expect(detail.body).toMatchObject({
      clientName: 'Deleted client',
      clientEmail: `erased-${e.id}@erased.invalid`,
      occasion: 'Private event',
      contactPhone: '',
      guests: [],
      guestDetailsRemoved: { reason: 'account_deleted' },
      status: 'cancelled',
      totalMinor: 30_000,
    });
    expect(detail.body.venueAddressLines).toEqual(['Removed at the client’s request']);
    const text = JSON.stringify(detail.body);
    for (const gone of [
      'Evangeline',
      e.email,
      'Hollyhock',
      'fortieth',
      'moved abroad',
      ...guests.map((g) => g.label),
    ]) {
      expect(text).not.toContain(gone);
    }
    expect(detail.body.timeline.at(-1).summary).toMatch(
      /^Client account deleted at the client’s request/,
    );

    // The ledger is untouched and still reconciles with the payment service.
    const paymentsAfter = await repo(PaymentEntity).find({
      where: { orderId },
      order: { createdAt: 'ASC' },
    });
    expect(paymentsAfter).toEqual(paymentsBefore);
    expect(await ledgerNet(orderId)).toBe(heldByService(orderId));
    expect(await ledgerNet(orderId)).toBe(0);
    const all = await repo(OrderEntity).find();
    for (const o of all) expect(await ledgerNet(o.id), o.reference).toBe(heldByService(o.id));
    const dashboardAfter = (
      await app.t.http.get('/api/insights/dashboard').set(bearer(chef)).expect(200)
    ).body;
    expect(dashboardAfter.revenueByMonth).toEqual(dashboardBefore.revenueByMonth);

    // The studio can still issue the receipt, billed to the anonymous reference.
    const deposit = paymentsAfter[0]!;
    const pdf = await app.t.http
      .get(`/api/orders/${orderId}/receipts/${deposit.id}.pdf`)
      .set(bearer(chef))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    const receipt = pdfText(pdf.body as Buffer).join(' ');
    expect(receipt).toContain('Deleted client');
    expect(receipt).not.toContain('Evangeline');

    // The audit: one row for the request, one line on the order; the consents stay as proof.
    expect(await repo(PrivacyAuditEntity).findOneByOrFail({ userId: e.id })).toMatchObject({
      action: 'account_deleted',
      detail: { ordersAnonymised: 1, guestEntriesRemoved: 3, paymentRecordsKept: 2 },
    });
    expect(await repo(ConsentRecordEntity).countBy({ orderId })).toBe(2);
    const clientLines = await repo(OrderEventEntity).findBy({ orderId, actorUserId: e.id });
    expect(clientLines.every((l) => l.reason === null)).toBe(true);

    // The address is free again: a new account with it starts empty.
    const again = await app.t.http
      .post('/api/auth/register')
      .send({ email: e.email, name: 'Evangeline Fairweather', password: GOOD_PASSWORD })
      .expect(201);
    const mine = await app.t.http
      .get('/api/orders')
      .set(bearer(again.body.accessToken as string))
      .expect(200);
    expect(mine.body.items).toEqual([]);
    const fresh = await signIn(app.t, e.email, GOOD_PASSWORD);
    expect(fresh.token).toBeTruthy();
    expect(await repo(OrderEntity).countBy({ clientId: In([again.body.user.id as string]) })).toBe(
      0,
    );
  });
});
