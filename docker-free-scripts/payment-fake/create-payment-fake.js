// @ts-check
/**
 * A local stand-in for the card payment service, built from msw request handlers. The same
 * handlers run in-process under `setupServer` (API tests) and behind express with
 * `createMiddleware` (the running system on port 12111). Object shapes follow the service's
 * API reference and the `stripe` SDK's TypeScript types; state lives in in-memory maps.
 */
import { http, HttpResponse } from 'msw';
import Stripe from 'stripe';
import { newId } from './ids.js';
import { formatMinorUnits } from './money.js';
import { createIdempotencyLayer } from './idempotency.js';
import {
  authenticationError,
  chargeObject,
  checkAmountCeiling,
  checkoutSessionObject,
  customerObject,
  declineError,
  lineItemFromParams,
  paymentIntentObject,
  paymentMethodSummary,
  refundObject,
} from './objects.js';
import {
  currencyParam,
  expandParam,
  isRecord,
  looksLikeEmail,
  metadataParam,
  optionalBoolean,
  optionalInteger,
  optionalString,
  parseForm,
  requiredInteger,
  requiredString,
  urlParam,
} from './params.js';
import {
  renderAuthenticationPage,
  renderCheckoutPage,
  renderClosedPage,
  renderIntentAuthenticationPage,
  renderNotFoundPage,
} from './payment-page.js';
import { StripeApiError, invalidRequest, missingParam, noSuch } from './stripe-errors.js';
import { TEST_CARDS_BY_NUMBER, TEST_CARDS_BY_PAYMENT_METHOD, passesLuhn } from './test-cards.js';
import { signWebhookPayload } from './webhook-signature.js';

/** @typedef {import('./index.js').PaymentFakeOptions} PaymentFakeOptions */
/** @typedef {import('./index.js').PaymentFake} PaymentFake */
/** @typedef {import('./index.js').PaymentFakeState} PaymentFakeState */
/** @typedef {import('./index.js').FakeCheckoutSession} FakeCheckoutSession */
/** @typedef {import('./index.js').FakeLineItem} FakeLineItem */
/** @typedef {import('./index.js').FakePaymentIntent} FakePaymentIntent */
/** @typedef {import('./index.js').FakeCharge} FakeCharge */
/** @typedef {import('./index.js').FakeEvent} FakeEvent */
/** @typedef {import('./index.js').DeliveryRecord} DeliveryRecord */
/** @typedef {import('./index.js').TestCard} TestCard */
/** @typedef {import('./index.js').FakeLastPaymentError} FakeLastPaymentError */
/** @typedef {Record<string, unknown>} Params */
/** @typedef {{ requestId: string | null, idempotencyKey: string | null }} RequestContext */
/** @typedef {{ status: number, body: unknown, save: boolean }} RouteResult */
/**
 * @typedef {object} RouteInput
 * @property {Params} body the parsed form body (POST) or query string (GET)
 * @property {Record<string, string>} params path parameters
 * @property {RequestContext} ctx
 */

/** The API version events carry: the SDK's pinned version, as an account on it would send. */
export const API_VERSION = Stripe.API_VERSION;

const DAY_SECONDS = 24 * 60 * 60;
// Stripe API reference, Checkout Session `expires_at`: 30 minutes to 24 hours after creation;
// 24 hours by default.
const MIN_SESSION_SECONDS = 30 * 60;
const MAX_SESSION_SECONDS = DAY_SECONDS;
const WEBHOOK_TIMEOUT_MS = 10_000;

const CONFIRMABLE = ['requires_payment_method', 'requires_confirmation', 'requires_action'];
const CANCELABLE = [
  'requires_payment_method',
  'requires_capture',
  'requires_confirmation',
  'requires_action',
  'processing',
];
const REFUND_REASONS = ['duplicate', 'fraudulent', 'requested_by_customer'];
const CANCELLATION_REASONS = ['duplicate', 'fraudulent', 'requested_by_customer', 'abandoned'];

/**
 * @param {unknown} value
 * @param {string} name
 * @returns {string} the URL without a trailing slash
 */
function checkHttpUrl(value, name) {
  if (typeof value !== 'string') {
    throw new TypeError(`createPaymentFake: ${name} must be an http(s) URL string`);
  }
  /** @type {URL} */
  let url;
  try {
    url = new URL(value);
  } catch {
    throw new TypeError(`createPaymentFake: ${name} is not a valid URL: ${value}`);
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') {
    throw new TypeError(`createPaymentFake: ${name} must use http or https: ${value}`);
  }
  return url.href.replace(/\/+$/, '');
}

/**
 * @param {string} key
 * @returns {string}
 */
function maskKey(key) {
  return key.length <= 12 ? `${key.slice(0, 3)}***` : `${key.slice(0, 8)}***${key.slice(-4)}`;
}

/**
 * @param {Record<string, string | readonly string[] | undefined>} params
 * @returns {Record<string, string>}
 */
function pathParams(params) {
  /** @type {Record<string, string>} */
  const out = {};
  for (const [key, value] of Object.entries(params)) {
    out[key] = Array.isArray(value) ? value.join('/') : String(value ?? '');
  }
  return out;
}

/**
 * @param {string} html
 * @param {number} [status]
 * @returns {Response}
 */
function htmlResponse(html, status = 200) {
  return new HttpResponse(html, {
    status,
    headers: {
      'Content-Type': 'text/html; charset=utf-8',
      'Cache-Control': 'no-store',
      'X-Content-Type-Options': 'nosniff',
      'Referrer-Policy': 'no-referrer',
      'Content-Security-Policy':
        "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; frame-ancestors 'none'",
    },
  });
}

/**
 * @param {string} location
 * @returns {Response}
 */
function seeOther(location) {
  return new HttpResponse(null, {
    status: 303,
    headers: { Location: location, 'Cache-Control': 'no-store' },
  });
}

/**
 * @param {PaymentFakeOptions} options
 * @returns {PaymentFake}
 */
export function createPaymentFake(options) {
  if (!isRecord(options)) {
    throw new TypeError(
      'createPaymentFake needs options: { publicBaseUrl, webhookUrl, webhookSecret, deliver? }',
    );
  }
  const publicBaseUrl = checkHttpUrl(options.publicBaseUrl, 'publicBaseUrl');
  if (typeof options.webhookSecret !== 'string' || options.webhookSecret === '') {
    throw new TypeError('createPaymentFake: webhookSecret must be a non-empty string');
  }
  const webhookSecret = options.webhookSecret;
  if (options.deliver !== undefined && typeof options.deliver !== 'function') {
    throw new TypeError('createPaymentFake: deliver must be a function when given');
  }
  const deliver = options.deliver;
  const webhookUrl =
    options.webhookUrl === undefined && deliver
      ? null
      : checkHttpUrl(options.webhookUrl, 'webhookUrl');
  const clock = options.now ?? Date.now;
  const onDelivery = options.onDelivery;
  const nowSeconds = () => Math.floor(clock() / 1000);

  /** @type {PaymentFakeState} */
  const state = {
    customers: new Map(),
    checkoutSessions: new Map(),
    lineItems: new Map(),
    paymentIntents: new Map(),
    charges: new Map(),
    refunds: new Map(),
    events: new Map(),
    deliveries: [],
    idempotencyKeys: new Map(),
  };
  /**
   * The PaymentIntent an open session's page is paying through, and the e-mail typed there.
   * @type {Map<string, { paymentIntentId: string, email: string }>}
   */
  const attempts = new Map();
  /** @type {Map<string, { metadata: Record<string, string>, description: string | null }>} */
  const intentDataBySession = new Map();
  /** The test card behind each PaymentIntent's payment method. @type {Map<string, TestCard>} */
  const intentCards = new Map();

  function reset() {
    for (const map of [
      state.customers,
      state.checkoutSessions,
      state.lineItems,
      state.paymentIntents,
      state.charges,
      state.refunds,
      state.events,
      state.idempotencyKeys,
    ]) {
      map.clear();
    }
    state.deliveries.length = 0;
    attempts.clear();
    intentDataBySession.clear();
    intentCards.clear();
  }

  // ---------------------------------------------------------------- events and webhooks

  /**
   * @param {string} type
   * @param {object} object
   * @param {Partial<RequestContext>} [ctx]
   * @returns {FakeEvent}
   */
  function recordEvent(type, object, ctx = {}) {
    /** @type {FakeEvent} */
    const event = {
      id: newId('evt'),
      object: 'event',
      api_version: API_VERSION,
      created: nowSeconds(),
      data: { object: /** @type {Record<string, unknown>} */ (structuredClone(object)) },
      livemode: false,
      // One endpoint; left as sent, so a redelivered event is byte-for-byte the same body.
      pending_webhooks: 1,
      request: { id: ctx.requestId ?? null, idempotency_key: ctx.idempotencyKey ?? null },
      type,
    };
    state.events.set(event.id, event);
    return event;
  }

  /**
   * Sign and send one event. A failed delivery is recorded, never thrown: the action that
   * caused the event has already happened, as with the real service.
   * @param {FakeEvent} event
   * @returns {Promise<DeliveryRecord>}
   */
  async function deliverEvent(event) {
    // Pretty-printed like the real service's bodies, so a body parsed and re-serialised no
    // longer matches its signature.
    const rawBody = JSON.stringify(event, null, 2);
    const signature = signWebhookPayload(rawBody, webhookSecret, nowSeconds());
    /** @type {DeliveryRecord} */
    const record = {
      eventId: event.id,
      type: event.type,
      at: clock(),
      target: deliver ? 'callback' : /** @type {string} */ (webhookUrl),
      ok: false,
      status: null,
      error: null,
    };
    try {
      if (deliver) {
        await deliver({ rawBody, signature, event: structuredClone(event) });
        record.ok = true;
      } else {
        const response = await fetch(/** @type {string} */ (webhookUrl), {
          method: 'POST',
          headers: {
            'Content-Type': 'application/json; charset=utf-8',
            'Stripe-Signature': signature,
            'User-Agent': 'Stripe/1.0 (+https://stripe.com/docs/webhooks)',
          },
          body: rawBody,
          signal: AbortSignal.timeout(WEBHOOK_TIMEOUT_MS),
        });
        await response.arrayBuffer();
        record.status = response.status;
        record.ok = response.ok;
        if (!response.ok) record.error = `webhook endpoint answered ${response.status}`;
      }
    } catch (error) {
      record.error = error instanceof Error ? error.message : String(error);
    }
    state.deliveries.push(record);
    onDelivery?.(record);
    return record;
  }

  /**
   * Deliver events one after another, in order. The service itself gives no order; tests
   * that need another order use `emit`.
   * @param {FakeEvent[]} events
   * @returns {Promise<DeliveryRecord[]>}
   */
  async function publish(events) {
    /** @type {DeliveryRecord[]} */
    const records = [];
    for (const event of events) records.push(await deliverEvent(event));
    return records;
  }

  /**
   * @param {string} type
   * @param {object} object
   */
  async function emit(type, object) {
    if (typeof type !== 'string' || type === '') {
      throw new TypeError(
        'emit(type, object): type must be an event type such as "charge.refunded"',
      );
    }
    if (!isRecord(object)) throw new TypeError('emit(type, object): object must be an API object');
    const event = recordEvent(type, object);
    const [delivery] = await publish([event]);
    return { event: structuredClone(event), delivery };
  }

  /**
   * Send a stored event again, same id and body, freshly signed: a duplicate delivery.
   * @param {string} eventId
   */
  async function redeliver(eventId) {
    const event = state.events.get(eventId);
    if (!event) throw new Error(`redeliver: no event ${eventId} in the payment fake`);
    return deliverEvent(event);
  }

  // ---------------------------------------------------------------- expansion

  /**
   * @param {string} id
   * @returns {object | undefined}
   */
  function lookup(id) {
    if (id.startsWith('cs_')) return state.checkoutSessions.get(id);
    if (id.startsWith('pi_')) return state.paymentIntents.get(id);
    if (id.startsWith('ch_')) return state.charges.get(id);
    if (id.startsWith('re_')) return state.refunds.get(id);
    if (id.startsWith('cus_')) return state.customers.get(id);
    return undefined;
  }

  /**
   * @param {FakeLineItem[]} items
   * @param {string} url
   * @param {boolean} [hasMore]
   */
  function listOf(items, url, hasMore = false) {
    return { object: 'list', data: items, has_more: hasMore, url };
  }

  /**
   * @param {Record<string, unknown>} target
   * @param {string[]} segments
   * @param {string} fullPath
   */
  function expandPath(target, segments, fullPath) {
    const notExpandable = () =>
      invalidRequest(`This property cannot be expanded (${fullPath}).`, 'expand');
    const [head, ...rest] = segments;
    if (target.object === 'checkout.session' && head === 'line_items') {
      if (rest.length > 0) throw notExpandable();
      const items = state.lineItems.get(String(target.id)) ?? [];
      target.line_items = listOf(
        structuredClone(items),
        `/v1/checkout/sessions/${String(target.id)}/line_items`,
      );
      return;
    }
    if (!(head in target)) throw notExpandable();
    let value = target[head];
    if (value === null) return;
    if (typeof value === 'string') {
      const found = lookup(value);
      if (!found) throw notExpandable();
      value = structuredClone(found);
      target[head] = value;
    }
    if (!isRecord(value)) throw notExpandable();
    if (rest.length > 0) expandPath(value, rest, fullPath);
  }

  /**
   * A response body: a snapshot of the object (later changes do not leak into replays or
   * events), with the requested `expand[]` paths filled in.
   * @param {object} object
   * @param {Params} body
   * @returns {RouteResult}
   */
  function ok(object, body) {
    const copy = /** @type {Record<string, unknown>} */ (structuredClone(object));
    const paths = expandParam(body);
    for (const path of paths) {
      const segments = path.split('.');
      if (segments.length > 4) {
        throw invalidRequest(
          `You cannot expand more than 4 levels of a property (${path}).`,
          'expand',
        );
      }
      expandPath(copy, segments, path);
    }
    return { status: 200, body: copy, save: true };
  }

  // ---------------------------------------------------------------- request plumbing

  /**
   * @param {Request} request
   */
  function authenticate(request) {
    const header = request.headers.get('authorization') ?? '';
    let key = '';
    if (/^bearer\s/i.test(header)) key = header.slice(7).trim();
    else if (/^basic\s/i.test(header)) {
      key = Buffer.from(header.slice(6).trim(), 'base64').toString('utf8').split(':')[0];
    }
    if (!key) {
      throw new StripeApiError(401, {
        type: 'invalid_request_error',
        message:
          "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
      });
    }
    if (!/^(sk|rk)_test_\S+$/.test(key)) {
      throw new StripeApiError(401, {
        type: 'invalid_request_error',
        message: `Invalid API Key provided: ${maskKey(key)}. The local payment fake accepts test-mode secret keys only (sk_test_…).`,
      });
    }
  }

  /**
   * @param {() => RouteResult | Promise<RouteResult>} run
   * @returns {Promise<RouteResult>}
   */
  async function execute(run) {
    try {
      return await run();
    } catch (error) {
      if (error instanceof StripeApiError) {
        return { status: error.status, body: error.toBody(), save: error.savedForIdempotency };
      }
      console.error('[payment-fake] internal error', error);
      const failure = new StripeApiError(500, {
        type: 'api_error',
        message: `The local payment fake failed: ${error instanceof Error ? error.message : String(error)}`,
      });
      return { status: 500, body: failure.toBody(), save: false };
    }
  }

  const withIdempotency = createIdempotencyLayer(state.idempotencyKeys, clock);

  /**
   * @param {'get' | 'post'} method
   * @param {string} path
   * @param {(input: RouteInput) => RouteResult | Promise<RouteResult>} run
   */
  function apiRoute(method, path, run) {
    return http[method](`*${path}`, async ({ request, params }) => {
      const requestId = newId('req', 14);
      const idempotencyKey = method === 'post' ? request.headers.get('idempotency-key') : null;
      const url = new URL(request.url);
      /** @type {RouteResult & { replayed?: boolean }} */
      let result;
      try {
        authenticate(request);
        const body = parseForm(method === 'post' ? await request.text() : url.search.slice(1));
        /** @type {RouteInput} */
        const input = { body, params: pathParams(params), ctx: { requestId, idempotencyKey } };
        result = idempotencyKey
          ? await withIdempotency(idempotencyKey, url.pathname, body, () =>
              execute(() => run(input)),
            )
          : await execute(() => run(input));
      } catch (error) {
        result = await execute(() => {
          throw error;
        });
      }
      /** @type {Record<string, string>} */
      const headers = { 'Request-Id': requestId, 'Stripe-Version': API_VERSION };
      if (idempotencyKey) headers['Idempotency-Key'] = idempotencyKey;
      if (result.replayed) headers['Idempotent-Replayed'] = 'true';
      return HttpResponse.json(/** @type {Record<string, unknown>} */ (result.body), {
        status: result.status,
        headers,
      });
    });
  }

  // ---------------------------------------------------------------- lookups

  /** @param {string} id */
  function getSession(id) {
    const session = state.checkoutSessions.get(id);
    if (!session) throw noSuch('checkout.session', id, 'session');
    return session;
  }

  /** @param {string} id */
  function getIntent(id) {
    const intent = state.paymentIntents.get(id);
    if (!intent) throw noSuch('payment_intent', id, 'intent');
    return intent;
  }

  // ---------------------------------------------------------------- customers

  /** @param {RouteInput} input */
  function createCustomer({ body }) {
    const email = optionalString(body, 'email') ?? null;
    if (email !== null && !looksLikeEmail(email)) {
      throw invalidRequest(`Invalid email address: ${email}`, 'email', 'email_invalid');
    }
    const customer = customerObject({
      email,
      name: optionalString(body, 'name') ?? null,
      phone: optionalString(body, 'phone') ?? null,
      description: optionalString(body, 'description') ?? null,
      metadata: metadataParam(body, 'metadata'),
      created: nowSeconds(),
    });
    state.customers.set(customer.id, customer);
    return ok(customer, body);
  }

  // ---------------------------------------------------------------- checkout sessions

  /** @param {RouteInput} input */
  function createCheckoutSession({ body }) {
    const created = nowSeconds();
    const mode = requiredString(body, 'mode');
    if (mode !== 'payment') {
      throw invalidRequest(
        `The local payment fake supports mode=payment only, not '${mode}'.`,
        'mode',
      );
    }
    const rawItems = body.line_items;
    if (rawItems === undefined || rawItems === '') throw missingParam('line_items');
    if (!Array.isArray(rawItems) || rawItems.length === 0) {
      throw invalidRequest('Invalid array', 'line_items');
    }
    if (rawItems.length > 100) {
      throw invalidRequest('A Checkout Session can have at most 100 line items.', 'line_items');
    }
    const items = rawItems.map((raw, index) => lineItemFromParams(raw, index, created));
    const currency = items[0].currency;
    items.forEach((item, index) => {
      if (item.currency !== currency) {
        throw invalidRequest(
          `All line items must use the same currency; line_items[${index}] uses ${item.currency}, not ${currency}.`,
          `line_items[${index}][price_data][currency]`,
        );
      }
    });
    const amountTotal = items.reduce((sum, item) => sum + item.amount_total, 0);
    checkAmountCeiling(amountTotal, currency, 'line_items');

    const successUrl = urlParam(body, 'success_url');
    if (successUrl === undefined) throw missingParam('success_url');
    const cancelUrl = urlParam(body, 'cancel_url') ?? null;

    const customerId = optionalString(body, 'customer') ?? null;
    if (customerId !== null && !state.customers.has(customerId)) {
      throw new StripeApiError(400, {
        type: 'invalid_request_error',
        code: 'resource_missing',
        message: `No such customer: '${customerId}'`,
        param: 'customer',
      });
    }
    const customerEmail = optionalString(body, 'customer_email') ?? null;
    if (customerEmail !== null && !looksLikeEmail(customerEmail)) {
      throw invalidRequest(
        `Invalid email address: ${customerEmail}`,
        'customer_email',
        'email_invalid',
      );
    }
    if (customerEmail !== null && customerId !== null) {
      throw invalidRequest(
        'You may only specify one of these parameters: customer, customer_email.',
        'customer_email',
      );
    }
    const clientReferenceId = optionalString(body, 'client_reference_id') ?? null;
    if (clientReferenceId !== null && clientReferenceId.length > 200) {
      throw invalidRequest(
        'client_reference_id can be at most 200 characters long.',
        'client_reference_id',
      );
    }
    const expiresAt = optionalInteger(body, 'expires_at') ?? created + MAX_SESSION_SECONDS;
    if (expiresAt < created + MIN_SESSION_SECONDS || expiresAt > created + MAX_SESSION_SECONDS) {
      throw invalidRequest(
        'The `expires_at` timestamp must be between 30 minutes and 24 hours from Checkout Session creation.',
        'expires_at',
      );
    }
    const intentData = isRecord(body.payment_intent_data) ? body.payment_intent_data : {};
    const locale = optionalString(body, 'locale') ?? null;

    const session = checkoutSessionObject({
      publicBaseUrl,
      created,
      amountTotal,
      currency,
      cancelUrl,
      successUrl,
      clientReferenceId,
      customer: customerId,
      customerEmail,
      expiresAt,
      locale,
      metadata: metadataParam(body, 'metadata'),
    });
    const { id } = session;
    state.checkoutSessions.set(id, session);
    state.lineItems.set(id, items);
    intentDataBySession.set(id, {
      metadata: metadataParam(intentData, 'metadata', 'payment_intent_data[metadata]'),
      description:
        optionalString(intentData, 'description', 'payment_intent_data[description]') ?? null,
    });
    return ok(session, body);
  }

  /**
   * @param {FakeCheckoutSession} session
   * @param {Partial<RequestContext>} ctx
   */
  async function expireSession(session, ctx) {
    session.status = 'expired';
    const attempt = attempts.get(session.id);
    attempts.delete(session.id);
    const intent = attempt ? state.paymentIntents.get(attempt.paymentIntentId) : undefined;
    if (intent && CANCELABLE.includes(intent.status)) {
      intent.status = 'canceled';
      intent.canceled_at = nowSeconds();
      intent.cancellation_reason = 'abandoned';
      intent.next_action = null;
    }
    await publish([recordEvent('checkout.session.expired', session, ctx)]);
  }

  /**
   * A session past its `expires_at` expires when next touched, and on `expireDueSessions`.
   * @param {FakeCheckoutSession} session
   * @param {Partial<RequestContext>} [ctx]
   */
  async function expireIfDue(session, ctx = {}) {
    if (session.status === 'open' && session.expires_at <= nowSeconds()) {
      await expireSession(session, ctx);
    }
  }

  /**
   * @param {number} [nowMs]
   * @returns {Promise<string[]>} ids of the sessions expired now
   */
  async function expireDueSessions(nowMs = clock()) {
    const due = [...state.checkoutSessions.values()].filter(
      (session) => session.status === 'open' && session.expires_at * 1000 <= nowMs,
    );
    /** @type {string[]} */
    const expired = [];
    for (const session of due) {
      if (session.status !== 'open') continue;
      expired.push(session.id);
      await expireSession(session, {});
    }
    return expired;
  }

  /** @param {RouteInput} input */
  async function retrieveCheckoutSession({ body, params, ctx }) {
    const session = getSession(params.id);
    await expireIfDue(session, ctx);
    return ok(session, body);
  }

  /** @param {RouteInput} input */
  function listSessionLineItems({ body, params }) {
    const session = getSession(params.id);
    const all = state.lineItems.get(session.id) ?? [];
    const limit = optionalInteger(body, 'limit', 'limit', { min: 1, max: 100 }) ?? 10;
    const startingAfter = optionalString(body, 'starting_after');
    let from = 0;
    if (startingAfter !== undefined) {
      const index = all.findIndex((item) => item.id === startingAfter);
      if (index < 0) {
        throw invalidRequest(
          `No such line item: '${startingAfter}'`,
          'starting_after',
          'resource_missing',
        );
      }
      from = index + 1;
    }
    const rest = all.slice(from);
    const page = rest.slice(0, limit);
    return {
      status: 200,
      body: listOf(
        structuredClone(page),
        `/v1/checkout/sessions/${session.id}/line_items`,
        rest.length > limit,
      ),
      save: true,
    };
  }

  /** @param {RouteInput} input */
  async function expireCheckoutSession({ body, params, ctx }) {
    const session = getSession(params.id);
    if (session.status !== 'open') {
      throw invalidRequest(
        `Only Checkout Sessions with a status in ["open"] can be expired. This Checkout Session has a status of "${session.status}".`,
      );
    }
    await expireSession(session, ctx);
    return ok(session, body);
  }

  // ---------------------------------------------------------------- payment intents

  /**
   * @param {{ amount: number, currency: string, customer: string | null,
   *   description: string | null, metadata: Record<string, string>,
   *   receiptEmail: string | null }} fields
   * @returns {FakePaymentIntent}
   */
  function newIntent(fields) {
    const intent = paymentIntentObject({ ...fields, created: nowSeconds() });
    state.paymentIntents.set(intent.id, intent);
    return intent;
  }

  /**
   * @param {FakePaymentIntent} intent
   * @param {TestCard} card
   * @param {string | null} email
   */
  function methodOf(intent, card, email) {
    return paymentMethodSummary(
      intent.payment_method ?? newId('pm', 24),
      card,
      email,
      nowSeconds(),
    );
  }

  /**
   * Charge the intent's amount in full: the intent succeeds with a succeeded charge.
   * @param {FakePaymentIntent} intent
   * @param {TestCard} card
   * @param {string | null} email
   */
  function succeedIntent(intent, card, email) {
    const paymentMethodId = intent.payment_method ?? newId('pm', 24);
    const charge = chargeObject({ intent, card, paymentMethodId, email, created: nowSeconds() });
    state.charges.set(charge.id, charge);
    intent.payment_method = paymentMethodId;
    intent.status = 'succeeded';
    intent.amount_received = intent.amount;
    intent.latest_charge = charge.id;
    intent.last_payment_error = null;
    intent.next_action = null;
    if (email && !intent.receipt_email) intent.receipt_email = email;
    intentCards.delete(intent.id);
    return charge;
  }

  /**
   * @param {FakePaymentIntent} intent
   * @param {FakeLastPaymentError} error
   */
  function failIntent(intent, error) {
    intent.status = 'requires_payment_method';
    intent.last_payment_error = error;
    intent.next_action = null;
    intent.payment_method = null;
    intentCards.delete(intent.id);
  }

  /**
   * @param {string} paymentMethod
   * @returns {TestCard}
   */
  function cardForPaymentMethod(paymentMethod) {
    const card = TEST_CARDS_BY_PAYMENT_METHOD.get(paymentMethod);
    if (!card) {
      throw new StripeApiError(400, {
        type: 'invalid_request_error',
        code: 'resource_missing',
        message: `No such PaymentMethod: '${paymentMethod}'. The local payment fake knows the test PaymentMethods ${[...TEST_CARDS_BY_PAYMENT_METHOD.keys()].join(', ')}.`,
        param: 'payment_method',
      });
    }
    return card;
  }

  /**
   * Confirm through the API with a test PaymentMethod.
   * @param {FakePaymentIntent} intent
   * @param {TestCard} card
   * @param {string | null} returnUrl
   * @param {RequestContext} ctx
   */
  async function confirmIntent(intent, card, returnUrl, ctx) {
    intent.payment_method = newId('pm', 24);
    if (card.outcome === 'succeeds') {
      succeedIntent(intent, card, intent.receipt_email);
      await publish([recordEvent('payment_intent.succeeded', intent, ctx)]);
      return;
    }
    if (card.outcome === 'requires_authentication') {
      intent.status = 'requires_action';
      intent.next_action = {
        type: 'redirect_to_url',
        redirect_to_url: {
          url: `${publicBaseUrl}/pay/authenticate/${intent.id}`,
          return_url: returnUrl,
        },
      };
      intentCards.set(intent.id, card);
      return;
    }
    const error = declineError(card, methodOf(intent, card, intent.receipt_email));
    failIntent(intent, error);
    await publish([recordEvent('payment_intent.payment_failed', intent, ctx)]);
    throw new StripeApiError(402, {
      type: 'card_error',
      code: error.code,
      decline_code: error.decline_code,
      message: error.message,
      payment_intent: /** @type {Record<string, unknown>} */ (
        /** @type {unknown} */ (structuredClone(intent))
      ),
    });
  }

  /** @param {RouteInput} input */
  async function createPaymentIntent({ body, ctx }) {
    const amount = requiredInteger(body, 'amount', 'amount', { min: 1 });
    const currency = currencyParam(body, 'currency');
    checkAmountCeiling(amount, currency, 'amount');
    const customer = optionalString(body, 'customer') ?? null;
    if (customer !== null && !state.customers.has(customer)) {
      throw new StripeApiError(400, {
        type: 'invalid_request_error',
        code: 'resource_missing',
        message: `No such customer: '${customer}'`,
        param: 'customer',
      });
    }
    const receiptEmail = optionalString(body, 'receipt_email') ?? null;
    if (receiptEmail !== null && !looksLikeEmail(receiptEmail)) {
      throw invalidRequest(
        `Invalid email address: ${receiptEmail}`,
        'receipt_email',
        'email_invalid',
      );
    }
    const paymentMethod = optionalString(body, 'payment_method');
    const card = paymentMethod === undefined ? undefined : cardForPaymentMethod(paymentMethod);
    const confirm = optionalBoolean(body, 'confirm') ?? false;
    if (confirm && !card) {
      throw invalidRequest(
        'You cannot confirm this PaymentIntent because it is missing a payment method: pass payment_method.',
        'payment_method',
        'payment_intent_unexpected_state',
      );
    }
    const returnUrl = urlParam(body, 'return_url') ?? null;
    const intent = newIntent({
      amount,
      currency,
      customer,
      description: optionalString(body, 'description') ?? null,
      metadata: metadataParam(body, 'metadata'),
      receiptEmail,
    });
    if (card && confirm) {
      await confirmIntent(intent, card, returnUrl, ctx);
    } else if (card) {
      intent.status = 'requires_confirmation';
      intent.payment_method = newId('pm', 24);
      intentCards.set(intent.id, card);
    }
    return ok(intent, body);
  }

  /** @param {RouteInput} input */
  async function confirmPaymentIntent({ body, params, ctx }) {
    const intent = getIntent(params.id);
    if (!CONFIRMABLE.includes(intent.status)) {
      throw invalidRequest(
        `You cannot confirm this PaymentIntent because it has a status of ${intent.status}. Only a PaymentIntent with one of the following statuses may be confirmed: ${CONFIRMABLE.join(', ')}.`,
        undefined,
        'payment_intent_unexpected_state',
      );
    }
    const paymentMethod = optionalString(body, 'payment_method');
    const card =
      paymentMethod === undefined
        ? intentCards.get(intent.id)
        : cardForPaymentMethod(paymentMethod);
    if (!card) {
      throw invalidRequest(
        `You cannot confirm this PaymentIntent because it's missing a payment method. To confirm the PaymentIntent with ${intent.id}, specify a payment method.`,
        'payment_method',
        'payment_intent_unexpected_state',
      );
    }
    const returnUrl = urlParam(body, 'return_url') ?? null;
    await confirmIntent(intent, card, returnUrl, ctx);
    return ok(intent, body);
  }

  /** @param {RouteInput} input */
  function cancelPaymentIntent({ body, params }) {
    const intent = getIntent(params.id);
    if (!CANCELABLE.includes(intent.status)) {
      throw invalidRequest(
        `You cannot cancel this PaymentIntent because it has a status of ${intent.status}. Only a PaymentIntent with one of the following statuses may be canceled: ${CANCELABLE.join(', ')}.`,
        undefined,
        'payment_intent_unexpected_state',
      );
    }
    const reason = optionalString(body, 'cancellation_reason') ?? null;
    if (reason !== null && !CANCELLATION_REASONS.includes(reason)) {
      throw invalidRequest(
        `Invalid cancellation_reason: must be one of ${CANCELLATION_REASONS.join(', ')}`,
        'cancellation_reason',
      );
    }
    intent.status = 'canceled';
    intent.canceled_at = nowSeconds();
    intent.cancellation_reason = reason;
    intent.next_action = null;
    intentCards.delete(intent.id);
    return ok(intent, body);
  }

  // ---------------------------------------------------------------- refunds

  /** @param {RouteInput} input */
  async function createRefund({ body, ctx }) {
    const intentId = optionalString(body, 'payment_intent');
    const chargeId = optionalString(body, 'charge');
    if (intentId === undefined && chargeId === undefined) {
      throw invalidRequest(
        'One of the following params should be provided for this request: payment_intent or charge.',
        undefined,
        'parameter_missing',
      );
    }
    /** @type {FakeCharge | undefined} */
    let charge;
    if (chargeId !== undefined) {
      charge = state.charges.get(chargeId);
      if (!charge) {
        throw new StripeApiError(400, {
          type: 'invalid_request_error',
          code: 'resource_missing',
          message: `No such charge: '${chargeId}'`,
          param: 'charge',
        });
      }
      if (intentId !== undefined && charge.payment_intent !== intentId) {
        throw invalidRequest(
          `Charge ${chargeId} does not belong to PaymentIntent ${intentId}.`,
          'payment_intent',
        );
      }
    } else {
      const id = /** @type {string} */ (intentId);
      const intent = state.paymentIntents.get(id);
      if (!intent) {
        throw new StripeApiError(400, {
          type: 'invalid_request_error',
          code: 'resource_missing',
          message: `No such payment_intent: '${id}'`,
          param: 'payment_intent',
        });
      }
      charge = intent.latest_charge ? state.charges.get(intent.latest_charge) : undefined;
      if (intent.status !== 'succeeded' || !charge) {
        throw invalidRequest(
          `This PaymentIntent (${id}) does not have a successful charge to refund.`,
          'payment_intent',
        );
      }
    }
    const remaining = charge.amount - charge.amount_refunded;
    if (remaining <= 0) {
      throw invalidRequest(
        `Charge ${charge.id} has already been refunded.`,
        undefined,
        'charge_already_refunded',
      );
    }
    const amount = optionalInteger(body, 'amount', 'amount', { min: 1 }) ?? remaining;
    if (amount > remaining) {
      throw invalidRequest(
        `Refund amount (${formatMinorUnits(amount, charge.currency)}) is greater than unrefunded amount on charge (${formatMinorUnits(remaining, charge.currency)})`,
        'amount',
      );
    }
    const reason = optionalString(body, 'reason') ?? null;
    if (reason !== null && !REFUND_REASONS.includes(reason)) {
      throw invalidRequest(`Invalid reason: must be one of ${REFUND_REASONS.join(', ')}`, 'reason');
    }
    const refund = refundObject({
      charge,
      amount,
      reason,
      metadata: metadataParam(body, 'metadata'),
      created: nowSeconds(),
    });
    state.refunds.set(refund.id, refund);
    // Checked and applied before any await, so concurrent refunds can never add up past the
    // charge.
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded === charge.amount;
    await publish([recordEvent('charge.refunded', charge, ctx)]);
    return ok(refund, body);
  }

  // ---------------------------------------------------------------- the payment page

  /**
   * @param {FakeCheckoutSession} session
   * @returns {import('./payment-page.js').PageSession}
   */
  function pageSession(session) {
    const wanted = session.locale && session.locale !== 'auto' ? session.locale : 'en-GB';
    const locale = Intl.NumberFormat.supportedLocalesOf([wanted]).length > 0 ? wanted : 'en-GB';
    return {
      id: session.id,
      currency: session.currency,
      amountTotal: session.amount_total,
      customerEmail: fixedEmail(session),
      cancelUrl: session.cancel_url,
      successUrl: session.success_url,
      expiresAt: session.expires_at,
      locale,
      lineItems: (state.lineItems.get(session.id) ?? []).map((item) => ({
        name: item.description,
        quantity: item.quantity,
        unitAmount: item.price.unit_amount,
        amountTotal: item.amount_total,
      })),
    };
  }

  /**
   * The e-mail the shop already gave: `customer_email`, or the e-mail of `customer`.
   * @param {FakeCheckoutSession} session
   * @returns {string | null}
   */
  function fixedEmail(session) {
    if (session.customer_email) return session.customer_email;
    return session.customer ? (state.customers.get(session.customer)?.email ?? null) : null;
  }

  /** @param {FakeCheckoutSession} session */
  function successUrlFor(session) {
    return session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id);
  }

  /**
   * The PaymentIntent this session's page pays through: made on the first card attempt,
   * reused after a decline.
   * @param {FakeCheckoutSession} session
   * @param {string} email
   */
  function attemptIntent(session, email) {
    const attempt = attempts.get(session.id);
    const existing = attempt ? state.paymentIntents.get(attempt.paymentIntentId) : undefined;
    if (attempt && existing && CONFIRMABLE.includes(existing.status)) {
      attempt.email = email;
      existing.receipt_email = email;
      return existing;
    }
    const data = intentDataBySession.get(session.id) ?? { metadata: {}, description: null };
    const intent = newIntent({
      amount: session.amount_total,
      currency: session.currency,
      customer: session.customer,
      description: data.description,
      metadata: { ...data.metadata },
      receiptEmail: email,
    });
    attempts.set(session.id, { paymentIntentId: intent.id, email });
    return intent;
  }

  /**
   * @param {FakeCheckoutSession} session
   * @param {FakePaymentIntent} intent
   * @param {TestCard} card
   * @param {string} email
   */
  async function completeSession(session, intent, card, email) {
    // Every state change happens before the first await: a second click sees a paid session.
    succeedIntent(intent, card, email);
    session.status = 'complete';
    session.payment_status = 'paid';
    session.payment_intent = intent.id;
    session.customer_details = {
      address: null,
      email,
      name: null,
      phone: null,
      tax_exempt: 'none',
      tax_ids: [],
    };
    attempts.delete(session.id);
    const events = [
      recordEvent('checkout.session.completed', session),
      recordEvent('payment_intent.succeeded', intent),
    ];
    await publish(events);
  }

  /**
   * @param {string} id
   * @returns {Promise<{ session: FakeCheckoutSession } | { response: Response }>}
   */
  async function openSessionForPage(id) {
    const session = state.checkoutSessions.get(id);
    if (!session) return { response: htmlResponse(renderNotFoundPage(id), 404) };
    await expireIfDue(session);
    if (session.status === 'expired') {
      return {
        response: htmlResponse(
          renderClosedPage({ session: pageSession(session), status: 'expired' }),
          410,
        ),
      };
    }
    return { session };
  }

  /**
   * @param {Request} request
   * @returns {Promise<URLSearchParams>}
   */
  async function readForm(request) {
    return new URLSearchParams(await request.text());
  }

  /** @type {import('msw').HttpResponseResolver<{ sessionId: string }>} */
  async function showPaymentPage({ params }) {
    const opened = await openSessionForPage(params.sessionId);
    if ('response' in opened) return opened.response;
    const { session } = opened;
    if (session.status === 'complete') {
      return htmlResponse(renderClosedPage({ session: pageSession(session), status: 'complete' }));
    }
    return htmlResponse(renderCheckoutPage({ session: pageSession(session) }));
  }

  /** @type {import('msw').HttpResponseResolver<{ sessionId: string }>} */
  async function submitPaymentPage({ request, params }) {
    const form = await readForm(request);
    const opened = await openSessionForPage(params.sessionId);
    if ('response' in opened) return opened.response;
    const { session } = opened;
    // Paid already (a second click, or the back button): go where the first payment went.
    if (session.status === 'complete') return seeOther(successUrlFor(session));

    const email = fixedEmail(session) ?? (form.get('email') ?? '').trim();
    const cardNumber = (form.get('card_number') ?? '').trim();
    const digits = cardNumber.replace(/[\s-]/g, '');
    const again = (
      /** @type {number} */ status,
      /** @type {string} */ title,
      /** @type {string} */ detail,
    ) =>
      htmlResponse(
        renderCheckoutPage({
          session: pageSession(session),
          email,
          cardNumber,
          error: { title, detail },
        }),
        status,
      );

    if (!looksLikeEmail(email)) {
      return again(
        400,
        'Check the e-mail address.',
        ' Enter the address the receipt should go to, like name@example.com.',
      );
    }
    if (digits === '') {
      return again(400, 'Enter a card number.', ' Use one of the test cards listed below.');
    }
    if (!/^\d{12,19}$/.test(digits) || !passesLuhn(digits)) {
      return again(
        400,
        'Your card number is incorrect.',
        ' Check the digits, or use one of the test cards listed below.',
      );
    }
    const card = TEST_CARDS_BY_NUMBER.get(digits);
    if (!card) {
      return again(
        402,
        'Your card was declined.',
        ' This page accepts only the test cards listed below; nothing was charged.',
      );
    }

    const intent = attemptIntent(session, email);
    intent.payment_method = newId('pm', 24);
    if (card.outcome === 'succeeds') {
      await completeSession(session, intent, card, email);
      return seeOther(successUrlFor(session));
    }
    if (card.outcome === 'requires_authentication') {
      intent.status = 'requires_action';
      intent.next_action = {
        type: 'use_stripe_sdk',
        use_stripe_sdk: { type: 'three_d_secure_redirect' },
      };
      intentCards.set(intent.id, card);
      return htmlResponse(renderAuthenticationPage({ session: pageSession(session), email }));
    }
    const error = declineError(card, methodOf(intent, card, email));
    failIntent(intent, error);
    await publish([recordEvent('payment_intent.payment_failed', intent)]);
    const reason = (card.declineCode ?? 'generic_decline').replaceAll('_', ' ');
    return again(
      402,
      error.message,
      ` Reason: ${reason}. Nothing was charged; the payment is still open, so you can try another card.`,
    );
  }

  /** @type {import('msw').HttpResponseResolver<{ sessionId: string }>} */
  async function submitAuthentication({ request, params }) {
    const form = await readForm(request);
    const opened = await openSessionForPage(params.sessionId);
    if ('response' in opened) return opened.response;
    const { session } = opened;
    if (session.status === 'complete') return seeOther(successUrlFor(session));
    const view = pageSession(session);
    const attempt = attempts.get(session.id);
    const intent = attempt ? state.paymentIntents.get(attempt.paymentIntentId) : undefined;
    const card = intent ? intentCards.get(intent.id) : undefined;
    if (!attempt || !intent || !card || intent.status !== 'requires_action') {
      return htmlResponse(
        renderCheckoutPage({
          session: view,
          error: {
            title: 'Nothing is waiting for authentication.',
            detail: ' Enter the card again.',
          },
        }),
        409,
      );
    }
    const outcome = form.get('outcome');
    if (outcome === 'complete') {
      await completeSession(session, intent, card, attempt.email);
      return seeOther(successUrlFor(session));
    }
    if (outcome === 'fail') {
      const error = authenticationError(methodOf(intent, card, attempt.email));
      failIntent(intent, error);
      await publish([recordEvent('payment_intent.payment_failed', intent)]);
      return htmlResponse(
        renderCheckoutPage({
          session: view,
          email: attempt.email,
          error: {
            title: 'We are unable to authenticate your payment method.',
            detail:
              ' The bank check failed, so nothing was charged. Choose another card and try again.',
          },
        }),
        402,
      );
    }
    return htmlResponse(renderAuthenticationPage({ session: view, email: attempt.email }), 400);
  }

  /**
   * @param {string} intentId
   * @returns {Response}
   */
  function intentAuthenticationPage(intentId) {
    const intent = state.paymentIntents.get(intentId);
    if (!intent) return htmlResponse(renderNotFoundPage(intentId), 404);
    if (intent.status !== 'requires_action') {
      return htmlResponse(
        renderIntentAuthenticationPage({
          intentId: intent.id,
          amount: intent.amount,
          currency: intent.currency,
          done: `This payment is not waiting for authentication (status: ${intent.status}).`,
        }),
      );
    }
    return htmlResponse(
      renderIntentAuthenticationPage({
        intentId: intent.id,
        amount: intent.amount,
        currency: intent.currency,
      }),
    );
  }

  /** @type {import('msw').HttpResponseResolver<{ intentId: string }>} */
  async function submitIntentAuthentication({ request, params }) {
    const form = await readForm(request);
    const intent = state.paymentIntents.get(params.intentId);
    if (!intent) return htmlResponse(renderNotFoundPage(params.intentId), 404);
    const card = intentCards.get(intent.id);
    if (intent.status !== 'requires_action' || !card) return intentAuthenticationPage(intent.id);
    const outcome = form.get('outcome');
    if (outcome !== 'complete' && outcome !== 'fail') {
      return htmlResponse(
        renderIntentAuthenticationPage({
          intentId: intent.id,
          amount: intent.amount,
          currency: intent.currency,
        }),
        400,
      );
    }
    const returnUrl = intent.next_action?.redirect_to_url?.return_url ?? null;
    if (outcome === 'complete') {
      succeedIntent(intent, card, intent.receipt_email);
      await publish([recordEvent('payment_intent.succeeded', intent)]);
    } else {
      failIntent(intent, authenticationError(methodOf(intent, card, intent.receipt_email)));
      await publish([recordEvent('payment_intent.payment_failed', intent)]);
    }
    if (returnUrl) {
      const target = new URL(returnUrl);
      target.searchParams.set('payment_intent', intent.id);
      target.searchParams.set('payment_intent_client_secret', intent.client_secret ?? '');
      target.searchParams.set('redirect_status', outcome === 'complete' ? 'succeeded' : 'failed');
      return seeOther(target.href);
    }
    return htmlResponse(
      renderIntentAuthenticationPage({
        intentId: intent.id,
        amount: intent.amount,
        currency: intent.currency,
        done:
          outcome === 'complete'
            ? 'Authentication completed: the payment succeeded.'
            : 'Authentication failed: nothing was charged.',
      }),
    );
  }

  // ---------------------------------------------------------------- handlers

  /**
   * @param {string} kind
   * @param {Map<string, object>} map
   * @returns {(input: RouteInput) => RouteResult}
   */
  const retrieveFrom =
    (kind, map) =>
    ({ body, params }) => {
      const found = map.get(params.id);
      if (!found) throw noSuch(kind, params.id);
      return ok(found, body);
    };

  const handlers = [
    apiRoute('post', '/v1/customers', createCustomer),
    apiRoute('get', '/v1/customers/:id', retrieveFrom('customer', state.customers)),
    apiRoute('post', '/v1/checkout/sessions', createCheckoutSession),
    apiRoute('get', '/v1/checkout/sessions/:id/line_items', listSessionLineItems),
    apiRoute('post', '/v1/checkout/sessions/:id/expire', expireCheckoutSession),
    apiRoute('get', '/v1/checkout/sessions/:id', retrieveCheckoutSession),
    apiRoute('post', '/v1/payment_intents', createPaymentIntent),
    apiRoute('post', '/v1/payment_intents/:id/confirm', confirmPaymentIntent),
    apiRoute('post', '/v1/payment_intents/:id/cancel', cancelPaymentIntent),
    apiRoute('get', '/v1/payment_intents/:id', ({ body, params }) =>
      ok(getIntent(params.id), body),
    ),
    apiRoute('post', '/v1/refunds', createRefund),
    apiRoute('get', '/v1/refunds/:id', retrieveFrom('refund', state.refunds)),
    apiRoute('get', '/v1/charges/:id', retrieveFrom('charge', state.charges)),
    apiRoute('get', '/v1/events/:id', retrieveFrom('event', state.events)),
    // Anything else under /v1 is an endpoint this fake does not implement: answer like the
    // service does for an unknown URL rather than letting the request reach the network.
    http.all('*/v1/*', ({ request }) => {
      const { pathname } = new URL(request.url);
      return HttpResponse.json(
        {
          error: {
            type: 'invalid_request_error',
            message: `Unrecognized request URL (${request.method}: ${pathname}). The local payment fake implements only the endpoints listed in docker-free-scripts/payment-fake.`,
          },
        },
        { status: 404 },
      );
    }),
    http.get('*/pay/authenticate/:intentId', ({ params }) =>
      intentAuthenticationPage(String(params.intentId)),
    ),
    http.post('*/pay/authenticate/:intentId', submitIntentAuthentication),
    http.get('*/pay/:sessionId', showPaymentPage),
    http.post('*/pay/:sessionId', submitPaymentPage),
    http.post('*/pay/:sessionId/authenticate', submitAuthentication),
  ];

  return { handlers, state, reset, emit, redeliver, expireDueSessions, publicBaseUrl };
}
