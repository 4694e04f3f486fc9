// @ts-check
import { createHmac } from 'node:crypto';

/**
 * The `Stripe-Signature` header for a webhook body: `t=<unix seconds>,v1=<hex>` where
 * `v1 = HMAC-SHA256(secret, "${t}.${rawBody}")`, the secret used as is (Stripe docs, "Check
 * the webhook signatures" → "Verify manually").
 * @param {string} rawBody exactly the bytes that are sent
 * @param {string} secret the endpoint's signing secret, `whsec_…`
 * @param {number} timestamp unix seconds
 * @returns {string}
 */
export function signWebhookPayload(rawBody, secret, timestamp) {
  if (!Number.isSafeInteger(timestamp)) throw new TypeError('timestamp must be unix seconds');
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${rawBody}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}
