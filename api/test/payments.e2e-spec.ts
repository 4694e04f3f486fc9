import { signWebhookPayload } from '@nappe/docker-free-scripts/payment-fake/index.js';
import { Role } from '@nappe/shared';
import { delay, http, HttpResponse } from 'msw';
import Stripe from 'stripe';
import { In } from 'typeorm';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { OutboxMessageEntity } from '../src/mail/entities/outbox-message.entity.js';
import { OrderEntity } from '../src/orders/entities/order.entity.js';
import { PaymentEntity } from '../src/payments/entities/payment.entity.js';
import { ProcessedWebhookEventEntity } from '../src/payments/entities/processed-webhook-event.entity.js';
import { RefundService } from '../src/payments/refunds.service.js';
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
import { pdfText } from './factories/pdf-text.js';

let app: BookingApp;
let pay: FakeHarness;
let chef: string;
let menu: string;

beforeAll(async () => {
  app = await createBookingApp();
  pay = startPaymentFake(app);
  chef = (await signedIn(app.t, Role.Chef)).token;
  // €12.00 per guest, 21 % VAT included; 30 % deposit; tiers 30 d → 100 %, 14 d → 50 %, 0 → 0 %.
  menu = await makeMenu(app.t, chef, { pricePerGuestMinor: 1200 });
});
afterAll(async () => {
  pay.close();
  await app.t.close();
});
beforeEach(async () => {
  app.clock.set(TEST_NOW);
  pay.hold = false;
  await setStudio(app.t, { timeZone: 'Europe/Brussels', dailyPlateCapacity: 1000 });
});
afterEach(() => pay.server.resetHandlers());

const payments = () => app.t.dataSource.getRepository(PaymentEntity);
const orders = () => app.t.dataSource.getRepository(OrderEntity);
const outbox = () => app.t.dataSource.getRepository(OutboxMessageEntity);

async function newClient(): Promise<string> {
  return (await signedIn(app.t, Role.Client)).token;
}

function checkout(token: string, id: string, plan = 'deposit') {
  return app.t.http.post(`/api/orders/${id}/checkout`).set(bearer(token)).send({ plan });
}

/** Books 20 guests on 2026-06-20 and pays the plan on the payment page. */
async function bookAndPay(
  token: string,
  plan = 'deposit',
  overrides: Record<string, unknown> = {},
) {
  const { id } = await bookOrder(app.t, token, menu, overrides);
  const co = await checkout(token, id, plan);
  expect(co.status).toBe(200);
  const page = await payOnPage(co.body.checkoutUrl);
  expect(page.status).toBe(303);
  return { id, sessionId: co.body.sessionId as string };
}

/** What the payment service holds for an order: charges minus what was refunded from them. */
function heldByService(orderId: string): number {
  let held = 0;
  for (const charge of pay.fake.state.charges.values()) {
    if (charge.metadata.orderId === orderId) held += charge.amount - charge.amount_refunded;
  }
  return held;
}

/** The ledger's net: settled payments in minus settled refunds. */
async function ledgerNet(orderId: string): Promise<number> {
  let net = 0;
  for (const p of await payments().findBy({ orderId, status: 'succeeded' })) {
    net += p.kind === 'refund' ? -p.amountMinor : p.amountMinor;
  }
  return net;
}

describe('checkout → payment page → webhook (Stripe docs: fulfil on checkout.session.completed)', () => {
  it('records the deposit, moves the order to requested and queues the e-mail, in one go', async () => {
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu);
    const co = await checkout(token, id).expect(200);
    expect(co.body).toMatchObject({ amountMinor: 7200, currency: 'EUR' });
    expect(co.body.checkoutUrl).toBe(`http://localhost:12111/pay/${co.body.sessionId}`);
    // 30 minutes' hold and a minute of margin for the payment service's own 30-minute minimum.
    expect(co.body.expiresAt).toBe('2026-03-06T09:31:00.000Z');

    const session = pay.fake.state.checkoutSessions.get(co.body.sessionId)!;
    expect(session).toMatchObject({
      amount_total: 7200,
      currency: 'eur',
      client_reference_id: id,
      metadata: { orderId: id, plan: 'deposit' },
      success_url: `http://localhost:5173/my-events/${id}/booked?session_id={CHECKOUT_SESSION_ID}`,
      cancel_url: `http://localhost:5173/my-events/${id}`,
      expires_at: Date.parse('2026-03-06T09:31:00Z') / 1000,
    });
    const key = [...pay.fake.state.idempotencyKeys.keys()].find((k) =>
      k.startsWith(`order:${id}:`),
    );
    expect(key).toBe(`order:${id}:deposit:v1`);

    const page = await payOnPage(co.body.checkoutUrl);
    expect(page.status).toBe(303);
    expect(page.headers.get('location')).toBe(
      `http://localhost:5173/my-events/${id}/booked?session_id=${co.body.sessionId}`,
    );
    expect(pay.answers.filter((a) => a.status !== 200)).toEqual([]);

    const detail = await app.t.http.get(`/api/orders/${id}`).set(bearer(token)).expect(200);
    expect(detail.body).toMatchObject({
      status: 'requested',
      paidMinor: 7200,
      balanceMinor: 16800,
      actions: { pay: 'balance', cancel: true, changeGuests: true },
    });
    expect(detail.body.payments).toEqual([
      expect.objectContaining({
        kind: 'deposit',
        status: 'succeeded',
        amountMinor: 7200,
        receiptAvailable: true,
      }),
    ]);
    expect(detail.body.timeline.at(-1)).toMatchObject({
      actor: { role: 'system', name: null },
      fromStatus: 'pending_payment',
      toStatus: 'requested',
      summary: 'Deposit of €72.00 received',
    });
    const mail = await outbox().findBy({ orderId: id });
    expect(mail.map((m) => [m.kind, m.status])).toEqual([['booking_received', 'pending']]);
    expect(await ledgerNet(id)).toBe(heldByService(id));
    expect(heldByService(id)).toBe(7200);
  });

  it('serves a receipt PDF per settled payment, with the amount and the VAT inside it', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token);
    const [paid] = await payments().findBy({ orderId: id });
    const res = await app.t.http
      .get(`/api/orders/${id}/receipts/${paid!.id}.pdf`)
      .set(bearer(token))
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = pdfText(pdf).join('\n');
    expect(text).toMatch(/Receipt/);
    expect(text).toMatch(/N-2026-\d{4}/);
    expect(text).toContain('€72.00');
    // The VAT inside €72.00 at 21 %: 7200 × 21 / 121 = 1249.59… → €12.50 (Directive 2006/112/EC Art. 73, 78).
    expect(text).toContain('Of which tax at 21 %: €12.50');
    await app.t.http
      .get(`/api/orders/${id}/receipts/${paid!.id}.pdf`)
      .set(bearer(chef))
      .expect(200);
    const staff = (await signedIn(app.t, Role.Staff)).token;
    await app.t.http
      .get(`/api/orders/${id}/receipts/${paid!.id}.pdf`)
      .set(bearer(staff))
      .expect(403);
    const other = await newClient();
    await app.t.http
      .get(`/api/orders/${id}/receipts/${paid!.id}.pdf`)
      .set(bearer(other))
      .expect(404);
  });

  it('gives two concurrent "Pay" clicks one checkout session (one idempotency key)', async () => {
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu);
    const [a, b] = await Promise.all([checkout(token, id), checkout(token, id)]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(a.body.sessionId).toBe(b.body.sessionId);
    const sessions = [...pay.fake.state.checkoutSessions.values()].filter(
      (s) => s.client_reference_id === id,
    );
    expect(sessions).toHaveLength(1);
    expect(await payments().countBy({ orderId: id })).toBe(1);
  });

  it('keeps the order pending when the card is declined, with nothing recorded as paid', async () => {
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu);
    const co = await checkout(token, id).expect(200);
    const page = await payOnPage(co.body.checkoutUrl, '4000 0000 0000 0002');
    expect(page.status).toBe(402);
    expect(await page.text()).toMatch(/Your card was declined/);
    expect(pay.answers.at(-1)).toMatchObject({
      type: 'payment_intent.payment_failed',
      status: 200,
    });
    const order = await orders().findOneByOrFail({ id });
    expect(order.status).toBe('pending_payment');
    expect((await payments().findBy({ orderId: id })).map((p) => p.status)).toEqual(['pending']);
    expect(await outbox().countBy({ orderId: id })).toBe(0);
    // The same session takes another card.
    expect((await payOnPage(co.body.checkoutUrl)).status).toBe(303);
    expect((await orders().findOneByOrFail({ id })).status).toBe('requested');
  });

  it('expires an unpaid checkout: the order expires and its plates are released', async () => {
    await setStudio(app.t, { dailyPlateCapacity: 30 });
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu, { eventDate: '2026-07-18' });
    const co = await checkout(token, id).expect(200);
    app.clock.advance(31 * 60_000);
    expect(await pay.fake.expireDueSessions()).toContain(co.body.sessionId);
    const order = await orders().findOneByOrFail({ id });
    expect(order.status).toBe('expired');
    expect((await payments().findOneByOrFail({ orderId: id })).status).toBe('expired');
    const days = await app.t.http
      .get(`/api/availability?menuId=${menu}&from=2026-07-18&to=2026-07-18`)
      .expect(200);
    expect(days.body.days[0].remainingPlates).toBe(30);
    await checkout(token, id).expect(409);
  });
});

describe('one fulfilment, applied once (Stripe docs: webhooks may repeat and arrive in any order)', () => {
  it('applies the return from checkout before the webhook, then ignores the late webhook', async () => {
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu);
    const co = await checkout(token, id).expect(200);
    pay.hold = true;
    await payOnPage(co.body.checkoutUrl);
    expect(pay.held.map((d) => d.event.type)).toEqual([
      'checkout.session.completed',
      'payment_intent.succeeded',
    ]);
    const back = await app.t.http
      .post(`/api/orders/${id}/checkout/return`)
      .set(bearer(token))
      .send({ sessionId: co.body.sessionId })
      .expect(200);
    expect(back.body.status).toBe('requested');
    await pay.release();
    expect(await payments().countBy({ orderId: id, status: 'succeeded' })).toBe(1);
    expect(await outbox().countBy({ orderId: id })).toBe(1);
    expect((await orders().findOneByOrFail({ id })).status).toBe('requested');
  });

  it('applies once when the return and the webhooks arrive together, in either order', async () => {
    for (const returnFirst of [true, false]) {
      const token = await newClient();
      const { id } = await bookOrder(app.t, token, menu);
      const co = await checkout(token, id).expect(200);
      pay.hold = true;
      await payOnPage(co.body.checkoutUrl);
      pay.hold = false;
      const back = () =>
        app.t.http
          .post(`/api/orders/${id}/checkout/return`)
          .set(bearer(token))
          .send({ sessionId: co.body.sessionId });
      const held = pay.held.splice(0);
      const deliveries = () => Promise.all(held.reverse().map((d) => pay.deliver(d)));
      const results = returnFirst
        ? await Promise.all([back(), back(), deliveries()])
        : await Promise.all([deliveries(), back(), back()]);
      expect(results.flat().length).toBeGreaterThan(0);
      expect(await payments().countBy({ orderId: id })).toBe(1);
      expect(await payments().countBy({ orderId: id, status: 'succeeded' })).toBe(1);
      expect(await outbox().countBy({ orderId: id })).toBe(1);
      const order = await orders().findOneByOrFail({ id });
      expect(order.status).toBe('requested');
    }
  });

  it('applies a webhook delivered ten times at once only once', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token);
    const completed = [...pay.fake.state.events.values()].find(
      (e) => e.type === 'checkout.session.completed' && e.data.object.client_reference_id === id,
    )!;
    const records = await Promise.all(
      Array.from({ length: 10 }, () => pay.fake.redeliver(completed.id)),
    );
    expect(records.every((r) => r.ok)).toBe(true);
    expect(await payments().countBy({ orderId: id, status: 'succeeded' })).toBe(1);
    expect(await outbox().countBy({ orderId: id })).toBe(1);
    expect(
      await app.t.dataSource
        .getRepository(ProcessedWebhookEventEntity)
        .countBy({ eventId: completed.id }),
    ).toBe(1);
  });

  it('never un-pays on a late "expired" event', async () => {
    const token = await newClient();
    const { id, sessionId } = await bookAndPay(token);
    const session = pay.fake.state.checkoutSessions.get(sessionId)!;
    await pay.fake.emit('checkout.session.expired', {
      ...session,
      status: 'expired',
      payment_status: 'unpaid',
    });
    expect(pay.answers.at(-1)).toMatchObject({ type: 'checkout.session.expired', status: 200 });
    expect((await orders().findOneByOrFail({ id })).status).toBe('requested');
    expect((await payments().findOneByOrFail({ orderId: id })).status).toBe('succeeded');
  });

  it('ends in the same state when payment_intent.succeeded arrives before checkout.session.completed', async () => {
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu);
    const co = await checkout(token, id).expect(200);
    pay.hold = true;
    await payOnPage(co.body.checkoutUrl);
    pay.hold = false;
    const [completed, succeeded] = pay.held.splice(0);
    await pay.deliver(succeeded!);
    expect((await orders().findOneByOrFail({ id })).status).toBe('requested');
    await pay.deliver(completed!);
    const row = await payments().findOneByOrFail({ orderId: id });
    expect(row).toMatchObject({
      status: 'succeeded',
      amountMinor: 7200,
      providerSessionId: co.body.sessionId,
    });
    expect(row.providerPaymentIntentId).toMatch(/^pi_/);
    expect(await outbox().countBy({ orderId: id })).toBe(1);
  });
});

describe('webhook signature (Stripe docs: verify the raw body; 300 s tolerance)', () => {
  it('refuses a bad signature, an old timestamp and a re-serialised body with 400, changing nothing', async () => {
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu);
    const co = await checkout(token, id).expect(200);
    pay.hold = true;
    await payOnPage(co.body.checkoutUrl);
    pay.hold = false;
    const [completed] = pay.held.splice(0);
    const raw = completed!.rawBody;
    const now = Math.floor(app.clock.now().getTime() / 1000);
    const secret = app.t.env.STRIPE_WEBHOOK_SECRET;
    const send = (body: string, signature: string) =>
      app.t.http
        .post('/api/payments/webhook')
        .set('Stripe-Signature', signature)
        .set('Content-Type', 'application/json')
        .send(body);
    const attempts = [
      send(raw, signWebhookPayload(raw, 'whsec_someone_else', now)),
      send(raw.replace('"amount_total": 7200', '"amount_total": 1'), completed!.signature),
      send(raw, signWebhookPayload(raw, secret, now - 301)),
      send(JSON.stringify(JSON.parse(raw)), completed!.signature),
      send(raw, 'nonsense'),
      app.t.http.post('/api/payments/webhook').set('Content-Type', 'application/json').send(raw),
    ];
    for (const res of await Promise.all(attempts)) expect(res.status).toBe(400);
    expect((await orders().findOneByOrFail({ id })).status).toBe('pending_payment');
    expect(await payments().countBy({ orderId: id, status: 'succeeded' })).toBe(0);
    expect(
      await app.t.dataSource
        .getRepository(ProcessedWebhookEventEntity)
        .countBy({ eventId: completed!.event.id }),
    ).toBe(0);
    // A fresh signature 299 s old is still inside the tolerance.
    await send(raw, signWebhookPayload(raw, secret, now - 299)).expect(200);
    expect((await orders().findOneByOrFail({ id })).status).toBe('requested');
  });
});

describe('refunds (never more than was paid; partial refunds add up; the ledger reconciles)', () => {
  it('refunds a cancellation by the tier of "today" (21 days before → 50 %)', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token); // 7200 paid towards 24000
    app.clock.set('2026-05-30T08:00:00Z'); // 21 days before 2026-06-20 in Brussels
    const preview = await app.t.http
      .post(`/api/orders/${id}/cancellation-preview`)
      .set(bearer(token))
      .expect(200);
    expect(preview.body).toMatchObject({
      nextStatus: 'cancelled',
      refund: {
        daysBeforeEvent: 21,
        refundPercent: 50,
        paidMinor: 7200,
        refundMinor: 3600,
        keptMinor: 3600,
      },
    });
    const res = await app.t.http
      .post(`/api/orders/${id}/cancel`)
      .set(bearer(token))
      .send({ reason: 'Venue closed' })
      .expect(200);
    expect(res.body).toMatchObject({ status: 'cancelled', paidMinor: 3600, balanceMinor: 0 });
    expect(
      res.body.payments.map((p: { kind: string; status: string; amountMinor: number }) => [
        p.kind,
        p.status,
        p.amountMinor,
      ]),
    ).toEqual([
      ['deposit', 'succeeded', 7200],
      ['refund', 'succeeded', 3600],
    ]);
    expect(res.body.timeline.at(-1)).toMatchObject({
      toStatus: 'cancelled',
      reason: 'Venue closed',
    });
    expect(heldByService(id)).toBe(3600);
    expect(await ledgerNet(id)).toBe(heldByService(id));
    const mail = await outbox().findOneByOrFail({ orderId: id, kind: 'order_cancelled' });
    expect(mail.textBody).toContain('€36.00 is refunded');
    const refund = await payments().findOneByOrFail({ orderId: id, kind: 'refund' });
    const receipt = await app.t.http
      .get(`/api/orders/${id}/receipts/${refund.id}.pdf`)
      .set(bearer(token))
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(pdfText(receipt.body as Buffer).join('\n')).toMatch(/Refund receipt[\s\S]*-€36.00/);
  });

  it('refunds everything 30 days or more before, and nothing on the last days', async () => {
    const early = await newClient();
    const a = await bookAndPay(early, 'full');
    app.clock.set('2026-05-21T08:00:00Z'); // 30 days before
    await app.t.http.post(`/api/orders/${a.id}/cancel`).set(bearer(early)).send({}).expect(200);
    expect(heldByService(a.id)).toBe(0);
    expect(await ledgerNet(a.id)).toBe(0);

    app.clock.set(TEST_NOW);
    const late = await newClient();
    const b = await bookAndPay(late, 'deposit', { eventDate: '2026-06-27' });
    app.clock.set('2026-06-20T08:00:00Z'); // 7 days before: 0 %
    const res = await app.t.http
      .post(`/api/orders/${b.id}/cancel`)
      .set(bearer(late))
      .send({})
      .expect(200);
    expect(res.body.paidMinor).toBe(7200);
    expect(await payments().countBy({ orderId: b.id, kind: 'refund' })).toBe(0);
  });

  it('refunds a guest decrease by the policy; removed guests’ refunds and a later cancellation add up to no more than was paid', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token, 'full'); // 24000 for 20 guests
    app.clock.set('2026-05-30T08:00:00Z'); // 21 days before: 50 % tier
    const preview = await app.t.http
      .post(`/api/orders/${id}/guest-change-preview`)
      .set(bearer(token))
      .send({ guestCount: 10 })
      .expect(200);
    // The 10 removed guests stood for 12000 of the 24000 paid; 50 % of it comes back.
    expect(preview.body.requote).toMatchObject({
      change: 'decrease',
      refundNowMinor: 6000,
      retainedNowMinor: 6000,
    });
    const changed = await app.t.http
      .put(`/api/orders/${id}/guests`)
      .set(bearer(token))
      .send({ guestCount: 10 })
      .expect(200);
    expect(changed.body).toMatchObject({ refundedMinor: 6000, checkout: null });
    expect(changed.body.order).toMatchObject({
      guestCount: 10,
      totalMinor: 12000,
      paidMinor: 18000,
      balanceMinor: 0,
    });
    expect(heldByService(id)).toBe(18000);

    const cancel = await app.t.http
      .post(`/api/orders/${id}/cancellation-preview`)
      .set(bearer(token))
      .expect(200);
    // What still counts towards the order is 18000 − 6000 kept = 12000; 50 % of it.
    expect(cancel.body.refund).toMatchObject({
      paidMinor: 18000,
      refundableBaseMinor: 12000,
      refundMinor: 6000,
    });
    await app.t.http.post(`/api/orders/${id}/cancel`).set(bearer(token)).send({}).expect(200);
    const refunds = await payments().findBy({ orderId: id, kind: 'refund' });
    expect(refunds.map((r) => r.amountMinor).sort()).toEqual([6000, 6000]);
    const charge = [...pay.fake.state.charges.values()].find((c) => c.metadata.orderId === id)!;
    expect(charge.amount_refunded).toBe(12000);
    expect(charge.amount_refunded).toBeLessThanOrEqual(charge.amount);
    expect(await ledgerNet(id)).toBe(heldByService(id));
    await app.t.http.post(`/api/orders/${id}/cancel`).set(bearer(token)).send({}).expect(409);
  });

  it('cannot reserve a refund above what is left of the payments', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token);
    const refunds = app.t.app.get(RefundService);
    await expect(
      app.t.dataSource.transaction(async (m) => {
        const order = await m.findOneByOrFail(OrderEntity, { id });
        const rows = await m.find(PaymentEntity, { where: { orderId: id } });
        await refunds.reserve(m, order, rows, 7201, 'cancel');
      }),
    ).rejects.toThrow(/more than what is left of the payments/);
    expect(await payments().countBy({ orderId: id, kind: 'refund' })).toBe(0);
  });

  it('sends one refund when a cancellation is sent five times at once', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token);
    app.clock.set('2026-05-01T08:00:00Z'); // 50 days before: 100 %
    const results = await Promise.all(
      Array.from({ length: 5 }, () =>
        app.t.http.post(`/api/orders/${id}/cancel`).set(bearer(token)).send({}),
      ),
    );
    expect(results.filter((r) => r.status === 200).length).toBeGreaterThanOrEqual(1);
    for (const r of results) expect([200, 409]).toContain(r.status);
    expect(await payments().countBy({ orderId: id, kind: 'refund' })).toBe(1);
    const refundsAtService = [...pay.fake.state.refunds.values()].filter(
      (r) => r.metadata.orderId === id,
    );
    expect(refundsAtService.map((r) => r.amount)).toEqual([7200]);
    expect(heldByService(id)).toBe(0);
    expect(await outbox().countBy({ orderId: id, kind: 'order_cancelled' })).toBe(1);
  });

  it('records a refund made at the payment service directly (charge.refunded reconciles)', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token);
    const row = await payments().findOneByOrFail({ orderId: id });
    const dashboard = new Stripe('sk_test_dashboard', { maxNetworkRetries: 0 });
    await dashboard.refunds.create({ payment_intent: row.providerPaymentIntentId!, amount: 1000 });
    const recorded = await payments().findOneByOrFail({ orderId: id, kind: 'refund' });
    expect(recorded).toMatchObject({
      status: 'succeeded',
      amountMinor: 1000,
      operation: 'reconciled',
    });
    expect(await ledgerNet(id)).toBe(heldByService(id));
    expect(heldByService(id)).toBe(6200);
    // The same event again changes nothing.
    const event = [...pay.fake.state.events.values()]
      .filter((e) => e.type === 'charge.refunded')
      .at(-1)!;
    await pay.fake.redeliver(event.id);
    expect(await payments().countBy({ orderId: id, kind: 'refund' })).toBe(1);
  });
});

describe('changing guests', () => {
  it('collects more guests through a new checkout (top-up to the new deposit)', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token); // 7200 of 24000
    app.clock.advance(60_000);
    const res = await app.t.http
      .put(`/api/orders/${id}/guests`)
      .set(bearer(token))
      .send({ guestCount: 25 })
      .expect(200);
    // 25 × €12.00 = €300.00; its 30 % deposit is €90.00, of which €72.00 is paid → €18.00 now.
    expect(res.body.checkout).toMatchObject({ amountMinor: 1800, currency: 'EUR' });
    expect(res.body.order).toMatchObject({
      guestCount: 25,
      totalMinor: 30000,
      actions: { pay: 'top_up' },
    });
    expect(await payOnPage(res.body.checkout.checkoutUrl)).toHaveProperty('status', 303);
    const after = await app.t.http.get(`/api/orders/${id}`).set(bearer(token)).expect(200);
    expect(after.body).toMatchObject({
      paidMinor: 9000,
      balanceMinor: 21000,
      actions: { pay: 'balance' },
    });
    expect(after.body.payments.map((p: { kind: string }) => p.kind)).toEqual(['deposit', 'top_up']);
    expect(await ledgerNet(id)).toBe(heldByService(id));
    const kinds = (await outbox().findBy({ orderId: id })).map((m) => m.kind).sort();
    expect(kinds).toEqual(['booking_received', 'guests_changed', 'payment_received']);
  });

  it('refuses more guests than the day has plates for, and changes after the final-count deadline', async () => {
    await setStudio(app.t, { dailyPlateCapacity: 25 });
    const token = await newClient();
    const { id } = await bookAndPay(token, 'deposit', { eventDate: '2026-07-25' });
    const res = await app.t.http
      .put(`/api/orders/${id}/guests`)
      .set(bearer(token))
      .send({ guestCount: 26 })
      .expect(409);
    expect(res.body.message).toMatch(/Only 25 plates are left/);
    app.clock.set('2026-07-20T08:00:00Z'); // 5 days before; the deadline was 7 days before
    const late = await app.t.http
      .put(`/api/orders/${id}/guests`)
      .set(bearer(token))
      .send({ guestCount: 18 })
      .expect(409);
    expect(late.body.code).toBe('final_count_deadline_passed');
    expect((await orders().findOneByOrFail({ id })).guestCount).toBe(20);
  });
});

describe('the chef’s decisions', () => {
  it('confirms, then marks served; declining refunds everything paid', async () => {
    const token = await newClient();
    const a = await bookAndPay(token);
    await app.t.http.post(`/api/orders/${a.id}/complete`).set(bearer(chef)).send({}).expect(409);
    const confirmed = await app.t.http
      .post(`/api/orders/${a.id}/confirm`)
      .set(bearer(chef))
      .send({ reason: 'Kitchen free that day' })
      .expect(200);
    expect(confirmed.body.timeline.at(-1)).toMatchObject({
      actor: { role: 'chef' },
      fromStatus: 'requested',
      toStatus: 'confirmed',
      reason: 'Kitchen free that day',
    });
    await app.t.http.post(`/api/orders/${a.id}/decline`).set(bearer(chef)).send({}).expect(409);
    await app.t.http.post(`/api/orders/${a.id}/complete`).set(bearer(chef)).send({}).expect(200);

    const other = await newClient();
    const b = await bookAndPay(other, 'full');
    app.clock.set('2026-06-19T08:00:00Z'); // the day before: the tiers would refund nothing
    const declined = await app.t.http
      .post(`/api/orders/${b.id}/decline`)
      .set(bearer(chef))
      .send({ reason: 'Fully booked that week' })
      .expect(200);
    expect(declined.body).toMatchObject({ status: 'declined', paidMinor: 0 });
    expect(heldByService(b.id)).toBe(0);
    expect(await ledgerNet(b.id)).toBe(0);
    const mail = await outbox().findOneByOrFail({ orderId: b.id, kind: 'order_declined' });
    expect(mail.textBody).toContain('Everything you paid, €240.00, is refunded');
  });
});

describe('guest requirements', () => {
  it('replaces the list with the count, and refuses a smaller party than the listed guests', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token, 'deposit', {
      guestRequirements: [
        { label: 'Guest A', allergens: ['milk'] },
        { label: 'Guest B', allergens: ['eggs'] },
        { label: 'Guest C', diets: ['vegan'] },
      ],
      guestDataConsent: true,
    });
    const same = await app.t.http
      .put(`/api/orders/${id}/guests`)
      .set(bearer(token))
      .send({
        guestCount: 20,
        guestRequirements: [{ label: 'Guest D', allergens: ['sesame'] }],
        guestDataConsent: true,
      })
      .expect(200);
    expect(same.body.order.guests).toEqual([
      { label: 'Guest D', allergens: ['sesame'], diets: [] },
    ]);
    expect(same.body.order.timeline.at(-1).summary).toBe('Guest requirements updated');
    await app.t.http
      .put(`/api/orders/${id}/guests`)
      .set(bearer(token))
      .send({ guestCount: 20, guestRequirements: [{ label: 'Guest E', allergens: ['fish'] }] })
      .expect(400);
    const list = Array.from({ length: 5 }, (_, i) => ({
      label: `Seat ${i + 1}`,
      allergens: ['milk'],
    }));
    await app.t.http
      .put(`/api/orders/${id}/guests`)
      .set(bearer(token))
      .send({ guestCount: 20, guestRequirements: list, guestDataConsent: true })
      .expect(200);
    const tooSmall = await app.t.http
      .put(`/api/orders/${id}/guests`)
      .set(bearer(token))
      .send({ guestCount: 4 })
      .expect(400);
    expect(tooSmall.body.message).toMatch(/requirements for 5 guests/);
    expect((await orders().findOneByOrFail({ id })).guestCount).toBe(20);
  });
});

describe('the payment service down or hanging (QUALITY.md: 503 within the timeout, nothing changed)', () => {
  it('answers 503 when the service refuses connections, and changes nothing', async () => {
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu);
    const before = await orders().findOneByOrFail({ id });
    pay.server.use(http.post('*/v1/checkout/sessions', () => HttpResponse.error()));
    const res = await checkout(token, id).expect(503);
    expect(res.body.message).toMatch(/not answering/);
    expect(await payments().countBy({ orderId: id })).toBe(0);
    const after = await orders().findOneByOrFail({ id });
    expect(after.status).toBe('pending_payment');
    expect(after.holdExpiresAt?.getTime()).toBe(before.holdExpiresAt?.getTime());
    pay.server.resetHandlers();
    await checkout(token, id).expect(200);
  });

  it('answers 503 within the timeout when the service hangs', async () => {
    const token = await newClient();
    const { id } = await bookOrder(app.t, token, menu);
    pay.server.use(
      http.post('*/v1/checkout/sessions', async () => {
        await delay('infinite');
        return HttpResponse.json({});
      }),
    );
    const started = Date.now();
    await checkout(token, id).expect(503);
    const took = Date.now() - started;
    expect(took).toBeLessThan(app.t.env.STRIPE_TIMEOUT_MS + 1500);
    expect(await payments().countBy({ orderId: id })).toBe(0);
  });

  it('keeps a cancellation unchanged while refunds fail, then refunds once when the service is back', async () => {
    const token = await newClient();
    const { id } = await bookAndPay(token);
    app.clock.set('2026-05-01T08:00:00Z'); // 100 % tier
    pay.server.use(
      http.post('*/v1/refunds', () =>
        HttpResponse.json({ error: { type: 'api_error', message: 'down' } }, { status: 500 }),
      ),
    );
    await app.t.http.post(`/api/orders/${id}/cancel`).set(bearer(token)).send({}).expect(503);
    expect((await orders().findOneByOrFail({ id })).status).toBe('requested');
    expect(await payments().countBy({ orderId: id, kind: 'refund', status: 'succeeded' })).toBe(0);
    expect(await outbox().countBy({ orderId: id, kind: 'order_cancelled' })).toBe(0);
    expect(heldByService(id)).toBe(7200);
    pay.server.resetHandlers();
    await app.t.http.post(`/api/orders/${id}/cancel`).set(bearer(token)).send({}).expect(200);
    expect(heldByService(id)).toBe(0);
    expect(await payments().countBy({ orderId: id, kind: 'refund' })).toBe(1);
    expect(await ledgerNet(id)).toBe(0);
  });
});

describe('the ledger against the payment service', () => {
  it('reconciles for every order: settled payments − refunds = what the service holds', async () => {
    const all = await orders().find();
    const ids = all.map((o) => o.id);
    const rows = await payments().findBy({ orderId: In(ids), seeded: false });
    expect(rows.length).toBeGreaterThan(5);
    for (const id of ids) expect(await ledgerNet(id), id).toBe(heldByService(id));
  });
});
