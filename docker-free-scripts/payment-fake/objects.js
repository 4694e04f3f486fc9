// @ts-check
/**
 * The payment service's objects as the fake builds them: pure functions from clean fields to
 * the shapes in the API reference and the `stripe` SDK's types (Customer, Checkout Session,
 * LineItem with its Price, PaymentIntent, Charge, Refund). No state here.
 */
import { newId } from './ids.js';
import { formatMinorUnits } from './money.js';
import {
  currencyParam,
  isRecord,
  optionalString,
  requiredInteger,
  requiredString,
} from './params.js';
import { invalidRequest, missingParam } from './stripe-errors.js';

/** @typedef {import('./index.js').FakeCustomer} FakeCustomer */
/** @typedef {import('./index.js').FakeCheckoutSession} FakeCheckoutSession */
/** @typedef {import('./index.js').FakeLineItem} FakeLineItem */
/** @typedef {import('./index.js').FakePaymentIntent} FakePaymentIntent */
/** @typedef {import('./index.js').FakeCharge} FakeCharge */
/** @typedef {import('./index.js').FakeRefund} FakeRefund */
/** @typedef {import('./index.js').FakeCardDetails} FakeCardDetails */
/** @typedef {import('./index.js').FakePaymentMethodSummary} FakePaymentMethodSummary */
/** @typedef {import('./index.js').FakeLastPaymentError} FakeLastPaymentError */
/** @typedef {import('./index.js').TestCard} TestCard */

// Stripe docs, "Supported currencies → Minimum and maximum charge amounts": amounts are at
// most eight digits of minor units (from memory).
export const MAX_AMOUNT = 99_999_999;

/**
 * @param {number} amount
 * @param {string} currency
 * @param {string} param
 */
export function checkAmountCeiling(amount, currency, param) {
  if (amount > MAX_AMOUNT) {
    throw invalidRequest(
      `Amount must be no more than ${formatMinorUnits(MAX_AMOUNT, currency)}`,
      param,
      'amount_too_large',
    );
  }
}

/**
 * @param {{ email: string | null, name: string | null, phone: string | null,
 *   description: string | null, metadata: Record<string, string>, created: number }} fields
 * @returns {FakeCustomer}
 */
export function customerObject(fields) {
  return {
    id: newId('cus', 14),
    object: 'customer',
    address: null,
    balance: 0,
    created: fields.created,
    currency: null,
    default_source: null,
    delinquent: false,
    description: fields.description,
    discount: null,
    email: fields.email,
    invoice_settings: {
      custom_fields: null,
      default_payment_method: null,
      footer: null,
      rendering_options: null,
    },
    livemode: false,
    metadata: fields.metadata,
    name: fields.name,
    phone: fields.phone,
    preferred_locales: [],
    shipping: null,
    tax_exempt: 'none',
    test_clock: null,
  };
}

/**
 * One `line_items[i]` entry with inline `price_data` (the fake keeps no Price or Product
 * objects), checked and converted to a LineItem.
 * @param {unknown} raw
 * @param {number} index
 * @param {number} created
 * @returns {FakeLineItem}
 */
export function lineItemFromParams(raw, index, created) {
  const name = `line_items[${index}]`;
  if (!isRecord(raw)) throw invalidRequest(`Invalid object`, name);
  if (raw.price !== undefined && raw.price !== '') {
    throw invalidRequest(
      `No such price: '${String(raw.price)}'. The local payment fake has no stored prices: use ${name}[price_data].`,
      `${name}[price]`,
      'resource_missing',
    );
  }
  const priceData = raw.price_data;
  if (!isRecord(priceData)) throw missingParam(`${name}[price_data]`);
  if (priceData.product !== undefined) {
    throw invalidRequest(
      `No such product: '${String(priceData.product)}'. The local payment fake has no stored products: use ${name}[price_data][product_data].`,
      `${name}[price_data][product]`,
      'resource_missing',
    );
  }
  const currency = currencyParam(priceData, 'currency', `${name}[price_data][currency]`);
  const unitAmountParam = `${name}[price_data][unit_amount]`;
  const unitAmount = requiredInteger(priceData, 'unit_amount', unitAmountParam, { min: 0 });
  checkAmountCeiling(unitAmount, currency, unitAmountParam);
  const productData = priceData.product_data;
  if (!isRecord(productData)) throw missingParam(`${name}[price_data][product_data]`);
  const productName = requiredString(
    productData,
    'name',
    `${name}[price_data][product_data][name]`,
  );
  const quantity = requiredInteger(raw, 'quantity', `${name}[quantity]`, { min: 1 });
  const amount = unitAmount * quantity;
  checkAmountCeiling(amount, currency, `${name}[quantity]`);
  const taxBehavior = optionalString(
    priceData,
    'tax_behavior',
    `${name}[price_data][tax_behavior]`,
  );
  return {
    id: newId('li', 24),
    object: 'item',
    adjustable_quantity: null,
    amount_discount: 0,
    amount_subtotal: amount,
    amount_tax: 0,
    amount_total: amount,
    currency,
    description: productName,
    metadata: {},
    price: {
      id: newId('price', 24),
      object: 'price',
      active: false,
      billing_scheme: 'per_unit',
      created,
      currency,
      custom_unit_amount: null,
      livemode: false,
      lookup_key: null,
      metadata: {},
      nickname: null,
      product: newId('prod', 14),
      recurring: null,
      tax_behavior: taxBehavior ?? 'unspecified',
      tiers_mode: null,
      transform_quantity: null,
      type: 'one_time',
      unit_amount: unitAmount,
      unit_amount_decimal: String(unitAmount),
    },
    quantity,
  };
}

/**
 * @param {{ publicBaseUrl: string, created: number, amountTotal: number, currency: string,
 *   cancelUrl: string | null, successUrl: string, clientReferenceId: string | null,
 *   customer: string | null, customerEmail: string | null, expiresAt: number,
 *   locale: string | null, metadata: Record<string, string> }} fields
 * @returns {FakeCheckoutSession}
 */
export function checkoutSessionObject(fields) {
  // Test-mode session ids are long: cs_test_ and 58 characters.
  const id = newId('cs_test', 58);
  return {
    id,
    object: 'checkout.session',
    after_expiration: null,
    allow_promotion_codes: null,
    amount_subtotal: fields.amountTotal,
    amount_total: fields.amountTotal,
    automatic_tax: { enabled: false, liability: null, status: null },
    billing_address_collection: null,
    cancel_url: fields.cancelUrl,
    client_reference_id: fields.clientReferenceId,
    client_secret: null,
    created: fields.created,
    currency: fields.currency,
    customer: fields.customer,
    customer_creation: fields.customer ? null : 'if_required',
    customer_details: null,
    customer_email: fields.customerEmail,
    expires_at: fields.expiresAt,
    invoice: null,
    livemode: false,
    locale: fields.locale,
    metadata: fields.metadata,
    mode: 'payment',
    payment_intent: null,
    payment_link: null,
    payment_method_collection: 'if_required',
    payment_method_types: ['card'],
    payment_status: 'unpaid',
    setup_intent: null,
    shipping_address_collection: null,
    shipping_cost: null,
    status: 'open',
    submit_type: null,
    subscription: null,
    success_url: fields.successUrl,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: 'hosted_page',
    url: `${fields.publicBaseUrl}/pay/${id}`,
  };
}

/**
 * @param {{ amount: number, currency: string, customer: string | null,
 *   description: string | null, metadata: Record<string, string>,
 *   receiptEmail: string | null, created: number }} fields
 * @returns {FakePaymentIntent}
 */
export function paymentIntentObject(fields) {
  const id = newId('pi', 24);
  return {
    id,
    object: 'payment_intent',
    amount: fields.amount,
    amount_capturable: 0,
    amount_received: 0,
    application: null,
    application_fee_amount: null,
    automatic_payment_methods: null,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: 'automatic',
    client_secret: `${id}_secret_${newId('s', 24).slice(2)}`,
    confirmation_method: 'automatic',
    created: fields.created,
    currency: fields.currency,
    customer: fields.customer,
    description: fields.description,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: fields.metadata,
    next_action: null,
    on_behalf_of: null,
    payment_method: null,
    payment_method_options: null,
    payment_method_types: ['card'],
    processing: null,
    receipt_email: fields.receiptEmail,
    review: null,
    setup_future_usage: null,
    shipping: null,
    source: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: 'requires_payment_method',
    transfer_data: null,
    transfer_group: null,
  };
}

/**
 * @param {TestCard} card
 * @param {number} year the current year; test cards get an expiry three years ahead
 * @returns {FakeCardDetails}
 */
export function cardDetails(card, year) {
  return {
    brand: 'visa',
    country: 'US',
    exp_month: 12,
    exp_year: year + 3,
    funding: 'credit',
    last4: card.number.slice(-4),
    network: 'visa',
  };
}

/**
 * @param {string} id
 * @param {TestCard} card
 * @param {string | null} email
 * @param {number} created
 * @returns {FakePaymentMethodSummary}
 */
export function paymentMethodSummary(id, card, email, created) {
  return {
    id,
    object: 'payment_method',
    billing_details: { address: null, email, name: null, phone: null },
    card: cardDetails(card, new Date(created * 1000).getUTCFullYear()),
    created,
    customer: null,
    livemode: false,
    metadata: {},
    type: 'card',
  };
}

/**
 * A succeeded, captured charge for the whole of an intent.
 * @param {{ intent: FakePaymentIntent, card: TestCard, paymentMethodId: string,
 *   email: string | null, created: number }} fields
 * @returns {FakeCharge}
 */
export function chargeObject({ intent, card, paymentMethodId, email, created }) {
  return {
    id: newId('ch', 24),
    object: 'charge',
    amount: intent.amount,
    amount_captured: intent.amount,
    amount_refunded: 0,
    application: null,
    application_fee: null,
    application_fee_amount: null,
    balance_transaction: newId('txn', 24),
    billing_details: { address: null, email, name: null, phone: null },
    calculated_statement_descriptor: null,
    captured: true,
    created,
    currency: intent.currency,
    customer: intent.customer,
    description: intent.description,
    disputed: false,
    failure_balance_transaction: null,
    failure_code: null,
    failure_message: null,
    fraud_details: {},
    livemode: false,
    metadata: { ...intent.metadata },
    on_behalf_of: null,
    outcome: {
      network_status: 'approved_by_network',
      reason: null,
      risk_level: 'normal',
      seller_message: 'Payment complete.',
      type: 'authorized',
    },
    paid: true,
    payment_intent: intent.id,
    payment_method: paymentMethodId,
    payment_method_details: {
      type: 'card',
      card: cardDetails(card, new Date(created * 1000).getUTCFullYear()),
    },
    receipt_email: email,
    receipt_number: null,
    receipt_url: null,
    refunded: false,
    review: null,
    shipping: null,
    source: null,
    source_transfer: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: 'succeeded',
    transfer_data: null,
    transfer_group: null,
  };
}

/**
 * @param {{ charge: FakeCharge, amount: number, reason: string | null,
 *   metadata: Record<string, string>, created: number }} fields
 * @returns {FakeRefund}
 */
export function refundObject({ charge, amount, reason, metadata, created }) {
  return {
    id: newId('re', 24),
    object: 'refund',
    amount,
    balance_transaction: newId('txn', 24),
    charge: charge.id,
    created,
    currency: charge.currency,
    metadata,
    payment_intent: charge.payment_intent,
    reason,
    receipt_number: null,
    source_transfer_reversal: null,
    status: 'succeeded',
    transfer_reversal: null,
  };
}

/**
 * `last_payment_error` after a declining test card (Stripe docs, "Test card numbers").
 * @param {TestCard} card
 * @param {FakePaymentMethodSummary} paymentMethod
 * @returns {FakeLastPaymentError}
 */
export function declineError(card, paymentMethod) {
  return {
    type: 'card_error',
    code: card.code ?? 'card_declined',
    decline_code: card.declineCode ?? 'generic_decline',
    message: card.message ?? 'Your card was declined.',
    payment_method: paymentMethod,
  };
}

/**
 * `last_payment_error` after the customer fails the bank's authentication step.
 * @param {FakePaymentMethodSummary} paymentMethod
 * @returns {FakeLastPaymentError}
 */
export function authenticationError(paymentMethod) {
  return {
    type: 'invalid_request_error',
    code: 'payment_intent_authentication_failure',
    message:
      'The provided PaymentMethod has failed authentication. You can provide payment_method_data or a new PaymentMethod to attempt to fulfill this PaymentIntent again.',
    payment_method: paymentMethod,
  };
}
