// @ts-check
/**
 * Errors in the payment service's envelope: `{ "error": { type, code, decline_code, message,
 * param } }`. The SDK turns the HTTP status and `type` into its `Stripe.errors.*` classes
 * (400/404 → StripeInvalidRequestError or, for type idempotency_error, StripeIdempotencyError;
 * 401 → StripeAuthenticationError; 402 → StripeCardError; 409 and 5xx → StripeAPIError).
 */

/**
 * @typedef {object} StripeErrorFields
 * @property {'invalid_request_error' | 'card_error' | 'idempotency_error' | 'api_error'} type
 * @property {string} message
 * @property {string} [code]
 * @property {string} [decline_code]
 * @property {string} [param]
 * @property {Record<string, unknown>} [payment_intent]
 */

export class StripeApiError extends Error {
  /**
   * @param {number} status HTTP status
   * @param {StripeErrorFields} fields
   */
  constructor(status, fields) {
    super(fields.message);
    this.name = 'StripeApiError';
    this.status = status;
    this.fields = fields;
  }

  /**
   * Whether an idempotent request that failed this way keeps its response for replay. The
   * service saves a result only once the endpoint has started executing: declines (402) and
   * server errors are saved; requests refused while checking their parameters are not
   * (Stripe API reference, "Idempotent requests").
   * @returns {boolean}
   */
  get savedForIdempotency() {
    return this.status === 402 || this.status >= 500;
  }

  /** @returns {{ error: Record<string, unknown> }} */
  toBody() {
    /** @type {Record<string, unknown>} */
    const error = {};
    for (const [key, value] of Object.entries(this.fields)) {
      if (value !== undefined) error[key] = value;
    }
    return { error };
  }
}

/**
 * @param {string} message
 * @param {string} [param]
 * @param {string} [code]
 * @returns {StripeApiError}
 */
export function invalidRequest(message, param, code) {
  return new StripeApiError(400, { type: 'invalid_request_error', message, param, code });
}

/**
 * @param {string} param
 * @returns {StripeApiError}
 */
export function missingParam(param) {
  return invalidRequest(`Missing required param: ${param}.`, param, 'parameter_missing');
}

/**
 * @param {string} kind e.g. "checkout.session"
 * @param {string} id
 * @param {string} [param]
 * @returns {StripeApiError}
 */
export function noSuch(kind, id, param) {
  return new StripeApiError(404, {
    type: 'invalid_request_error',
    code: 'resource_missing',
    message: `No such ${kind}: '${id}'`,
    param: param ?? 'id',
  });
}
