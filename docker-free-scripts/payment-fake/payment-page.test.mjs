// The local payment page at /pay/:sessionId, driven in-process with fetch. Test card
// outcomes from Stripe docs "Test card numbers"; money formats from CLDR through Intl
// (ECMA-402), computed here independently from the major-unit amount.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { setupServer } from 'msw/node';
import { createPaymentFake, PAGE_TITLE, TEST_CARDS } from './index.js';
import {
  PUBLIC_BASE_URL,
  SECRET,
  localStripe,
  postForm,
  sdk,
  sessionParams,
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
const server = setupServer(...fake.handlers);
const stripe = localStripe();
const types = () => delivered.map((d) => d.event.type);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterAll(() => server.close());
beforeEach(() => {
  fake.reset();
  delivered.length = 0;
  clockOffsetMs = 0;
});

async function openSession(overrides = {}) {
  return stripe.checkout.sessions.create(sessionParams(overrides));
}

async function pageText(url) {
  const response = await fetch(url);
  return {
    status: response.status,
    type: response.headers.get('content-type'),
    html: await response.text(),
  };
}

describe('the page for an open session', () => {
  it('is our own titled page with the order, the total, labelled fields and the test cards', async () => {
    const session = await openSession();
    const { status, type, html } = await pageText(session.url);
    expect(status).toBe(200);
    expect(type).toBe('text/html; charset=utf-8');
    expect(PAGE_TITLE).toBe('Local test payment — no real money moves');
    expect(html).toContain(`<title>${PAGE_TITLE}</title>`);
    expect(html).toContain(`<h1>${PAGE_TITLE}</h1>`);
    expect(html).toContain('background: #FBF6EE');
    expect(html).toContain('color: #2B1E2F');
    expect(html).toMatch(/h1, h2 \{ font-family: [^}]*serif/);
    expect(html).toContain('Blood orange and thyme tart');
    expect(html).toContain('Plating service');
    // 8000 pence: £80.00, unit price £12.50 and line total £50.00 (en-GB, CLDR).
    const gbp = new Intl.NumberFormat('en-GB', { style: 'currency', currency: 'GBP' });
    expect(html).toContain(`data-testid="total">${gbp.format(80)}<`);
    expect(gbp.format(80)).toBe('£80.00');
    expect(html).toContain(`>${gbp.format(12.5)}<`);
    expect(html).toContain(`>${gbp.format(50)}<`);
    expect(html).toMatch(
      /<label for="email">[^<]+<\/label>\s*<input id="email" name="email" type="email"/,
    );
    expect(html).toMatch(
      /<label for="card_number">[^<]+<\/label>\s*<input id="card_number" name="card_number"/,
    );
    for (const card of TEST_CARDS) {
      expect(html).toContain(card.number.replace(/(\d{4})(?=\d)/g, '$1 '));
    }
    expect(html).toContain('<a href="https://shop.example/booking/review">Cancel and return</a>');
    // The e-mail the shop already knows is shown and locked.
    expect(html).toMatch(/value="client@example.com" readonly/);
  });

  it('lists exactly the seven documented test cards with their outcomes (Stripe docs, "Test card numbers")', () => {
    expect(TEST_CARDS.map((card) => [card.number, card.outcome, card.declineCode ?? null])).toEqual(
      [
        ['4242424242424242', 'succeeds', null],
        ['4000000000000002', 'declined', 'generic_decline'],
        ['4000000000009995', 'declined', 'insufficient_funds'],
        ['4000000000009987', 'declined', 'lost_card'],
        ['4000000000000069', 'declined', 'expired_card'],
        ['4000000000000127', 'declined', 'incorrect_cvc'],
        ['4000002760003184', 'requires_authentication', null],
      ],
    );
  });

  it('formats a zero-decimal currency from its minor units (Stripe docs, "Zero-decimal currencies")', async () => {
    const session = await openSession({
      line_items: [
        {
          quantity: 2,
          price_data: {
            currency: 'jpy',
            unit_amount: 625,
            product_data: { name: 'Matcha mille-feuille' },
          },
        },
      ],
    });
    const { html } = await pageText(session.url);
    const jpy = new Intl.NumberFormat('en-GB', { style: 'currency', currency: 'JPY' });
    expect(html).toContain(`data-testid="total">${jpy.format(1250)}<`);
    expect(jpy.format(1250)).toBe('JP¥1,250');
  });

  it('escapes every value that comes from users', async () => {
    const session = await openSession({
      line_items: [
        {
          quantity: 1,
          price_data: {
            currency: 'gbp',
            unit_amount: 500,
            product_data: { name: '<script>alert("tart")</script> & <b>bold</b>' },
          },
        },
      ],
      cancel_url: 'https://shop.example/cancel?next="><img src=x onerror=alert(1)>',
      customer_email: undefined,
    });
    const { html } = await pageText(session.url);
    expect(html).not.toContain('<script>');
    expect(html).not.toContain('<b>bold');
    expect(html).not.toContain('<img');
    expect(html).toContain(
      '&lt;script&gt;alert(&quot;tart&quot;)&lt;/script&gt; &amp; &lt;b&gt;bold&lt;/b&gt;',
    );
    expect(html).toContain(
      'href="https://shop.example/cancel?next=&quot;&gt;&lt;img src=x onerror=alert(1)&gt;"',
    );
    // Typed values come back escaped too.
    const again = await postForm(session.url, {
      email: '"><svg onload=alert(1)>@x.io',
      card_number: '4242',
    });
    const text = await again.text();
    expect(text).not.toContain('<svg');
    expect(again.headers.get('content-security-policy')).toContain("default-src 'none'");
  });

  it("locks the e-mail of the session's customer", async () => {
    const customer = await stripe.customers.create({ email: 'known@example.com' });
    const session = await openSession({ customer: customer.id, customer_email: undefined });
    const { html } = await pageText(session.url);
    expect(html).toMatch(/value="known@example.com" readonly/);
    const answer = await postForm(session.url, {
      email: 'other@example.com',
      card_number: '4242424242424242',
    });
    expect(answer.status).toBe(303);
    const paid = await stripe.checkout.sessions.retrieve(session.id);
    expect(paid.customer_details?.email).toBe('known@example.com');
  });

  it('answers an unknown session with a clear 404 page', async () => {
    const { status, html } = await pageText(`${PUBLIC_BASE_URL}/pay/cs_test_unknown`);
    expect(status).toBe(404);
    expect(html).toContain('This payment page does not exist');
  });
});

describe('paying on the page', () => {
  it('pays with 4242 4242 4242 4242: 303 to success_url, session paid, charge made, webhooks signed', async () => {
    const session = await openSession();
    const answer = await postForm(session.url, {
      email: 'client@example.com',
      card_number: '4242 4242 4242 4242',
    });
    expect(answer.status).toBe(303);
    expect(answer.headers.get('location')).toBe(
      `https://shop.example/booked?session=${session.id}`,
    );

    const paid = await stripe.checkout.sessions.retrieve(session.id, {
      expand: ['payment_intent'],
    });
    expect(paid).toMatchObject({ status: 'complete', payment_status: 'paid' });
    const intent = /** @type {import('stripe').Stripe.PaymentIntent} */ (paid.payment_intent);
    expect(intent).toMatchObject({
      status: 'succeeded',
      amount: 8000,
      amount_received: 8000,
      currency: 'gbp',
      metadata: { orderId: 'ord_1001' },
    });
    const charge = await stripe.charges.retrieve(String(intent.latest_charge));
    expect(charge).toMatchObject({
      amount: 8000,
      paid: true,
      captured: true,
      status: 'succeeded',
      payment_intent: intent.id,
    });
    expect(charge.payment_method_details?.card?.last4).toBe('4242');
    expect(paid.customer_details?.email).toBe('client@example.com');

    expect(types()).toEqual(['checkout.session.completed', 'payment_intent.succeeded']);
    for (const d of delivered)
      expect(sdk.webhooks.constructEvent(d.rawBody, d.signature, SECRET).id).toBe(d.event.id);
  });

  // Stripe docs "Test card numbers", declined payments: the page shows the reason and the
  // session stays open.
  it.each([
    ['4000000000000002', 'Your card was declined.', 'generic decline'],
    ['4000000000009995', 'Your card has insufficient funds.', 'insufficient funds'],
    ['4000000000009987', 'Your card was declined.', 'lost card'],
    ['4000000000000069', 'Your card has expired.', 'expired card'],
    ['4000000000000127', 'Your card&#39;s security code is incorrect.', 'incorrect cvc'],
  ])('declines %s with the reason and keeps the session open', async (number, message, reason) => {
    const session = await openSession({ customer_email: undefined });
    const answer = await postForm(session.url, { email: 'guest@example.com', card_number: number });
    expect(answer.status).toBe(402);
    const html = await answer.text();
    expect(html).toContain('role="alert"');
    expect(html).toContain(message);
    expect(html).toContain(`Reason: ${reason}.`);
    expect(html).toContain('value="guest@example.com"');
    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after).toMatchObject({ status: 'open', payment_status: 'unpaid', payment_intent: null });
    expect(fake.state.charges.size).toBe(0);
    expect(types()).toEqual(['payment_intent.payment_failed']);
    expect(delivered[0].event.data.object).toMatchObject({
      status: 'requires_payment_method',
      metadata: { orderId: 'ord_1001' },
    });
  });

  it('pays after a decline through the same PaymentIntent', async () => {
    const session = await openSession();
    await postForm(session.url, { email: 'client@example.com', card_number: '4000000000009995' });
    const failedIntentId = String(delivered[0].event.data.object.id);
    const answer = await postForm(session.url, {
      email: 'client@example.com',
      card_number: '4242424242424242',
    });
    expect(answer.status).toBe(303);
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_intent).toBe(
      failedIntentId,
    );
    expect(fake.state.paymentIntents.size).toBe(1);
  });

  it('refuses a mistyped number, a card that is not a test card and a missing e-mail, charging nothing', async () => {
    const session = await openSession({ customer_email: undefined });
    const mistyped = await postForm(session.url, {
      email: 'a@example.com',
      card_number: '4242 4242 4242 4241',
    });
    expect(mistyped.status).toBe(400);
    expect(await mistyped.text()).toContain('Your card number is incorrect.');
    // 4111 1111 1111 1111 passes the Luhn check but is not one of the page's test cards.
    const other = await postForm(session.url, {
      email: 'a@example.com',
      card_number: '4111111111111111',
    });
    expect(other.status).toBe(402);
    expect(await other.text()).toContain('accepts only the test cards');
    const noEmail = await postForm(session.url, { email: '', card_number: '4242424242424242' });
    expect(noEmail.status).toBe(400);
    expect(await noEmail.text()).toContain('Check the e-mail address.');
    expect(fake.state.charges.size).toBe(0);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('charges once when the pay button is pressed twice at the same time', async () => {
    const session = await openSession();
    const answers = await Promise.all([
      postForm(session.url, { email: 'client@example.com', card_number: '4242424242424242' }),
      postForm(session.url, { email: 'client@example.com', card_number: '4242424242424242' }),
    ]);
    expect(answers.map((a) => a.status)).toEqual([303, 303]);
    expect(fake.state.charges.size).toBe(1);
    expect(types().filter((t) => t === 'checkout.session.completed')).toHaveLength(1);
    const late = await postForm(session.url, {
      email: 'client@example.com',
      card_number: '4000000000000002',
    });
    expect(late.status).toBe(303);
    expect(fake.state.charges.size).toBe(1);
  });
});

describe('the authentication card 4000 0027 6000 3184', () => {
  it('asks for authentication; failing it keeps the session open, completing it pays', async () => {
    const session = await openSession();
    const step = await postForm(session.url, {
      email: 'client@example.com',
      card_number: '4000002760003184',
    });
    expect(step.status).toBe(200);
    const stepHtml = await step.text();
    expect(stepHtml).toContain('>Complete authentication</button>');
    expect(stepHtml).toContain('>Fail authentication</button>');
    expect(stepHtml).toContain(`action="/pay/${session.id}/authenticate"`);
    expect(types()).toEqual([]);

    const authUrl = `${session.url}/authenticate`;
    const failed = await postForm(authUrl, { outcome: 'fail' });
    expect(failed.status).toBe(402);
    expect(await failed.text()).toContain('We are unable to authenticate your payment method.');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    expect(types()).toEqual(['payment_intent.payment_failed']);
    expect(delivered[0].event.data.object).toMatchObject({
      last_payment_error: { code: 'payment_intent_authentication_failure' },
    });

    // Nothing is waiting any more: a stray second answer is refused.
    const stray = await postForm(authUrl, { outcome: 'complete' });
    expect(stray.status).toBe(409);

    await postForm(session.url, {
      email: 'client@example.com',
      card_number: '4000 0027 6000 3184',
    });
    const done = await postForm(authUrl, { outcome: 'complete' });
    expect(done.status).toBe(303);
    expect(done.headers.get('location')).toBe(`https://shop.example/booked?session=${session.id}`);
    expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({
      status: 'complete',
      payment_status: 'paid',
    });
    expect(types()).toEqual([
      'payment_intent.payment_failed',
      'checkout.session.completed',
      'payment_intent.succeeded',
    ]);
  });
});

describe('closed sessions and expiry', () => {
  it('shows a completed session as complete', async () => {
    const session = await openSession();
    await postForm(session.url, { email: 'client@example.com', card_number: '4242424242424242' });
    const { status, html } = await pageText(session.url);
    expect(status).toBe(200);
    expect(html).toContain('This payment is complete');
    expect(html).not.toContain('name="card_number"');
  });

  it('shows an expired session as expired and takes no payment on it', async () => {
    const session = await openSession();
    await stripe.checkout.sessions.expire(session.id);
    const { status, html } = await pageText(session.url);
    expect(status).toBe(410);
    expect(html).toContain('This payment page has expired');
    const attempt = await postForm(session.url, {
      email: 'client@example.com',
      card_number: '4242424242424242',
    });
    expect(attempt.status).toBe(410);
    expect(fake.state.charges.size).toBe(0);
  });

  it('respects expires_at: past it the page and the API see an expired session, once', async () => {
    const created = Math.floor(Date.now() / 1000);
    const session = await openSession({ expires_at: created + 1800 });
    clockOffsetMs = 1799 * 1000;
    expect((await pageText(session.url)).status).toBe(200);
    clockOffsetMs = 1801 * 1000;
    const { status, html } = await pageText(session.url);
    expect(status).toBe(410);
    expect(html).toContain('has expired');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired');
    expect(types()).toEqual(['checkout.session.expired']);
  });

  it('expireDueSessions(now) expires only the open sessions whose time has come', async () => {
    const created = Math.floor(Date.now() / 1000);
    const soon = await openSession({ expires_at: created + 1800 });
    const later = await openSession({ expires_at: created + 7200 });
    const paid = await openSession({ expires_at: created + 1800 });
    await postForm(paid.url, { email: 'client@example.com', card_number: '4242424242424242' });
    delivered.length = 0;

    expect(await fake.expireDueSessions((created + 1000) * 1000)).toEqual([]);
    expect(await fake.expireDueSessions((created + 3600) * 1000)).toEqual([soon.id]);
    expect(types()).toEqual(['checkout.session.expired']);
    expect(fake.state.checkoutSessions.get(later.id)?.status).toBe('open');
    expect(fake.state.checkoutSessions.get(paid.id)?.status).toBe('complete');
    expect(await fake.expireDueSessions((created + 3600) * 1000)).toEqual([]);
  });

  it('cancels the open PaymentIntent of a session that expires mid-authentication', async () => {
    const session = await openSession();
    await postForm(session.url, { email: 'client@example.com', card_number: '4000002760003184' });
    await stripe.checkout.sessions.expire(session.id);
    const [intent] = fake.state.paymentIntents.values();
    expect(intent).toMatchObject({ status: 'canceled', cancellation_reason: 'abandoned' });
    const late = await postForm(`${session.url}/authenticate`, { outcome: 'complete' });
    expect(late.status).toBe(410);
    expect(fake.state.charges.size).toBe(0);
  });
});
