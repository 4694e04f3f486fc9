import { randomUUID } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { formatMoney, OrderStatus, type PaymentKind } from '@nappe/shared';
import type Stripe from 'stripe';
import { In, type EntityManager } from 'typeorm';
import { Clock } from '../common/clock.js';
import { lockFor } from '../database/serialized-writes.js';
import { PAYMENT_KIND_LABELS } from '../documents/documents.service.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { balanceOf, isBooked, summarizeLedger } from '../orders/order-money.js';
import { OrderNotifications } from '../orders/order-notifications.js';
import { recordEvent, SYSTEM, transitionOrder } from '../orders/order-records.js';
import { PaymentEntity } from './entities/payment.entity.js';

export interface PaidCheckout {
  sessionId: string | null;
  /** Our ledger row id, from the metadata we put on the session and its payment intent. */
  paymentId: string | null;
  orderId: string | null;
  paymentIntentId: string | null;
  amountMinor: number;
  currency: string;
  plan: string | null;
}

export type FulfilmentOutcome = 'applied' | 'already_applied' | 'ignored';

const MONEY_IN: readonly PaymentKind[] = ['deposit', 'full', 'balance', 'top_up'];

function idOf(value: string | { id: string } | null | undefined): string | null {
  if (value === null || value === undefined) return null;
  return typeof value === 'string' ? value : value.id;
}

/**
 * What the payment service tells us, applied to the ledger and the order — once, however often
 * and in whatever order it is told. Every method runs inside the caller's transaction (the
 * webhook's, with its event-id row; or the return-from-checkout's), and decides from the rows it
 * reads there, so a duplicate or a concurrent call finds the work done and does nothing. Each
 * first locks the order the payment belongs to (PostgreSQL; see `lockOrderOf`), so the webhook
 * and the return from checkout apply a payment one after the other, never side by side.
 */
@Injectable()
export class Fulfilment {
  private readonly logger = new Logger(Fulfilment.name);

  constructor(
    private readonly clock: Clock,
    private readonly notifications: OrderNotifications,
  ) {}

  /**
   * THE fulfilment function, shared by the webhook (`checkout.session.*`) and the return from
   * the payment page: a paid session records the payment; an expired one closes its checkout.
   */
  async applyCheckoutSession(
    m: EntityManager,
    session: Stripe.Checkout.Session,
  ): Promise<FulfilmentOutcome> {
    if (session.payment_status === 'paid') {
      return this.recordPaid(m, {
        sessionId: session.id,
        paymentId: session.metadata?.paymentId ?? null,
        orderId: session.metadata?.orderId ?? session.client_reference_id ?? null,
        paymentIntentId: idOf(session.payment_intent),
        amountMinor: session.amount_total ?? 0,
        currency: session.currency ?? '',
        plan: session.metadata?.plan ?? null,
      });
    }
    if (session.status === 'expired') return this.recordExpired(m, session);
    return 'ignored';
  }

  /** A payment intent that succeeded: the same payment, told another way (any order of arrival). */
  applyPaymentIntentSucceeded(
    m: EntityManager,
    intent: Stripe.PaymentIntent,
  ): Promise<FulfilmentOutcome> {
    const paymentId = intent.metadata?.paymentId;
    if (!paymentId) return Promise.resolve('ignored');
    return this.recordPaid(m, {
      sessionId: null,
      paymentId,
      orderId: intent.metadata?.orderId ?? null,
      paymentIntentId: intent.id,
      amountMinor: intent.amount_received,
      currency: intent.currency,
      plan: null,
    });
  }

  async recordPaid(m: EntityManager, paid: PaidCheckout): Promise<FulfilmentOutcome> {
    await this.lockOrderOf(m, paid.sessionId, paid.paymentId, paid.orderId);
    const now = this.clock.now();
    let row =
      (paid.sessionId
        ? await m.findOneBy(PaymentEntity, { providerSessionId: paid.sessionId })
        : null) ??
      (paid.paymentId ? await m.findOneBy(PaymentEntity, { id: paid.paymentId }) : null);
    if (row && (row.kind === 'refund' || (paid.orderId && row.orderId !== paid.orderId))) {
      this.logger.error(`A payment names ledger row ${row.id}, which does not match; ignored`);
      return 'ignored';
    }
    if (!row) {
      // A paid checkout without its ledger row (made before a restore, or elsewhere): record it
      // from the metadata rather than lose the money.
      const order = paid.orderId ? await m.findOneBy(OrderEntity, { id: paid.orderId }) : null;
      if (!order || paid.amountMinor <= 0) return 'ignored';
      const kind = (MONEY_IN as readonly string[]).includes(paid.plan ?? '')
        ? (paid.plan as PaymentKind)
        : order.status === OrderStatus.PendingPayment
          ? 'deposit'
          : 'balance';
      row = m.create(PaymentEntity, {
        id: randomUUID(),
        orderId: order.id,
        kind,
        status: 'pending',
        amountMinor: paid.amountMinor,
        currency: order.currency,
        idempotencyKey: `received:${paid.sessionId ?? paid.paymentIntentId ?? randomUUID()}`,
        providerSessionId: paid.sessionId,
        checkoutUrl: null,
        checkoutExpiresAt: null,
        providerPaymentIntentId: paid.paymentIntentId,
        providerRefundId: null,
        refundOfPaymentId: null,
        operation: null,
        targetGuestCount: null,
        failureMessage: null,
        seeded: false,
        createdAt: now,
        settledAt: null,
        updatedAt: now,
      });
      await m.insert(PaymentEntity, row);
    }
    if (row.status === 'succeeded') {
      if (!row.providerPaymentIntentId && paid.paymentIntentId) {
        await m.update(
          PaymentEntity,
          { id: row.id },
          { providerPaymentIntentId: paid.paymentIntentId },
        );
      }
      return 'already_applied';
    }
    if (paid.amountMinor !== row.amountMinor) {
      this.logger.warn(
        `Payment ${row.id}: the service reports ${paid.amountMinor}, the ledger expected ${row.amountMinor}; recording what was paid`,
      );
    }
    await m.update(
      PaymentEntity,
      { id: row.id },
      {
        status: 'succeeded',
        amountMinor: paid.amountMinor,
        providerSessionId: row.providerSessionId ?? paid.sessionId,
        providerPaymentIntentId: paid.paymentIntentId ?? row.providerPaymentIntentId,
        settledAt: now,
        updatedAt: now,
      },
    );
    Object.assign(row, { status: 'succeeded', amountMinor: paid.amountMinor, settledAt: now });

    const order = await m.findOneByOrFail(OrderEntity, { id: row.orderId });
    const summary = `${PAYMENT_KIND_LABELS[row.kind]} of ${formatMoney(row.amountMinor, row.currency)} received`;
    if (order.status === OrderStatus.PendingPayment) {
      await transitionOrder(
        m,
        now,
        order,
        OrderStatus.Requested,
        SYSTEM,
        { summary },
        {
          holdExpiresAt: null,
        },
      );
      await this.notifications.bookingReceived(m, order, row);
    } else if (isBooked(order.status)) {
      await recordEvent(m, now, order.id, SYSTEM, { summary });
      const payments = await m.find(PaymentEntity, { where: { orderId: order.id } });
      await this.notifications.paymentReceived(
        m,
        order,
        row,
        balanceOf(order, summarizeLedger(payments)),
      );
    } else {
      this.logger.error(
        `Payment ${row.id} arrived for booking ${order.reference}, which is ${order.status}`,
      );
      await recordEvent(m, now, order.id, SYSTEM, {
        summary: `${summary} after the booking was ${order.status}: refund it from the payment service`,
      });
    }
    return 'applied';
  }

  /**
   * A checkout closed without payment. Its ledger row becomes `expired` (a paid one never
   * changes back); an order still awaiting payment, with nothing paid and no other checkout
   * open, becomes `expired` and its plates are released.
   */
  async recordExpired(
    m: EntityManager,
    session: Stripe.Checkout.Session,
  ): Promise<FulfilmentOutcome> {
    await this.lockOrderOf(m, session.id, session.metadata?.paymentId ?? null, null);
    const now = this.clock.now();
    const row =
      (await m.findOneBy(PaymentEntity, { providerSessionId: session.id })) ??
      (session.metadata?.paymentId
        ? await m.findOneBy(PaymentEntity, { id: session.metadata.paymentId })
        : null);
    if (!row || row.kind === 'refund') return 'ignored';
    if (row.status !== 'pending') return 'already_applied';
    await m.update(
      PaymentEntity,
      { id: row.id, status: 'pending' },
      { status: 'expired', updatedAt: now },
    );
    const order = await m.findOneByOrFail(OrderEntity, { id: row.orderId });
    if (order.status !== OrderStatus.PendingPayment) return 'applied';
    const others = await m.find(PaymentEntity, {
      where: { orderId: order.id, kind: In([...MONEY_IN]) },
    });
    const paid = others.some((p) => p.status === 'succeeded');
    const stillOpen = others.some(
      (p) =>
        p.id !== row.id &&
        p.status === 'pending' &&
        p.checkoutExpiresAt !== null &&
        p.checkoutExpiresAt.getTime() > now.getTime(),
    );
    if (!paid && !stillOpen) {
      await transitionOrder(
        m,
        now,
        order,
        OrderStatus.Expired,
        SYSTEM,
        { summary: 'Checkout closed without payment; the date and plates were released' },
        { holdExpiresAt: null },
      );
    }
    return 'applied';
  }

  /**
   * Locks the order a payment belongs to (its ledger row's, else the one the payment service's
   * metadata names) before anything is read to decide on: what is read after it includes
   * whatever a concurrent call for the same order committed.
   */
  private async lockOrderOf(
    m: EntityManager,
    sessionId: string | null,
    paymentId: string | null,
    orderId: string | null,
  ): Promise<void> {
    const row =
      (sessionId ? await m.findOneBy(PaymentEntity, { providerSessionId: sessionId }) : null) ??
      (paymentId ? await m.findOneBy(PaymentEntity, { id: paymentId }) : null);
    const id = row?.orderId ?? orderId;
    if (id) await lockFor(m, { row: OrderEntity, id });
  }

  /**
   * `charge.refunded`: the charge's cumulative refunded amount against the refunds the ledger
   * knows for that payment (settled or on their way). Anything more was refunded at the payment
   * service directly and is recorded now, so the ledger keeps matching the service.
   */
  async applyChargeRefunded(
    m: EntityManager,
    charge: Stripe.Charge,
    eventId: string,
  ): Promise<FulfilmentOutcome> {
    const intentId = idOf(charge.payment_intent);
    if (!intentId) return 'ignored';
    const paymentOf = await m.findOneBy(PaymentEntity, { providerPaymentIntentId: intentId });
    if (paymentOf) await lockFor(m, { row: OrderEntity, id: paymentOf.orderId });
    const source = await m.findOneBy(PaymentEntity, {
      providerPaymentIntentId: intentId,
      kind: In([...MONEY_IN]),
      status: 'succeeded',
    });
    if (!source) return 'ignored';
    const refunds = await m.find(PaymentEntity, {
      where: { refundOfPaymentId: source.id, status: In(['succeeded', 'pending']) },
    });
    const known = refunds.reduce((sum, r) => sum + r.amountMinor, 0);
    const missing = charge.amount_refunded - known;
    if (missing <= 0) return 'already_applied';
    const now = this.clock.now();
    await m.insert(PaymentEntity, {
      id: randomUUID(),
      orderId: source.orderId,
      kind: 'refund',
      status: 'succeeded',
      amountMinor: missing,
      currency: source.currency,
      idempotencyKey: `reconciled:${eventId}`,
      providerSessionId: null,
      checkoutUrl: null,
      checkoutExpiresAt: null,
      providerPaymentIntentId: intentId,
      providerRefundId: null,
      refundOfPaymentId: source.id,
      operation: 'reconciled',
      targetGuestCount: null,
      failureMessage: null,
      seeded: false,
      createdAt: now,
      settledAt: now,
      updatedAt: now,
    });
    await recordEvent(m, now, source.orderId, SYSTEM, {
      summary: `Refund of ${formatMoney(missing, source.currency)} made at the payment service, recorded`,
    });
    return 'applied';
  }
}
