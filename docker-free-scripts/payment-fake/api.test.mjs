// The fake's API, driven by the real `stripe` SDK in-process through msw's setupServer.
// Shapes, statuses and error classes are checked against the Stripe API reference (objects,
// "Errors", "Idempotent requests") and the SDK's own error mapping; test PaymentMethods and
// their declines against Stripe docs "Test card numbers".
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { setupServer } from 'msw/node';
import Stripe from 'stripe';
import { createPaymentFake } from './index.js';
import {
  PUBLIC_BASE_URL,
  SECRET,
  defaultHostStripe,
  localStripe,
  rejectionOf,
  sessionParams,
  sleep,
} from './test-support.mjs';

/** @type {import('./index.js').WebhookDelivery[]} */
const delivered = [];
let deliveryDelayMs = 0;
const fake = createPaymentFake({
  publicBaseUrl: PUBLIC_BASE_URL,
  webhookSecret: SECRET,
  deliver: async (delivery) => {
    if (deliveryDelayMs > 0) await sleep(deliveryDelayMs);
    delivered.push(delivery);
  },
});
const server = setupServer(...fake.handlers);
/** @type {string[]} */
const requestedUrls = [];
server.events.on('request:start', ({ request }) => {
  requestedUrls.push(`${request.method} ${request.url}`);
});

const stripe = localStripe();
const deliveredTypes = () => delivered.map((d) => d.event.type);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterAll(() => server.close());
beforeEach(() => {
  fake.reset();
  delivered.length = 0;
  requestedUrls.length = 0;
  deliveryDelayMs = 0;
});

async function paidIntent(amount = 8000) {
  return stripe.paymentIntents.create({
    amount,
    currency: 'gbp',
    payment_method: 'pm_card_visa',
    confirm: true,
    metadata: { orderId: 'ord_2002' },
  });
}

describe('reaching the fake', () => {
  it('answers the SDK configured with the local host and with its default host', async () => {
    const local = await stripe.customers.create({ email: 'a@example.com' });
    const remote = await defaultHostStripe().customers.create({ email: 'b@example.com' });
    // How the SDK forms its URL from { host, port, protocol } and from its defaults.
    expect(requestedUrls).toEqual([
      'POST http://localhost:12111/v1/customers',
      'POST https://api.stripe.com/v1/customers',
    ]);
    expect(fake.state.customers.size).toBe(2);
    expect(local.id).not.toBe(remote.id);
  });

  it('serves every endpoint at the default host too', async () => {
    const remote = defaultHostStripe();
    const customer = await remote.customers.create({ email: 'remote@example.com' });
    expect((await remote.customers.retrieve(customer.id)).id).toBe(customer.id);
    const session = await remote.checkout.sessions.create(sessionParams());
    expect((await remote.checkout.sessions.retrieve(session.id)).id).toBe(session.id);
    expect((await remote.checkout.sessions.listLineItems(session.id)).data).toHaveLength(2);
    expect((await remote.checkout.sessions.expire(session.id)).status).toBe('expired');
    const intent = await remote.paymentIntents.create({ amount: 1200, currency: 'gbp' });
    const paid = await remote.paymentIntents.confirm(intent.id, { payment_method: 'pm_card_visa' });
    expect((await remote.paymentIntents.retrieve(intent.id)).status).toBe('succeeded');
    const refund = await remote.refunds.create({ payment_intent: intent.id, amount: 200 });
    expect((await remote.refunds.retrieve(refund.id)).amount).toBe(200);
    expect((await remote.charges.retrieve(String(paid.latest_charge))).amount_refunded).toBe(200);
    const canceled = await remote.paymentIntents.create({ amount: 100, currency: 'gbp' });
    expect((await remote.paymentIntents.cancel(canceled.id)).status).toBe('canceled');
    const lastEvent = delivered.at(-1)?.event;
    expect((await remote.events.retrieve(String(lastEvent?.id))).type).toBe('charge.refunded');
    expect(requestedUrls.every((line) => line.includes('https://api.stripe.com/v1/'))).toBe(true);
    expect(requestedUrls).toHaveLength(15);
  });

  it('refuses a request without a key and a live-mode key (401 → StripeAuthenticationError)', async () => {
    const bare = await fetch('http://localhost:12111/v1/customers', { method: 'POST' });
    expect(bare.status).toBe(401);
    const body = await bare.json();
    expect(body.error.type).toBe('invalid_request_error');
    expect(body.error.message).toMatch(/did not provide an API key/);

    const live = new Stripe('sk_live_notreallyakey1234', {
      host: 'localhost',
      port: 12111,
      protocol: 'http',
      maxNetworkRetries: 0,
    });
    const error = await rejectionOf(live.customers.create({}));
    expect(error).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(error.statusCode).toBe(401);
    expect(error.message).not.toContain('notreallyakey');
  });

  it('answers an endpoint it does not implement with 404 instead of reaching the network', async () => {
    const error = await rejectionOf(stripe.customers.list());
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error.statusCode).toBe(404);
    expect(error.message).toMatch(/Unrecognized request URL \(GET: \/v1\/customers\)/);
  });
});

describe('customers', () => {
  it('creates (cus_…) and retrieves a customer', async () => {
    const created = await stripe.customers.create({
      email: 'chef.client@example.com',
      name: 'Imogen Vale',
      metadata: { userId: 'usr_17' },
    });
    expect(created.id).toMatch(/^cus_[A-Za-z0-9]+$/);
    expect(created).toMatchObject({
      object: 'customer',
      email: 'chef.client@example.com',
      name: 'Imogen Vale',
      metadata: { userId: 'usr_17' },
      livemode: false,
    });
    expect(Number.isInteger(created.created)).toBe(true);
    const fetched = await stripe.customers.retrieve(created.id);
    expect(fetched).toEqual(created);
  });

  it('answers an unknown customer with 404 resource_missing', async () => {
    const error = await rejectionOf(stripe.customers.retrieve('cus_doesnotexist'));
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error).toMatchObject({
      statusCode: 404,
      code: 'resource_missing',
      rawType: 'invalid_request_error',
    });
    // err.type is the SDK's class name; the envelope's type is err.rawType.
    expect(error.type).toBe('StripeInvalidRequestError');
  });

  it('refuses a malformed e-mail address', async () => {
    const error = await rejectionOf(stripe.customers.create({ email: 'not-an-address' }));
    expect(error).toMatchObject({ statusCode: 400, code: 'email_invalid', param: 'email' });
  });
});

describe('checkout sessions', () => {
  it('creates an open, unpaid session with the documented fields', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    expect(session.id).toMatch(/^cs_test_[A-Za-z0-9]+$/);
    // 4 × 12.50 + 1 × 30.00 = 80.00, in pence.
    expect(session).toMatchObject({
      object: 'checkout.session',
      url: `${PUBLIC_BASE_URL}/pay/${session.id}`,
      status: 'open',
      payment_status: 'unpaid',
      amount_total: 8000,
      amount_subtotal: 8000,
      currency: 'gbp',
      payment_intent: null,
      metadata: { orderId: 'ord_1001', amountVersion: '1', guests: '40' },
      client_reference_id: 'ord_1001',
      customer_email: 'client@example.com',
      success_url: 'https://shop.example/booked?session={CHECKOUT_SESSION_ID}',
      cancel_url: 'https://shop.example/booking/review',
      mode: 'payment',
      livemode: false,
    });
    // Default lifetime 24 hours (API reference, expires_at).
    expect(session.expires_at - session.created).toBe(24 * 60 * 60);
  });

  it('turns the form strings back into integers, and keeps metadata as strings', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const items = fake.state.lineItems.get(session.id);
    expect(
      items?.map((item) => [item.quantity, item.price.unit_amount, item.amount_total]),
    ).toEqual([
      [4, 1250, 5000],
      [1, 3000, 3000],
    ]);
    expect(typeof session.amount_total).toBe('number');
    expect(session.metadata?.guests).toBe('40');
  });

  it.each([
    ['mode', { mode: undefined }],
    ['line_items', { line_items: undefined }],
    ['success_url', { success_url: undefined }],
  ])('refuses a session without %s (400 parameter_missing)', async (param, overrides) => {
    const error = await rejectionOf(stripe.checkout.sessions.create(sessionParams(overrides)));
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error).toMatchObject({ statusCode: 400, code: 'parameter_missing', param });
  });

  it('names the nested parameter that is missing or not an integer', async () => {
    const noQuantity = await rejectionOf(
      stripe.checkout.sessions.create(
        sessionParams({
          line_items: [
            { price_data: { currency: 'gbp', unit_amount: 100, product_data: { name: 'x' } } },
          ],
        }),
      ),
    );
    expect(noQuantity).toMatchObject({
      code: 'parameter_missing',
      param: 'line_items[0][quantity]',
    });

    // A float amount is not minor units: refused as the service refuses it.
    const floatAmount = await rejectionOf(
      stripe.checkout.sessions.create(
        sessionParams({
          line_items: [
            {
              quantity: 1,
              price_data: { currency: 'gbp', unit_amount: 12.5, product_data: { name: 'x' } },
            },
          ],
        }),
      ),
    );
    expect(floatAmount).toMatchObject({
      statusCode: 400,
      code: 'parameter_invalid_integer',
      param: 'line_items[0][price_data][unit_amount]',
    });
  });

  it('refuses mixed currencies, unknown currencies, non-http URLs and out-of-range expiry', async () => {
    const mixed = await rejectionOf(
      stripe.checkout.sessions.create(
        sessionParams({
          line_items: [
            {
              quantity: 1,
              price_data: { currency: 'gbp', unit_amount: 100, product_data: { name: 'a' } },
            },
            {
              quantity: 1,
              price_data: { currency: 'eur', unit_amount: 100, product_data: { name: 'b' } },
            },
          ],
        }),
      ),
    );
    expect(mixed).toMatchObject({ statusCode: 400, param: 'line_items[1][price_data][currency]' });

    const unknownCurrency = await rejectionOf(
      stripe.checkout.sessions.create(
        sessionParams({
          line_items: [
            {
              quantity: 1,
              price_data: { currency: 'xyz', unit_amount: 100, product_data: { name: 'a' } },
            },
          ],
        }),
      ),
    );
    expect(unknownCurrency).toMatchObject({
      statusCode: 400,
      param: 'line_items[0][price_data][currency]',
    });

    const scriptUrl = await rejectionOf(
      stripe.checkout.sessions.create(sessionParams({ success_url: 'javascript:alert(1)' })),
    );
    expect(scriptUrl).toMatchObject({ statusCode: 400, code: 'url_invalid', param: 'success_url' });

    // API reference, expires_at: between 30 minutes and 24 hours after creation.
    const now = Math.floor(Date.now() / 1000);
    for (const expiresAt of [now + 60, now + 25 * 60 * 60]) {
      const error = await rejectionOf(
        stripe.checkout.sessions.create(sessionParams({ expires_at: expiresAt })),
      );
      expect(error).toMatchObject({ statusCode: 400, param: 'expires_at' });
    }
    const inAnHour = await stripe.checkout.sessions.create(
      sessionParams({ expires_at: now + 3600 }),
    );
    expect(inAnHour.expires_at).toBe(now + 3600);
  });

  it('retrieves a session, and answers an unknown one with 404 resource_missing', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    expect(await stripe.checkout.sessions.retrieve(session.id)).toEqual(session);
    const error = await rejectionOf(stripe.checkout.sessions.retrieve('cs_test_missing'));
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error).toMatchObject({ statusCode: 404, code: 'resource_missing' });
  });

  it('lists line items page by page', async () => {
    const session = await stripe.checkout.sessions.create(
      sessionParams({
        line_items: ['Pistachio financier', 'Caramel entremet', 'Yuzu posset'].map((name, i) => ({
          quantity: i + 1,
          price_data: { currency: 'gbp', unit_amount: 700, product_data: { name } },
        })),
      }),
    );
    const first = await stripe.checkout.sessions.listLineItems(session.id, { limit: 2 });
    expect(first.object).toBe('list');
    expect(first.has_more).toBe(true);
    expect(first.data.map((item) => item.description)).toEqual([
      'Pistachio financier',
      'Caramel entremet',
    ]);
    const all = await stripe.checkout.sessions
      .listLineItems(session.id, { limit: 1 })
      .autoPagingToArray({ limit: 10 });
    expect(
      all.map((item) => [item.object, item.quantity, item.amount_total, item.price?.unit_amount]),
    ).toEqual([
      ['item', 1, 700, 700],
      ['item', 2, 1400, 700],
      ['item', 3, 2100, 700],
    ]);
    const missing = await rejectionOf(stripe.checkout.sessions.listLineItems('cs_test_missing'));
    expect(missing).toMatchObject({ statusCode: 404, code: 'resource_missing' });
  });

  it('expands line_items on request and refuses what cannot be expanded', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const expanded = await stripe.checkout.sessions.retrieve(session.id, {
      expand: ['line_items'],
    });
    expect(expanded.line_items?.data).toHaveLength(2);
    const error = await rejectionOf(
      stripe.checkout.sessions.retrieve(session.id, { expand: ['currency'] }),
    );
    expect(error).toMatchObject({ statusCode: 400, param: 'expand' });
  });

  it('expires an open session once, with a checkout.session.expired event', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired.status).toBe('expired');
    expect(expired.payment_status).toBe('unpaid');
    expect(deliveredTypes()).toEqual(['checkout.session.expired']);
    expect(delivered[0].event.data.object).toMatchObject({ id: session.id, status: 'expired' });

    const again = await rejectionOf(stripe.checkout.sessions.expire(session.id));
    expect(again).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(again.statusCode).toBe(400);
    expect(deliveredTypes()).toEqual(['checkout.session.expired']);
  });

  it('links a stored customer and refuses an unknown one', async () => {
    const customer = await stripe.customers.create({ email: 'c@example.com' });
    const session = await stripe.checkout.sessions.create(
      sessionParams({ customer: customer.id, customer_email: undefined }),
    );
    expect(session.customer).toBe(customer.id);
    const error = await rejectionOf(
      stripe.checkout.sessions.create(
        sessionParams({ customer: 'cus_nobody', customer_email: undefined }),
      ),
    );
    expect(error).toMatchObject({ statusCode: 400, code: 'resource_missing', param: 'customer' });
  });
});

describe('payment intents', () => {
  it('creates, retrieves and confirms a PaymentIntent with pm_card_visa', async () => {
    const intent = await stripe.paymentIntents.create({
      amount: 4200,
      currency: 'eur',
      metadata: { orderId: 'ord_3003' },
    });
    expect(intent.id).toMatch(/^pi_/);
    expect(intent).toMatchObject({
      object: 'payment_intent',
      amount: 4200,
      currency: 'eur',
      status: 'requires_payment_method',
      latest_charge: null,
      metadata: { orderId: 'ord_3003' },
    });
    expect(await stripe.paymentIntents.retrieve(intent.id)).toEqual(intent);

    const confirmed = await stripe.paymentIntents.confirm(intent.id, {
      payment_method: 'pm_card_visa',
    });
    expect(confirmed.status).toBe('succeeded');
    expect(confirmed.amount_received).toBe(4200);
    expect(confirmed.latest_charge).toMatch(/^ch_/);
    const charge = await stripe.charges.retrieve(String(confirmed.latest_charge));
    expect(charge).toMatchObject({
      amount: 4200,
      paid: true,
      status: 'succeeded',
      payment_intent: intent.id,
    });
    expect(deliveredTypes()).toEqual(['payment_intent.succeeded']);
  });

  // Stripe docs "Test card numbers", declined payments: PaymentMethod → error code, decline code.
  it.each([
    ['pm_card_visa_chargeDeclined', 'card_declined', 'generic_decline'],
    ['pm_card_visa_chargeDeclinedInsufficientFunds', 'card_declined', 'insufficient_funds'],
    ['pm_card_visa_chargeDeclinedLostCard', 'card_declined', 'lost_card'],
    ['pm_card_chargeDeclinedExpiredCard', 'expired_card', 'expired_card'],
    ['pm_card_chargeDeclinedIncorrectCvc', 'incorrect_cvc', 'incorrect_cvc'],
  ])(
    'declines %s with 402 card_error (StripeCardError) and keeps the intent payable',
    async (paymentMethod, code, declineCode) => {
      const error = await rejectionOf(
        stripe.paymentIntents.create({
          amount: 2500,
          currency: 'gbp',
          payment_method: paymentMethod,
          confirm: true,
        }),
      );
      expect(error).toBeInstanceOf(Stripe.errors.StripeCardError);
      expect(error).toMatchObject({
        statusCode: 402,
        rawType: 'card_error',
        code,
        decline_code: declineCode,
      });
      expect(error.payment_intent).toMatchObject({ status: 'requires_payment_method' });
      const intent = await stripe.paymentIntents.retrieve(error.payment_intent.id);
      expect(intent.last_payment_error).toMatchObject({ code, decline_code: declineCode });
      expect(deliveredTypes()).toEqual(['payment_intent.payment_failed']);
      expect(fake.state.charges.size).toBe(0);

      // The same intent can then be paid with a working card.
      const paid = await stripe.paymentIntents.confirm(intent.id, {
        payment_method: 'pm_card_visa',
      });
      expect(paid.status).toBe('succeeded');
      expect(paid.last_payment_error).toBeNull();
    },
  );

  it('asks for authentication with pm_card_authenticationRequired and finishes it on the page', async () => {
    const intent = await stripe.paymentIntents.create({
      amount: 9900,
      currency: 'gbp',
      payment_method: 'pm_card_authenticationRequired',
      confirm: true,
      return_url: 'https://shop.example/return',
    });
    expect(intent.status).toBe('requires_action');
    expect(intent.next_action?.type).toBe('redirect_to_url');
    const url = String(intent.next_action?.redirect_to_url?.url);
    expect(url).toBe(`${PUBLIC_BASE_URL}/pay/authenticate/${intent.id}`);

    const page = await fetch(url);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('Complete authentication');
    const answer = await fetch(url, {
      method: 'POST',
      headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
      body: 'outcome=complete',
      redirect: 'manual',
    });
    expect(answer.status).toBe(303);
    const back = new URL(String(answer.headers.get('location')));
    expect(back.origin + back.pathname).toBe('https://shop.example/return');
    expect(back.searchParams.get('payment_intent')).toBe(intent.id);
    expect(back.searchParams.get('redirect_status')).toBe('succeeded');
    expect((await stripe.paymentIntents.retrieve(intent.id)).status).toBe('succeeded');
    expect(deliveredTypes()).toEqual(['payment_intent.succeeded']);
  });

  it('refuses to confirm a succeeded intent and to cancel one (payment_intent_unexpected_state)', async () => {
    const intent = await paidIntent();
    const confirmAgain = await rejectionOf(
      stripe.paymentIntents.confirm(intent.id, { payment_method: 'pm_card_visa' }),
    );
    expect(confirmAgain).toMatchObject({
      statusCode: 400,
      code: 'payment_intent_unexpected_state',
    });
    const cancel = await rejectionOf(stripe.paymentIntents.cancel(intent.id));
    expect(cancel).toMatchObject({ statusCode: 400, code: 'payment_intent_unexpected_state' });
  });

  it('cancels an unpaid intent', async () => {
    const intent = await stripe.paymentIntents.create({ amount: 1000, currency: 'gbp' });
    const canceled = await stripe.paymentIntents.cancel(intent.id, {
      cancellation_reason: 'abandoned',
    });
    expect(canceled).toMatchObject({ status: 'canceled', cancellation_reason: 'abandoned' });
    expect(Number.isInteger(canceled.canceled_at)).toBe(true);
  });

  it('refuses an unknown PaymentMethod and an unknown PaymentIntent', async () => {
    const badMethod = await rejectionOf(
      stripe.paymentIntents.create({
        amount: 1000,
        currency: 'gbp',
        payment_method: 'pm_card_unknown',
        confirm: true,
      }),
    );
    expect(badMethod).toMatchObject({
      statusCode: 400,
      code: 'resource_missing',
      param: 'payment_method',
    });
    const missing = await rejectionOf(stripe.paymentIntents.retrieve('pi_missing'));
    expect(missing).toMatchObject({ statusCode: 404, code: 'resource_missing' });
  });
});

describe('refunds', () => {
  it('refunds in full when no amount is given, and emits charge.refunded with the charge', async () => {
    const intent = await paidIntent(8000);
    delivered.length = 0;
    const refund = await stripe.refunds.create({
      payment_intent: intent.id,
      reason: 'requested_by_customer',
    });
    expect(refund.id).toMatch(/^re_/);
    expect(refund).toMatchObject({
      object: 'refund',
      amount: 8000,
      currency: 'gbp',
      status: 'succeeded',
      payment_intent: intent.id,
      charge: intent.latest_charge,
      reason: 'requested_by_customer',
    });
    const charge = await stripe.charges.retrieve(String(intent.latest_charge));
    expect(charge).toMatchObject({ amount_refunded: 8000, refunded: true });
    expect(deliveredTypes()).toEqual(['charge.refunded']);
    expect(delivered[0].event.data.object).toMatchObject({
      object: 'charge',
      id: intent.latest_charge,
      amount_refunded: 8000,
      refunded: true,
    });
    expect(await stripe.refunds.retrieve(refund.id)).toEqual(refund);
  });

  it('adds partial refunds up and refuses anything past the amount paid', async () => {
    const intent = await paidIntent(8000);
    const chargeId = String(intent.latest_charge);
    await stripe.refunds.create({ payment_intent: intent.id, amount: 3000 });
    await stripe.refunds.create({ charge: chargeId, amount: 2000 });
    let charge = await stripe.charges.retrieve(chargeId);
    expect(charge).toMatchObject({ amount_refunded: 5000, refunded: false });

    const tooMuch = await rejectionOf(
      stripe.refunds.create({ payment_intent: intent.id, amount: 3001 }),
    );
    expect(tooMuch).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(tooMuch).toMatchObject({ statusCode: 400, param: 'amount' });
    expect(tooMuch.message).toContain('£30.01');
    expect(tooMuch.message).toContain('£30.00');
    charge = await stripe.charges.retrieve(chargeId);
    expect(charge.amount_refunded).toBe(5000);
    expect(fake.state.refunds.size).toBe(2);

    await stripe.refunds.create({ payment_intent: intent.id, amount: 3000 });
    charge = await stripe.charges.retrieve(chargeId);
    expect(charge).toMatchObject({ amount_refunded: 8000, refunded: true });
    const after = await rejectionOf(
      stripe.refunds.create({ payment_intent: intent.id, amount: 1 }),
    );
    expect(after).toMatchObject({ statusCode: 400, code: 'charge_already_refunded' });
    const refunded = [...fake.state.refunds.values()].reduce((sum, r) => sum + r.amount, 0);
    expect(refunded).toBe(8000);
  });

  it('never lets concurrent refunds add up past the charge', async () => {
    const intent = await paidIntent(8000);
    const results = await Promise.allSettled(
      Array.from({ length: 10 }, () =>
        stripe.refunds.create({ payment_intent: intent.id, amount: 1000 }),
      ),
    );
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(8);
    const refused = results.filter((r) => r.status === 'rejected');
    expect(refused).toHaveLength(2);
    const charge = await stripe.charges.retrieve(String(intent.latest_charge));
    expect(charge.amount_refunded).toBe(8000);
  });

  it('refuses refunds without a target, for an unpaid intent, and with a float amount', async () => {
    const none = await rejectionOf(stripe.refunds.create({ amount: 100 }));
    expect(none).toMatchObject({ statusCode: 400, code: 'parameter_missing' });
    const unpaid = await stripe.paymentIntents.create({ amount: 1000, currency: 'gbp' });
    const notPaid = await rejectionOf(stripe.refunds.create({ payment_intent: unpaid.id }));
    expect(notPaid).toMatchObject({ statusCode: 400, param: 'payment_intent' });
    const paid = await paidIntent(1000);
    const float = await rejectionOf(
      stripe.refunds.create({ payment_intent: paid.id, amount: 10.5 }),
    );
    expect(float).toMatchObject({
      statusCode: 400,
      code: 'parameter_invalid_integer',
      param: 'amount',
    });
  });
});

describe('events', () => {
  it('stores every event it sends and serves it at GET /v1/events/:id', async () => {
    await paidIntent(1500);
    const sent = delivered[0];
    const event = await stripe.events.retrieve(sent.event.id);
    expect(event).toEqual(JSON.parse(sent.rawBody));
    expect(event).toMatchObject({
      object: 'event',
      type: 'payment_intent.succeeded',
      api_version: Stripe.API_VERSION,
      livemode: false,
    });
    expect(event.data.object).toMatchObject({ object: 'payment_intent', amount: 1500 });
    const missing = await rejectionOf(stripe.events.retrieve('evt_missing'));
    expect(missing).toMatchObject({ statusCode: 404, code: 'resource_missing' });
  });
});

describe('idempotency (Stripe API reference, "Idempotent requests")', () => {
  it('replays the first response for the same key, endpoint and parameters', async () => {
    const first = await stripe.checkout.sessions.create(sessionParams(), {
      idempotencyKey: 'order-1001-v1',
    });
    const second = await stripe.checkout.sessions.create(sessionParams(), {
      idempotencyKey: 'order-1001-v1',
    });
    expect(second.id).toBe(first.id);
    expect(second).toEqual(first);
    expect(second.lastResponse.headers['idempotent-replayed']).toBe('true');
    expect(first.lastResponse.headers['idempotent-replayed']).toBeUndefined();
    expect(fake.state.checkoutSessions.size).toBe(1);
  });

  it('replays the response as it was, not the object as it is now', async () => {
    const first = await stripe.checkout.sessions.create(sessionParams(), {
      idempotencyKey: 'order-1001-v2',
    });
    await stripe.checkout.sessions.expire(first.id);
    const replay = await stripe.checkout.sessions.create(sessionParams(), {
      idempotencyKey: 'order-1001-v2',
    });
    expect(replay.status).toBe('open');
  });

  it('treats the same parameters in another order as the same request', async () => {
    const send = (body) =>
      fetch('http://localhost:12111/v1/customers', {
        method: 'POST',
        headers: {
          Authorization: 'Bearer sk_test_nappe_fake',
          'Content-Type': 'application/x-www-form-urlencoded',
          'Idempotency-Key': 'customer-order',
        },
        body,
      }).then((response) => response.json());
    const a = await send('email=o%40example.com&metadata[a]=1&metadata[b]=2');
    const b = await send('metadata[b]=2&metadata[a]=1&email=o%40example.com');
    expect(b.id).toBe(a.id);
  });

  it('refuses the same key with other parameters or another endpoint (StripeIdempotencyError)', async () => {
    await stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: 'order-1001-v3' });
    const otherParams = await rejectionOf(
      stripe.checkout.sessions.create(sessionParams({ client_reference_id: 'ord_9999' }), {
        idempotencyKey: 'order-1001-v3',
      }),
    );
    expect(otherParams).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect(otherParams).toMatchObject({ statusCode: 400, rawType: 'idempotency_error' });
    const otherEndpoint = await rejectionOf(
      stripe.customers.create({}, { idempotencyKey: 'order-1001-v3' }),
    );
    expect(otherEndpoint).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect(fake.state.checkoutSessions.size).toBe(1);
    expect(fake.state.customers.size).toBe(0);
  });

  it('creates one session for ten concurrent creates with the same key', async () => {
    // While the first request runs, the others get 409 idempotency_key_in_use (what the
    // service does; from memory); the SDK retries a 409, so with retries on every caller
    // ends up with the one session.
    const once = await Promise.allSettled(
      Array.from({ length: 10 }, () =>
        stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: 'order-1001-pay-v1' }),
      ),
    );
    expect(fake.state.checkoutSessions.size).toBe(1);
    const created = once.filter((r) => r.status === 'fulfilled');
    expect(created.length).toBeGreaterThanOrEqual(1);
    for (const result of once) {
      if (result.status === 'rejected') {
        expect(result.reason).toBeInstanceOf(Stripe.errors.StripeAPIError);
        expect(result.reason).toMatchObject({ statusCode: 409, code: 'idempotency_key_in_use' });
      }
    }

    const retrying = localStripe({ maxNetworkRetries: 3 });
    const sessions = await Promise.all(
      Array.from({ length: 10 }, () =>
        retrying.checkout.sessions.create(sessionParams(), { idempotencyKey: 'order-1001-pay-v2' }),
      ),
    );
    expect(new Set(sessions.map((s) => s.id)).size).toBe(1);
    expect(fake.state.checkoutSessions.size).toBe(2);
  });

  it('answers 409 idempotency_key_in_use while the first request runs; the SDK retries it into a replay', async () => {
    const intent = await paidIntent(8000);
    deliveryDelayMs = 300;
    const running = async (key) => {
      while (!fake.state.idempotencyKeys.has(key)) await sleep(2);
    };
    const params = { payment_intent: intent.id, amount: 2000 };
    // Without retries the second caller sees the conflict (from memory: 409, code
    // idempotency_key_in_use); only one refund exists either way.
    const [a, b] = await Promise.allSettled([
      stripe.refunds.create(params, { idempotencyKey: 'refund-1' }),
      running('refund-1').then(() => stripe.refunds.create(params, { idempotencyKey: 'refund-1' })),
    ]);
    expect(a.status).toBe('fulfilled');
    expect(b.status).toBe('rejected');
    const conflict = b.status === 'rejected' ? b.reason : null;
    expect(conflict).toBeInstanceOf(Stripe.errors.StripeAPIError);
    expect(conflict).toMatchObject({ statusCode: 409, code: 'idempotency_key_in_use' });
    expect(fake.state.refunds.size).toBe(1);

    // The SDK retries 409 responses: with retries on, both callers get the same refund.
    const retrying = localStripe({ maxNetworkRetries: 3 });
    const [c, d] = await Promise.all([
      retrying.refunds.create(params, { idempotencyKey: 'refund-2' }),
      running('refund-2').then(() =>
        retrying.refunds.create(params, { idempotencyKey: 'refund-2' }),
      ),
    ]);
    expect(d.id).toBe(c.id);
    expect(fake.state.refunds.size).toBe(2);
    const charge = await stripe.charges.retrieve(String(intent.latest_charge));
    expect(charge.amount_refunded).toBe(4000);
  });

  it('does not save a request refused while its parameters were checked', async () => {
    const refused = await rejectionOf(
      stripe.checkout.sessions.create(sessionParams({ mode: undefined }), {
        idempotencyKey: 'order-1001-v4',
      }),
    );
    expect(refused).toMatchObject({ statusCode: 400, code: 'parameter_missing' });
    const session = await stripe.checkout.sessions.create(sessionParams(), {
      idempotencyKey: 'order-1001-v4',
    });
    expect(session.status).toBe('open');
  });

  it('saves and replays a decline without charging or emitting again', async () => {
    const params = {
      amount: 2500,
      currency: 'gbp',
      payment_method: 'pm_card_visa_chargeDeclined',
      confirm: true,
    };
    const first = await rejectionOf(
      stripe.paymentIntents.create(params, { idempotencyKey: 'decline-1' }),
    );
    const second = await rejectionOf(
      stripe.paymentIntents.create(params, { idempotencyKey: 'decline-1' }),
    );
    expect(second).toBeInstanceOf(Stripe.errors.StripeCardError);
    expect(second.payment_intent.id).toBe(first.payment_intent.id);
    expect(fake.state.paymentIntents.size).toBe(1);
    expect(deliveredTypes()).toEqual(['payment_intent.payment_failed']);
  });

  it('refuses a key longer than 255 characters', async () => {
    const error = await rejectionOf(
      stripe.customers.create({}, { idempotencyKey: 'k'.repeat(256) }),
    );
    expect(error).toMatchObject({ statusCode: 400 });
    expect(fake.state.customers.size).toBe(0);
  });

  it('forgets keys after 24 hours', async () => {
    let now = Date.parse('2030-03-01T09:00:00Z');
    const clocked = createPaymentFake({
      publicBaseUrl: PUBLIC_BASE_URL,
      webhookSecret: SECRET,
      deliver: () => {},
      now: () => now,
    });
    server.use(...clocked.handlers);
    try {
      const first = await stripe.customers.create(
        { email: 'x@example.com' },
        { idempotencyKey: 'day-key' },
      );
      now += 23 * 60 * 60 * 1000;
      expect(
        (await stripe.customers.create({ email: 'x@example.com' }, { idempotencyKey: 'day-key' }))
          .id,
      ).toBe(first.id);
      now += 2 * 60 * 60 * 1000;
      expect(
        (await stripe.customers.create({ email: 'x@example.com' }, { idempotencyKey: 'day-key' }))
          .id,
      ).not.toBe(first.id);
      expect(clocked.state.customers.size).toBe(2);
    } finally {
      server.resetHandlers();
    }
  });
});
