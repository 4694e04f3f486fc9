import { randomUUID } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';
import { Clock } from '../common/clock.js';
import type { OrderEntity } from '../orders/entities/order.entity.js';
import { splitRefund } from '../orders/order-money.js';
import { PaymentEntity, type RefundOperation } from './entities/payment.entity.js';
import { PaymentGateway, PaymentServiceError } from './payment-gateway.js';

/**
 * Refunds in two steps, so the ledger always knows about money on its way out:
 *  1. `reserve` (inside the transaction that decides the refund) writes `pending` refund rows,
 *     split over the payments they come back from, each with its own idempotency key. A pending
 *     refund already counts against what can be refunded again.
 *  2. `send` (outside any transaction) asks the payment service for each, with that key, and
 *     marks it `succeeded`. When the service does not answer the rows stay pending and the same
 *     request, retried, sends them again with the same keys — never a second refund.
 */
@Injectable()
export class RefundService {
  private readonly logger = new Logger(RefundService.name);

  constructor(
    private readonly dataSource: DataSource,
    private readonly gateway: PaymentGateway,
    private readonly clock: Clock,
  ) {}

  async reserve(
    manager: EntityManager,
    order: OrderEntity,
    payments: PaymentEntity[],
    amountMinor: number,
    operation: RefundOperation,
    targetGuestCount: number | null = null,
  ): Promise<PaymentEntity[]> {
    const now = this.clock.now();
    const rows: PaymentEntity[] = [];
    for (const slice of splitRefund(payments, amountMinor)) {
      const earlier = payments.filter((p) => p.refundOfPaymentId === slice.payment.id).length;
      const row = manager.create(PaymentEntity, {
        id: randomUUID(),
        orderId: order.id,
        kind: 'refund',
        status: 'pending',
        amountMinor: slice.amountMinor,
        currency: order.currency,
        idempotencyKey: `order:${order.id}:refund:${slice.payment.id}:${earlier + 1}`,
        providerSessionId: null,
        checkoutUrl: null,
        checkoutExpiresAt: null,
        providerPaymentIntentId: slice.payment.providerPaymentIntentId,
        providerRefundId: null,
        refundOfPaymentId: slice.payment.id,
        operation,
        targetGuestCount,
        failureMessage: null,
        seeded: slice.payment.seeded,
        createdAt: now,
        settledAt: null,
        updatedAt: now,
      });
      await manager.insert(PaymentEntity, row);
      payments.push(row);
      rows.push(row);
    }
    return rows;
  }

  /** Sends reserved refunds; throws the HTTP error to answer when one cannot be confirmed. */
  async send(rows: readonly PaymentEntity[]): Promise<void> {
    for (const row of rows) {
      if (row.status === 'succeeded') continue;
      if (row.seeded || !row.providerPaymentIntentId) {
        // Demo payments never went through the payment service; nor do their refunds.
        if (!row.seeded) this.logger.error(`Refund ${row.id} has no payment to refund from`);
        await this.settle(row, null);
        continue;
      }
      try {
        const refund = await this.gateway.createRefund(
          {
            payment_intent: row.providerPaymentIntentId,
            amount: row.amountMinor,
            reason: 'requested_by_customer',
            metadata: { orderId: row.orderId, paymentId: row.id },
          },
          row.idempotencyKey,
        );
        if (refund.status === 'failed' || refund.status === 'canceled') {
          await this.fail(row, `the refund ${refund.status}`);
          throw new PaymentServiceError(true, `the refund ${refund.status}`).toHttp();
        }
        await this.settle(row, refund.id);
      } catch (error) {
        if (!(error instanceof PaymentServiceError)) throw error;
        if (error.definitive) await this.fail(row, error.message);
        throw error.toHttp();
      }
    }
  }

  private async settle(row: PaymentEntity, refundId: string | null): Promise<void> {
    const now = this.clock.now();
    await this.dataSource.transaction((m) =>
      m.update(
        PaymentEntity,
        { id: row.id, status: 'pending' },
        { status: 'succeeded', providerRefundId: refundId, settledAt: now, updatedAt: now },
      ),
    );
    row.status = 'succeeded';
    row.providerRefundId = refundId;
    row.settledAt = now;
  }

  private async fail(row: PaymentEntity, message: string): Promise<void> {
    const now = this.clock.now();
    await this.dataSource.transaction((m) =>
      m.update(
        PaymentEntity,
        { id: row.id, status: 'pending' },
        { status: 'failed', failureMessage: message.slice(0, 300), updatedAt: now },
      ),
    );
    row.status = 'failed';
  }
}
