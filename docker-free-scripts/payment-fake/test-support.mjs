// Shared pieces of the payment fake's tests. Demo data is invented.
import http from 'node:http';
import Stripe from 'stripe';

export const SECRET = 'whsec_payment_fake_tests';
export const PUBLIC_BASE_URL = 'http://localhost:12111';
export const LOCAL_HOST = /** @type {const} */ ({
  host: 'localhost',
  port: 12111,
  protocol: 'http',
});

/** The SDK as the API builds it against the running fake. */
export function localStripe(extra = {}) {
  return new Stripe('sk_test_nappe_fake', { ...LOCAL_HOST, maxNetworkRetries: 0, ...extra });
}

/** The SDK with its default host, api.stripe.com, intercepted in-process. */
export function defaultHostStripe(extra = {}) {
  return new Stripe('sk_test_nappe_fake', { maxNetworkRetries: 0, ...extra });
}

/** An SDK instance used only for its webhook helpers. */
export const sdk = new Stripe('sk_test_nappe_fake');

/** @param {Record<string, unknown>} [overrides] */
export function sessionParams(overrides = {}) {
  return {
    mode: 'payment',
    line_items: [
      {
        quantity: 4,
        price_data: {
          currency: 'gbp',
          unit_amount: 1250,
          product_data: { name: 'Blood orange and thyme tart' },
        },
      },
      {
        quantity: 1,
        price_data: {
          currency: 'gbp',
          unit_amount: 3000,
          product_data: { name: 'Plating service' },
        },
      },
    ],
    success_url: 'https://shop.example/booked?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'https://shop.example/booking/review',
    metadata: { orderId: 'ord_1001', amountVersion: '1', guests: '40' },
    client_reference_id: 'ord_1001',
    customer_email: 'client@example.com',
    payment_intent_data: { metadata: { orderId: 'ord_1001' } },
    ...overrides,
  };
}

/** Resolve to the error a promise rejects with; fail when it resolves. */
export async function rejectionOf(promise) {
  try {
    await promise;
  } catch (error) {
    return error;
  }
  throw new Error('expected the call to fail, but it succeeded');
}

/** Submit an HTML form the way a browser does, without following redirects. */
export function postForm(url, fields) {
  return fetch(url, {
    method: 'POST',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams(fields),
    redirect: 'manual',
  });
}

export const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * A local webhook endpoint that verifies the way the app must: the raw body and the
 * Stripe-Signature header, through the SDK's constructEvent.
 * @param {number} [status] what it answers
 */
export function startReceiver(status = 200) {
  /** @type {{ rawBody: string, signature: string, contentType: string, event?: import('stripe').Stripe.Event, error?: string }[]} */
  const received = [];
  const server = http.createServer((req, res) => {
    const chunks = [];
    req.on('data', (chunk) => chunks.push(chunk));
    req.on('end', () => {
      const rawBody = Buffer.concat(chunks).toString('utf8');
      const signature = String(req.headers['stripe-signature'] ?? '');
      const entry = { rawBody, signature, contentType: String(req.headers['content-type']) };
      try {
        entry.event = sdk.webhooks.constructEvent(rawBody, signature, SECRET);
      } catch (error) {
        entry.error = String(error);
      }
      received.push(entry);
      res.writeHead(status, { 'Content-Type': 'application/json' }).end('{"received":true}');
    });
  });
  return new Promise((resolve) => {
    server.listen(0, '127.0.0.1', () => {
      const { port } = /** @type {import('node:net').AddressInfo} */ (server.address());
      resolve({
        url: `http://127.0.0.1:${port}/api/payments/webhook`,
        received,
        close: () => new Promise((done) => server.close(done)),
      });
    });
  });
}
