// @ts-check
/**
 * Idempotent requests as the Stripe API reference describes them ("Idempotent requests"):
 * the first response for a key is saved and replayed for the same endpoint and parameters;
 * the same key with other parameters or on another endpoint is refused (idempotency_error);
 * a key whose first request is still running answers 409; keys are up to 255 characters and
 * are forgotten after 24 hours; requests refused before the endpoint ran are not saved.
 */
import { isRecord } from './params.js';
import { StripeApiError, invalidRequest } from './stripe-errors.js';

/** @typedef {import('./index.js').IdempotencyEntry} IdempotencyEntry */
/** @typedef {{ status: number, body: unknown, save: boolean }} RouteResult */

const MAX_KEY_LENGTH = 255;
const TTL_MS = 24 * 60 * 60 * 1000;

/**
 * Sorted-key JSON, so the same parameters in another order count as the same request.
 * @param {unknown} value
 * @returns {string}
 */
export function canonicalJson(value) {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (isRecord(value)) {
    const keys = Object.keys(value).sort();
    return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson(value[k])}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

/**
 * @param {StripeApiError} error
 * @returns {RouteResult}
 */
function refused(error) {
  return { status: error.status, body: error.toBody(), save: false };
}

/**
 * @param {Map<string, IdempotencyEntry>} store
 * @param {() => number} clock epoch milliseconds
 */
export function createIdempotencyLayer(store, clock) {
  /**
   * @param {string} key the Idempotency-Key header
   * @param {string} path the request's path
   * @param {Record<string, unknown>} params the parsed body
   * @param {() => Promise<RouteResult>} run runs the endpoint; never throws
   * @returns {Promise<RouteResult & { replayed?: boolean }>}
   */
  return async function withIdempotency(key, path, params, run) {
    if (key.length > MAX_KEY_LENGTH) {
      return refused(
        invalidRequest(
          `Invalid Idempotency-Key: keys can be at most ${MAX_KEY_LENGTH} characters long.`,
        ),
      );
    }
    // Forget keys older than a day. The map is in insertion order, which is creation order,
    // so the sweep stops at the first key still young enough.
    for (const [oldKey, old] of store) {
      if (clock() - old.createdAt <= TTL_MS) break;
      store.delete(oldKey);
    }
    const fingerprint = canonicalJson(params);
    const entry = store.get(key);
    if (entry) {
      if (entry.path !== path) {
        return refused(
          new StripeApiError(400, {
            type: 'idempotency_error',
            message: `Keys for idempotent requests can only be used for the same endpoint they were first used for ('${entry.path}' vs '${path}'). Try using a key other than '${key}' if you meant to execute a different request.`,
          }),
        );
      }
      if (entry.fingerprint !== fingerprint) {
        return refused(
          new StripeApiError(400, {
            type: 'idempotency_error',
            message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
          }),
        );
      }
      if (!entry.response) {
        return refused(
          new StripeApiError(409, {
            type: 'invalid_request_error',
            code: 'idempotency_key_in_use',
            message: `There is currently another in-progress request using this Idempotent Key (that probably means you submitted twice, and the other request is still going through): ${key}. Please try again later.`,
          }),
        );
      }
      return {
        status: entry.response.status,
        body: structuredClone(entry.response.body),
        save: true,
        replayed: true,
      };
    }
    /** @type {IdempotencyEntry} */
    const fresh = { path, fingerprint, createdAt: clock(), response: null };
    store.set(key, fresh);
    const result = await run();
    if (result.save) {
      fresh.response = { status: result.status, body: structuredClone(result.body) };
    } else {
      store.delete(key);
    }
    return result;
  };
}
