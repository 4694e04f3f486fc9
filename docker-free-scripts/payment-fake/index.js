// @ts-check
// The local payment fake's public surface. Types for TypeScript callers: ./index.d.ts.
export { createPaymentFake, API_VERSION } from './create-payment-fake.js';
export { signWebhookPayload } from './webhook-signature.js';
export { TEST_CARDS, passesLuhn } from './test-cards.js';
export { formatMinorUnits, minorUnitExponent, minorUnitsToDecimalString } from './money.js';
export { PAGE_TITLE, escapeHtml } from './payment-page.js';

/** Settings of the running fake (server.mjs) when the environment says nothing. */
export const PAYMENT_FAKE_DEFAULTS = Object.freeze({
  port: 12111,
  host: '127.0.0.1',
  publicBaseUrl: 'http://localhost:12111',
  webhookUrl: 'http://localhost:3000/api/payments/webhook',
  webhookSecret: 'whsec_nappe_local_demo',
});
