// Webhook signing and delivery, checked with the SDK's own verifier: Stripe docs "Check the
// webhook signatures" (header `t=…,v1=…`, HMAC-SHA256 of "<t>.<raw body>", 300 s tolerance)
// and `stripe.webhooks.constructEvent` / `generateTestHeaderString` from the `stripe` package.
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { setupServer } from 'msw/node';
import Stripe from 'stripe';
import { createPaymentFake, signWebhookPayload } from './index.js';
import {
  PUBLIC_BASE_URL,
  SECRET,
  localStripe,
  postForm,
  rejectionOf,
  sdk,
  sessionParams,
  startReceiver,
} from './test-support.mjs';

/** @type {import('./index.js').WebhookDelivery[]} */
const delivered = [];
let clockOffsetMs = 0;
const fake = createPaymentFake({
  publicBaseUrl: PUBLIC_BASE_URL,
  webhookSecret: SECRET,
  deliver: (delivery) => {
    delivered.push(delivery);
  },
  now: () => Date.now() + clockOffsetMs,
});
// 'bypass' lets a fake that POSTs its webhooks reach the local receiver.
const server = setupServer(...fake.handlers);
const stripe = localStripe();

beforeAll(() => server.listen({ onUnhandledRequest: 'bypass' }));
afterAll(() => server.close());
beforeEach(() => {
  fake.reset();
  delivered.length = 0;
  clockOffsetMs = 0;
});
afterEach(() => server.resetHandlers());

async function paidIntent() {
  return stripe.paymentIntents.create({
    amount: 6400,
    currency: 'gbp',
    payment_method: 'pm_card_visa',
    confirm: true,
  });
}

describe('signature (Stripe docs, "Check the webhook signatures")', () => {
  it('sends a header of the form t=<unix seconds>,v1=<64 hex digits>', async () => {
    await paidIntent();
    const { signature } = delivered[0];
    expect(signature).toMatch(/^t=\d{10},v1=[0-9a-f]{64}$/);
    const t = Number(/^t=(\d+)/.exec(signature)?.[1]);
    expect(Math.abs(t - Date.now() / 1000)).toBeLessThan(5);
  });

  it('is exactly the header the SDK itself generates for the same body, secret and time', () => {
    const payload = JSON.stringify(
      { id: 'evt_x', object: 'event', note: 'crème brûlée £' },
      null,
      2,
    );
    const timestamp = 1_900_000_000;
    expect(signWebhookPayload(payload, SECRET, timestamp)).toBe(
      sdk.webhooks.generateTestHeaderString({ payload, secret: SECRET, timestamp }),
    );
  });

  it('is accepted by stripe.webhooks.constructEvent', async () => {
    await paidIntent();
    const { rawBody, signature, event } = delivered[0];
    const verified = sdk.webhooks.constructEvent(rawBody, signature, SECRET);
    expect(verified.id).toBe(event.id);
    expect(verified.type).toBe('payment_intent.succeeded');
  });

  it('is rejected for a tampered body, a wrong secret and a re-serialised body', async () => {
    await paidIntent();
    const { rawBody, signature } = delivered[0];
    const tampered = rawBody.replace('"amount": 6400', '"amount": 1');
    expect(tampered).not.toBe(rawBody);
    expect(() => sdk.webhooks.constructEvent(tampered, signature, SECRET)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    expect(() => sdk.webhooks.constructEvent(rawBody, signature, 'whsec_someone_else')).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    // A body parsed and serialised again (as a JSON body parser would) no longer matches.
    const reserialised = JSON.stringify(JSON.parse(rawBody));
    expect(() => sdk.webhooks.constructEvent(reserialised, signature, SECRET)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
  });

  it('is rejected once older than the 300 s tolerance, and accepted inside it', async () => {
    clockOffsetMs = -310_000;
    await paidIntent();
    const old = delivered[0];
    expect(() => sdk.webhooks.constructEvent(old.rawBody, old.signature, SECRET)).toThrow(
      /Timestamp outside the tolerance zone/,
    );
    clockOffsetMs = -290_000;
    await paidIntent();
    const recent = delivered[1];
    expect(sdk.webhooks.constructEvent(recent.rawBody, recent.signature, SECRET).id).toBe(
      recent.event.id,
    );
  });
});

describe('delivery', () => {
  it('POSTs signed JSON to webhookUrl when no deliver callback is given', async () => {
    const receiver = await startReceiver();
    const posting = createPaymentFake({
      publicBaseUrl: PUBLIC_BASE_URL,
      webhookSecret: SECRET,
      webhookUrl: receiver.url,
    });
    server.use(...posting.handlers);
    try {
      await stripe.paymentIntents.create({
        amount: 6400,
        currency: 'gbp',
        payment_method: 'pm_card_visa',
        confirm: true,
      });
      expect(receiver.received).toHaveLength(1);
      const [hit] = receiver.received;
      expect(hit.error).toBeUndefined();
      expect(hit.contentType).toMatch(/^application\/json/);
      expect(hit.event?.type).toBe('payment_intent.succeeded');
      expect(posting.state.deliveries).toMatchObject([
        {
          eventId: hit.event?.id,
          type: 'payment_intent.succeeded',
          ok: true,
          status: 200,
          target: receiver.url,
        },
      ]);
    } finally {
      await receiver.close();
    }
  });

  it('records a refused or unreachable endpoint and still completes the action', async () => {
    const receiver = await startReceiver(500);
    const refusing = createPaymentFake({
      publicBaseUrl: PUBLIC_BASE_URL,
      webhookSecret: SECRET,
      webhookUrl: receiver.url,
    });
    server.use(...refusing.handlers);
    try {
      const intent = await stripe.paymentIntents.create({
        amount: 100,
        currency: 'gbp',
        payment_method: 'pm_card_visa',
        confirm: true,
      });
      expect(intent.status).toBe('succeeded');
      expect(refusing.state.deliveries).toMatchObject([{ ok: false, status: 500 }]);
    } finally {
      await receiver.close();
    }
    // Nothing listens on the closed receiver's port any more.
    const unreachable = createPaymentFake({
      publicBaseUrl: PUBLIC_BASE_URL,
      webhookSecret: SECRET,
      webhookUrl: receiver.url,
    });
    server.use(...unreachable.handlers);
    const intent = await stripe.paymentIntents.create({
      amount: 100,
      currency: 'gbp',
      payment_method: 'pm_card_visa',
      confirm: true,
    });
    expect(intent.status).toBe('succeeded');
    expect(unreachable.state.deliveries).toMatchObject([{ ok: false, status: null }]);
    expect(unreachable.state.deliveries[0].error).toBeTruthy();
  });

  it('records a deliver callback that throws, without failing the payment', async () => {
    const throwing = createPaymentFake({
      publicBaseUrl: PUBLIC_BASE_URL,
      webhookSecret: SECRET,
      deliver: () => {
        throw new Error('app is down');
      },
    });
    server.use(...throwing.handlers);
    const intent = await stripe.paymentIntents.create({
      amount: 100,
      currency: 'gbp',
      payment_method: 'pm_card_visa',
      confirm: true,
    });
    expect(intent.status).toBe('succeeded');
    expect(throwing.state.deliveries).toMatchObject([
      { ok: false, error: 'app is down', target: 'callback' },
    ]);
  });

  it('sends checkout.session.completed then payment_intent.succeeded when the page is paid', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const answer = await postForm(session.url, {
      email: 'client@example.com',
      card_number: '4242424242424242',
    });
    expect(answer.status).toBe(303);
    expect(delivered.map((d) => d.event.type)).toEqual([
      'checkout.session.completed',
      'payment_intent.succeeded',
    ]);
    for (const delivery of delivered) {
      expect(sdk.webhooks.constructEvent(delivery.rawBody, delivery.signature, SECRET).id).toBe(
        delivery.event.id,
      );
    }
    const [completed, succeeded] = delivered.map((d) => d.event.data.object);
    expect(completed).toMatchObject({
      id: session.id,
      status: 'complete',
      payment_status: 'paid',
      metadata: { orderId: 'ord_1001' },
    });
    expect(succeeded).toMatchObject({
      id: completed.payment_intent,
      status: 'succeeded',
      amount: 8000,
      metadata: { orderId: 'ord_1001' },
    });
  });
});

describe('emit and redeliver, for duplicate and out-of-order tests', () => {
  it('emits a hand-made event: signed, stored, listed and retrievable', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const { event, delivery } = await fake.emit('checkout.session.expired', {
      ...session,
      status: 'expired',
    });
    expect(delivery.ok).toBe(true);
    expect(event).toMatchObject({
      object: 'event',
      type: 'checkout.session.expired',
      data: { object: { id: session.id, status: 'expired' } },
    });
    const sent = delivered.at(-1);
    expect(sdk.webhooks.constructEvent(sent.rawBody, sent.signature, SECRET).id).toBe(event.id);
    expect([...fake.state.events.keys()]).toEqual([event.id]);
    expect((await stripe.events.retrieve(event.id)).type).toBe('checkout.session.expired');
    // The hand-made event does not change the fake's own session.
    expect(fake.state.checkoutSessions.get(session.id)?.status).toBe('open');
  });

  it('redelivers a stored event with the same id and body', async () => {
    await paidIntent();
    const first = delivered[0];
    const record = await fake.redeliver(first.event.id);
    expect(record.ok).toBe(true);
    const second = delivered[1];
    expect(second.event.id).toBe(first.event.id);
    expect(second.rawBody).toBe(first.rawBody);
    expect(sdk.webhooks.constructEvent(second.rawBody, second.signature, SECRET).id).toBe(
      first.event.id,
    );
    await expect(fake.redeliver('evt_missing')).rejects.toThrow(/no event evt_missing/);
  });

  it('refuses emit without a type or an object', async () => {
    await expect(fake.emit('', {})).rejects.toThrow(TypeError);
    await expect(fake.emit('charge.refunded', /** @type {any} */ (null))).rejects.toThrow(
      TypeError,
    );
  });
});

describe('options', () => {
  it('refuses a fake without a secret, without a way to deliver, or with a bad URL', () => {
    expect(() =>
      createPaymentFake({ publicBaseUrl: PUBLIC_BASE_URL, webhookSecret: '', deliver: () => {} }),
    ).toThrow(/webhookSecret/);
    expect(() =>
      createPaymentFake({ publicBaseUrl: PUBLIC_BASE_URL, webhookSecret: SECRET }),
    ).toThrow(/webhookUrl/);
    expect(() =>
      createPaymentFake({
        publicBaseUrl: 'localhost:12111',
        webhookSecret: SECRET,
        deliver: () => {},
      }),
    ).toThrow(/publicBaseUrl/);
  });

  it('keeps the SDK error for a card decline separate from webhook delivery', async () => {
    const error = await rejectionOf(
      stripe.paymentIntents.create({
        amount: 100,
        currency: 'gbp',
        payment_method: 'pm_card_visa_chargeDeclined',
        confirm: true,
      }),
    );
    expect(error).toBeInstanceOf(Stripe.errors.StripeCardError);
    expect(delivered.map((d) => d.event.type)).toEqual(['payment_intent.payment_failed']);
    expect(delivered[0].event.data.object).toMatchObject({
      status: 'requires_payment_method',
      last_payment_error: { code: 'card_declined', decline_code: 'generic_decline' },
    });
  });
});
