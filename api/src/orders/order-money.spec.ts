import { ConflictException } from '@nestjs/common';
import {
  DEFAULT_STUDIO_SETTINGS,
  OrderStatus,
  snapshotPricing,
  quoteFromSnapshot,
  type Menu,
} from '@nappe/shared';
import { describe, expect, it } from 'vitest';
import type { PaymentEntity } from '../payments/entities/payment.entity.js';
import type { OrderEntity } from './entities/order.entity.js';
import {
  amountToPay,
  balanceOf,
  payActionFor,
  splitRefund,
  summarizeLedger,
} from './order-money.js';

/** Test data: invented amounts. */
let n = 0;
function payment(overrides: Partial<PaymentEntity>): PaymentEntity {
  n += 1;
  return {
    id: `p${String(n).padStart(3, '0')}`,
    orderId: 'o1',
    kind: 'deposit',
    status: 'succeeded',
    amountMinor: 1000,
    currency: 'EUR',
    idempotencyKey: `k${n}`,
    providerSessionId: null,
    checkoutUrl: null,
    checkoutExpiresAt: null,
    providerPaymentIntentId: `pi_${n}`,
    providerRefundId: null,
    refundOfPaymentId: null,
    operation: null,
    targetGuestCount: null,
    failureMessage: null,
    seeded: false,
    createdAt: new Date('2026-03-01T10:00:00Z'),
    settledAt: new Date(`2026-03-0${Math.min(9, (n % 9) + 1)}T10:00:00Z`),
    updatedAt: new Date('2026-03-01T10:00:00Z'),
    ...overrides,
  };
}

const menu: Menu = {
  id: 'm1',
  name: 'Test menu',
  dessertIds: ['d1'],
  pricePerGuestMinor: 1200,
  minGuests: 1,
  maxGuests: 100,
  leadDays: 0,
  active: true,
};

function order(status: OrderStatus, guestCount = 20, retainedMinor = 0): OrderEntity {
  const pricing = snapshotPricing(menu, DEFAULT_STUDIO_SETTINGS);
  const quote = quoteFromSnapshot(pricing, {
    guestCount,
    eventDate: '2026-06-20',
    today: '2026-03-06',
  });
  return {
    id: 'o1',
    status,
    guestCount,
    eventDate: '2026-06-20',
    pricing,
    quote,
    totalMinor: quote.totalMinor,
    retainedMinor,
  } as OrderEntity;
}

describe('splitRefund (a refund never exceeds what was paid)', () => {
  it('takes from the newest payment first, then the older ones', () => {
    const deposit = payment({ amountMinor: 7200, settledAt: new Date('2026-03-06T10:00:00Z') });
    const balance = payment({
      kind: 'balance',
      amountMinor: 16800,
      settledAt: new Date('2026-06-01T10:00:00Z'),
    });
    const slices = splitRefund([deposit, balance], 20000);
    expect(slices.map((s) => [s.payment.id, s.amountMinor])).toEqual([
      [balance.id, 16800],
      [deposit.id, 3200],
    ]);
  });

  it('counts earlier refunds, settled or still pending, against each payment', () => {
    const paid = payment({ amountMinor: 5000 });
    const settled = payment({ kind: 'refund', refundOfPaymentId: paid.id, amountMinor: 1000 });
    const pending = payment({
      kind: 'refund',
      status: 'pending',
      refundOfPaymentId: paid.id,
      amountMinor: 1500,
    });
    const failed = payment({
      kind: 'refund',
      status: 'failed',
      refundOfPaymentId: paid.id,
      amountMinor: 2500,
    });
    expect(splitRefund([paid, settled, pending, failed], 2500)).toEqual([
      { payment: paid, amountMinor: 2500 },
    ]);
    expect(() => splitRefund([paid, settled, pending, failed], 2501)).toThrow(ConflictException);
  });

  it('ignores payments that did not go through', () => {
    const open = payment({ status: 'pending', amountMinor: 9000 });
    const expired = payment({ status: 'expired', amountMinor: 9000 });
    expect(() => splitRefund([open, expired], 1)).toThrow(/more than what is left/);
  });

  it('never returns slices adding up to more than the payments, for any amount (exhaustive 0…total+1)', () => {
    const rows = [
      payment({ amountMinor: 333 }),
      payment({ amountMinor: 250, kind: 'top_up' }),
      payment({ amountMinor: 17, kind: 'balance' }),
    ];
    for (let amount = 0; amount <= 601; amount += 1) {
      if (amount > 600) {
        expect(() => splitRefund(rows, amount)).toThrow();
        continue;
      }
      const slices = splitRefund(rows, amount);
      expect(slices.reduce((s, x) => s + x.amountMinor, 0)).toBe(amount);
      for (const s of slices) expect(s.amountMinor).toBeLessThanOrEqual(s.payment.amountMinor);
    }
  });
});

describe('what the client can pay now', () => {
  it('offers the deposit or the full amount before anything is paid', () => {
    const o = order(OrderStatus.PendingPayment);
    const ledger = summarizeLedger([]);
    expect(payActionFor(o, ledger, '2026-03-06')).toBe('deposit_or_full');
    // 30 % of 20 × €12.00 = €72.00; the full amount €240.00.
    expect(amountToPay(o, ledger, 'deposit', '2026-03-06')).toEqual({
      kind: 'deposit',
      amountMinor: 7200,
    });
    expect(amountToPay(o, ledger, 'full', '2026-03-06')).toEqual({
      kind: 'full',
      amountMinor: 24000,
    });
    expect(() => amountToPay(o, ledger, 'balance', '2026-03-06')).toThrow(ConflictException);
  });

  it('asks for the whole total as the deposit once the balance is due', () => {
    const o = order(OrderStatus.PendingPayment);
    expect(amountToPay(o, summarizeLedger([]), 'deposit', '2026-06-10')).toEqual({
      kind: 'deposit',
      amountMinor: 24000,
    });
  });

  it('offers the balance after the deposit, a top-up after guests were added, nothing when settled', () => {
    const paid = [payment({ amountMinor: 7200 })];
    const booked = order(OrderStatus.Requested);
    expect(payActionFor(booked, summarizeLedger(paid), '2026-03-06')).toBe('balance');
    expect(amountToPay(booked, summarizeLedger(paid), 'balance', '2026-03-06').amountMinor).toBe(
      16800,
    );
    expect(balanceOf(booked, summarizeLedger(paid))).toBe(16800);
    const more = order(OrderStatus.Confirmed, 30); // deposit now 30 % of €360.00 = €108.00
    expect(payActionFor(more, summarizeLedger(paid), '2026-03-06')).toBe('top_up');
    expect(amountToPay(more, summarizeLedger(paid), 'top_up', '2026-03-06').amountMinor).toBe(3600);
    const settled = [payment({ amountMinor: 24000, kind: 'full' })];
    expect(payActionFor(booked, summarizeLedger(settled), '2026-03-06')).toBeNull();
    expect(
      payActionFor(order(OrderStatus.Cancelled), summarizeLedger(paid), '2026-03-06'),
    ).toBeNull();
    expect(balanceOf(order(OrderStatus.Cancelled), summarizeLedger(paid))).toBe(0);
  });

  it('counts money kept under the policy as not credited to the order', () => {
    const paid = [payment({ amountMinor: 24000, kind: 'full' })];
    // 18000 of a 24000 total were paid and 6000 of it were kept for removed guests.
    const refunded = [
      ...paid,
      payment({ kind: 'refund', refundOfPaymentId: paid[0]!.id, amountMinor: 6000 }),
    ];
    const smaller = order(OrderStatus.Requested, 10, 6000);
    expect(balanceOf(smaller, summarizeLedger(refunded))).toBe(0);
    expect(balanceOf(order(OrderStatus.Requested, 15, 6000), summarizeLedger(refunded))).toBe(6000);
  });
});
