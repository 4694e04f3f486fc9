// Types for the local payment fake (./index.js). Object shapes are the subset of the payment
// service's objects the fake produces; field names and meanings follow the `stripe` SDK types.
import type { HttpHandler } from 'msw';

export type Metadata = Record<string, string>;

/** What a `deliver` callback receives: the exact bytes, their signature header and the event. */
export interface WebhookDelivery {
  /** The JSON body exactly as signed. Verify this string, never a re-serialised object. */
  rawBody: string;
  /** The `Stripe-Signature` header value: `t=<unix>,v1=<hex>`. */
  signature: string;
  event: FakeEvent;
}

export interface PaymentFakeOptions {
  /** Where browsers reach the fake, e.g. `http://localhost:12111`; session urls start here. */
  publicBaseUrl: string;
  /** The app's webhook endpoint. Required unless `deliver` is given. */
  webhookUrl?: string;
  /** The endpoint signing secret, `whsec_…`, used as is for the HMAC. */
  webhookSecret: string;
  /** Hand each signed webhook to the test instead of POSTing it to `webhookUrl`. Awaited. */
  deliver?: (delivery: WebhookDelivery) => void | Promise<void>;
  /** Called after each delivery attempt (the server logs them). */
  onDelivery?: (record: DeliveryRecord) => void;
  /** Clock in epoch milliseconds; defaults to `Date.now`. */
  now?: () => number;
}

export interface DeliveryRecord {
  eventId: string;
  type: string;
  /** Epoch milliseconds of the attempt. */
  at: number;
  /** `'callback'` or the webhook URL. */
  target: string;
  ok: boolean;
  /** HTTP status from the webhook endpoint; null for callbacks and network failures. */
  status: number | null;
  error: string | null;
}

export interface IdempotencyEntry {
  path: string;
  fingerprint: string;
  createdAt: number;
  /** Null while the first request with this key is still running. */
  response: { status: number; body: unknown } | null;
}

export interface FakeCustomer {
  id: string;
  object: 'customer';
  address: null;
  balance: number;
  created: number;
  currency: string | null;
  default_source: null;
  delinquent: boolean;
  description: string | null;
  discount: null;
  email: string | null;
  invoice_settings: {
    custom_fields: null;
    default_payment_method: null;
    footer: null;
    rendering_options: null;
  };
  livemode: false;
  metadata: Metadata;
  name: string | null;
  phone: string | null;
  preferred_locales: string[];
  shipping: null;
  tax_exempt: 'none';
  test_clock: null;
}

export interface FakePrice {
  id: string;
  object: 'price';
  active: boolean;
  billing_scheme: 'per_unit';
  created: number;
  currency: string;
  custom_unit_amount: null;
  livemode: false;
  lookup_key: null;
  metadata: Metadata;
  nickname: null;
  product: string;
  recurring: null;
  tax_behavior: string;
  tiers_mode: null;
  transform_quantity: null;
  type: 'one_time';
  unit_amount: number;
  unit_amount_decimal: string;
}

export interface FakeLineItem {
  id: string;
  object: 'item';
  adjustable_quantity: null;
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  metadata: Metadata;
  price: FakePrice;
  quantity: number;
}

export interface FakeCustomerDetails {
  address: null;
  email: string | null;
  name: string | null;
  phone: string | null;
  tax_exempt: 'none';
  tax_ids: unknown[];
}

export interface FakeCheckoutSession {
  id: string;
  object: 'checkout.session';
  after_expiration: null;
  allow_promotion_codes: null;
  amount_subtotal: number;
  amount_total: number;
  automatic_tax: { enabled: boolean; liability: null; status: null };
  billing_address_collection: null;
  cancel_url: string | null;
  client_reference_id: string | null;
  client_secret: null;
  created: number;
  currency: string;
  customer: string | null;
  customer_creation: 'if_required' | null;
  customer_details: FakeCustomerDetails | null;
  customer_email: string | null;
  expires_at: number;
  invoice: null;
  livemode: false;
  locale: string | null;
  metadata: Metadata;
  mode: 'payment';
  /** Null until the session is paid. */
  payment_intent: string | null;
  payment_link: null;
  payment_method_collection: 'if_required';
  payment_method_types: string[];
  payment_status: 'paid' | 'unpaid';
  setup_intent: null;
  shipping_address_collection: null;
  shipping_cost: null;
  status: 'open' | 'complete' | 'expired';
  submit_type: null;
  subscription: null;
  success_url: string;
  total_details: { amount_discount: number; amount_shipping: number; amount_tax: number };
  ui_mode: 'hosted_page';
  url: string;
}

export interface FakePaymentMethodSummary {
  id: string;
  object: 'payment_method';
  billing_details: { address: null; email: string | null; name: null; phone: null };
  card: FakeCardDetails;
  created: number;
  customer: null;
  livemode: false;
  metadata: Metadata;
  type: 'card';
}

export interface FakeCardDetails {
  brand: string;
  country: string;
  exp_month: number;
  exp_year: number;
  funding: string;
  last4: string;
  network: string;
}

export interface FakeLastPaymentError {
  type: 'card_error' | 'invalid_request_error';
  code: string;
  decline_code?: string;
  message: string;
  payment_method: FakePaymentMethodSummary;
}

export type FakePaymentIntentStatus =
  | 'requires_payment_method'
  | 'requires_confirmation'
  | 'requires_action'
  | 'processing'
  | 'requires_capture'
  | 'succeeded'
  | 'canceled';

export interface FakeNextAction {
  type: 'redirect_to_url' | 'use_stripe_sdk';
  redirect_to_url?: { url: string; return_url: string | null };
  use_stripe_sdk?: Record<string, unknown>;
}

export interface FakePaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  application: null;
  application_fee_amount: null;
  automatic_payment_methods: null;
  canceled_at: number | null;
  cancellation_reason: string | null;
  capture_method: 'automatic';
  client_secret: string | null;
  confirmation_method: 'automatic';
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  last_payment_error: FakeLastPaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  next_action: FakeNextAction | null;
  on_behalf_of: null;
  payment_method: string | null;
  payment_method_options: null;
  payment_method_types: string[];
  processing: null;
  receipt_email: string | null;
  review: null;
  setup_future_usage: null;
  shipping: null;
  source: null;
  statement_descriptor: null;
  statement_descriptor_suffix: null;
  status: FakePaymentIntentStatus;
  transfer_data: null;
  transfer_group: null;
}

export interface FakeCharge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  application: null;
  application_fee: null;
  application_fee_amount: null;
  balance_transaction: string;
  billing_details: { address: null; email: string | null; name: null; phone: null };
  calculated_statement_descriptor: null;
  captured: boolean;
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  disputed: boolean;
  failure_balance_transaction: null;
  failure_code: null;
  failure_message: null;
  fraud_details: Record<string, string>;
  livemode: false;
  metadata: Metadata;
  on_behalf_of: null;
  outcome: {
    network_status: string;
    reason: null;
    risk_level: string;
    seller_message: string;
    type: string;
  };
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: { type: 'card'; card: FakeCardDetails };
  receipt_email: string | null;
  receipt_number: null;
  receipt_url: null;
  refunded: boolean;
  review: null;
  shipping: null;
  source: null;
  source_transfer: null;
  statement_descriptor: null;
  statement_descriptor_suffix: null;
  status: 'succeeded';
  transfer_data: null;
  transfer_group: null;
}

export interface FakeRefund {
  id: string;
  object: 'refund';
  amount: number;
  balance_transaction: string;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: string | null;
  receipt_number: null;
  source_transfer_reversal: null;
  status: 'succeeded';
  transfer_reversal: null;
}

export type FakeEventType =
  | 'checkout.session.completed'
  | 'checkout.session.expired'
  | 'payment_intent.succeeded'
  | 'payment_intent.payment_failed'
  | 'charge.refunded'
  | (string & {});

export interface FakeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  /** A snapshot of the object when the event happened. */
  data: { object: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: FakeEventType;
}

export interface PaymentFakeState {
  customers: Map<string, FakeCustomer>;
  checkoutSessions: Map<string, FakeCheckoutSession>;
  /** Line items by checkout session id. */
  lineItems: Map<string, FakeLineItem[]>;
  paymentIntents: Map<string, FakePaymentIntent>;
  charges: Map<string, FakeCharge>;
  refunds: Map<string, FakeRefund>;
  /** Every event, in the order it happened. */
  events: Map<string, FakeEvent>;
  /** Every delivery attempt, in order. */
  deliveries: DeliveryRecord[];
  idempotencyKeys: Map<string, IdempotencyEntry>;
}

export interface PaymentFake {
  /** msw handlers: `setupServer(...handlers)` or `createMiddleware(...handlers)`. */
  handlers: HttpHandler[];
  state: PaymentFakeState;
  /** Forget everything: objects, events, deliveries, idempotency keys. */
  reset(): void;
  /** Record and deliver an event by hand (an out-of-order or extra event). */
  emit(
    type: FakeEventType,
    object: object,
  ): Promise<{ event: FakeEvent; delivery: DeliveryRecord }>;
  /** Deliver a stored event again with the same id and body: a duplicate delivery. */
  redeliver(eventId: string): Promise<DeliveryRecord>;
  /** Expire every open session whose `expires_at` has passed; returns their ids. */
  expireDueSessions(nowMs?: number): Promise<string[]>;
  /** `publicBaseUrl` without a trailing slash. */
  publicBaseUrl: string;
}

export declare function createPaymentFake(options: PaymentFakeOptions): PaymentFake;

/** The API version events carry (the SDK's pinned version). */
export declare const API_VERSION: string;

/** `t=<timestamp>,v1=<HMAC-SHA256(secret, "${timestamp}.${rawBody}") as hex>` */
export declare function signWebhookPayload(
  rawBody: string,
  secret: string,
  timestamp: number,
): string;

export interface TestCard {
  number: string;
  paymentMethod: string;
  label: string;
  outcome: 'succeeds' | 'declined' | 'requires_authentication';
  code?: string;
  declineCode?: string;
  message?: string;
}

export declare const TEST_CARDS: readonly TestCard[];
export declare function passesLuhn(digits: string): boolean;

export declare function formatMinorUnits(amount: number, currency: string, locale?: string): string;
export declare function minorUnitExponent(currency: string): number;
export declare function minorUnitsToDecimalString(amount: number, currency: string): string;

/** "Local test payment — no real money moves" */
export declare const PAGE_TITLE: string;
export declare function escapeHtml(value: unknown): string;

export declare const PAYMENT_FAKE_DEFAULTS: Readonly<{
  port: number;
  host: string;
  publicBaseUrl: string;
  webhookUrl: string;
  webhookSecret: string;
}>;
