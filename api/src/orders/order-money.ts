import { ConflictException } from '@nestjs/common';
import {
  EventDatePassedError,
  OrderStatus,
  quoteFromSnapshot,
  type IsoDate,
  type OrderDetail,
  type OrderMoney,
  type PaymentKind,
} from '@nappe/shared';
import type { PaymentEntity } from '../payments/entities/payment.entity.js';
import type { OrderEntity } from './entities/order.entity.js';

/**
 * The order's money, read from its ledger. "Received" counts settled payments in; refunds
 * count once settled, and a refund still pending (reserved, not yet confirmed by the payment
 * service) already counts against what can be refunded again — so two refunds can never
 * together exceed what was paid.
 */
export interface LedgerSummary {
  receivedMinor: number;
  refundedMinor: number;
  pendingRefundMinor: number;
}

export function summarizeLedger(payments: readonly PaymentEntity[]): LedgerSummary {
  let receivedMinor = 0;
  let refundedMinor = 0;
  let pendingRefundMinor = 0;
  for (const p of payments) {
    if (p.kind === 'refund') {
      if (p.status === 'succeeded') refundedMinor += p.amountMinor;
      else if (p.status === 'pending') pendingRefundMinor += p.amountMinor;
    } else if (p.status === 'succeeded') {
      receivedMinor += p.amountMinor;
    }
  }
  return { receivedMinor, refundedMinor, pendingRefundMinor };
}

/** Paid and not refunded (settled refunds only): what the client sees as paid. */
export function paidMinorOf(ledger: LedgerSummary): number {
  return ledger.receivedMinor - ledger.refundedMinor;
}

/** The order's money as the shared refund and re-quote rules take it. */
export function orderMoneyOf(order: OrderEntity, ledger: LedgerSummary): OrderMoney {
  const paidMinor = Math.max(
    0,
    ledger.receivedMinor - ledger.refundedMinor - ledger.pendingRefundMinor,
  );
  return {
    pricing: order.pricing,
    eventDate: order.eventDate,
    guestCount: order.guestCount,
    paidMinor,
    retainedMinor: Math.min(order.retainedMinor, paidMinor),
  };
}

const LIVE: readonly OrderStatus[] = [
  OrderStatus.PendingPayment,
  OrderStatus.Requested,
  OrderStatus.Confirmed,
];
const BOOKED: readonly OrderStatus[] = [OrderStatus.Requested, OrderStatus.Confirmed];

export function isLive(status: OrderStatus): boolean {
  return LIVE.includes(status);
}

export function isBooked(status: OrderStatus): boolean {
  return BOOKED.includes(status);
}

/** paid − kept under the policy: what counts towards the total. */
export function creditOf(order: OrderEntity, ledger: LedgerSummary): number {
  const money = orderMoneyOf(order, ledger);
  return money.paidMinor - (money.retainedMinor ?? 0);
}

/** Still to pay; 0 once the order is closed. */
export function balanceOf(order: OrderEntity, ledger: LedgerSummary): number {
  if (!isLive(order.status)) return 0;
  return Math.max(0, order.totalMinor - creditOf(order, ledger));
}

/**
 * What must have been paid by today: the deposit of the quote at today's date, which is the
 * whole total once the balance is due. Null once the event date has passed.
 */
export function requiredByToday(order: OrderEntity, today: IsoDate): number | null {
  try {
    return quoteFromSnapshot(order.pricing, {
      guestCount: order.guestCount,
      eventDate: order.eventDate,
      today,
    }).depositMinor;
  } catch (error) {
    if (error instanceof EventDatePassedError) return null;
    throw error;
  }
}

export type PayAction = OrderDetail['actions']['pay'];

export function payActionFor(order: OrderEntity, ledger: LedgerSummary, today: IsoDate): PayAction {
  if (order.status === OrderStatus.PendingPayment) {
    return requiredByToday(order, today) === null ? null : 'deposit_or_full';
  }
  if (!isBooked(order.status)) return null;
  const required = requiredByToday(order, today);
  if (required === null) return null;
  const credit = creditOf(order, ledger);
  if (credit < required) return 'top_up';
  return order.totalMinor - credit > 0 ? 'balance' : null;
}

export type CheckoutPlan = 'deposit' | 'full' | 'balance' | 'top_up';

/** The amount a checkout of `plan` collects now, or a 409 saying why it cannot be paid. */
export function amountToPay(
  order: OrderEntity,
  ledger: LedgerSummary,
  plan: CheckoutPlan,
  today: IsoDate,
): { kind: PaymentKind; amountMinor: number } {
  const required = requiredByToday(order, today);
  if (required === null) throw conflict('The event date has passed, so it can no longer be paid.');
  if (order.status === OrderStatus.PendingPayment) {
    if (plan === 'deposit') return { kind: 'deposit', amountMinor: required };
    if (plan === 'full') return { kind: 'full', amountMinor: order.totalMinor };
    throw conflict('Pay the deposit or the full amount to book this event.');
  }
  if (!isBooked(order.status)) throw conflict('This booking is closed and cannot be paid.');
  const credit = creditOf(order, ledger);
  const balance = order.totalMinor - credit;
  if (plan === 'balance') {
    if (balance <= 0) throw conflict('This booking is paid in full.');
    return { kind: 'balance', amountMinor: balance };
  }
  if (plan === 'top_up') {
    const topUp = required - credit;
    if (topUp <= 0) throw conflict('Nothing more is due now.');
    return { kind: 'top_up', amountMinor: topUp };
  }
  throw conflict('The deposit is already paid; pay the balance instead.');
}

function conflict(message: string): ConflictException {
  return new ConflictException({ statusCode: 409, message, error: 'Conflict' });
}

export interface RefundSlice {
  payment: PaymentEntity;
  amountMinor: number;
}

/**
 * Splits a refund over the settled payments it comes back from, newest payment first, each up
 * to what is left of it (its amount minus its refunds, settled or pending). Throws when the
 * payments cannot cover it: a refund never exceeds what was paid.
 */
export function splitRefund(
  payments: readonly PaymentEntity[],
  amountMinor: number,
): RefundSlice[] {
  const refundedOf = new Map<string, number>();
  for (const p of payments) {
    if (
      p.kind === 'refund' &&
      p.refundOfPaymentId &&
      p.status !== 'failed' &&
      p.status !== 'expired'
    ) {
      refundedOf.set(
        p.refundOfPaymentId,
        (refundedOf.get(p.refundOfPaymentId) ?? 0) + p.amountMinor,
      );
    }
  }
  const sources = payments
    .filter((p) => p.kind !== 'refund' && p.status === 'succeeded')
    .sort(
      (a, b) =>
        (b.settledAt?.getTime() ?? 0) - (a.settledAt?.getTime() ?? 0) || b.id.localeCompare(a.id),
    );
  const slices: RefundSlice[] = [];
  let left = amountMinor;
  for (const payment of sources) {
    if (left === 0) break;
    const remaining = payment.amountMinor - (refundedOf.get(payment.id) ?? 0);
    if (remaining <= 0) continue;
    const take = Math.min(remaining, left);
    slices.push({ payment, amountMinor: take });
    left -= take;
  }
  if (left > 0) {
    throw conflict('That refund is more than what is left of the payments; nothing was refunded.');
  }
  return slices;
}
