import type { PaymentKind, PaymentRecordStatus } from '@nappe/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { OrderEntity } from '../../orders/entities/order.entity.js';
import { NOW_DEFAULT, TIMESTAMP } from '../../database/portable-schema.js';

/** Why a refund was made. `reconciled`: found at the payment service (a refund made there). */
export type RefundOperation = 'cancel' | 'decline' | 'guest_change' | 'reconciled';

/**
 * One line of the ledger: money in (deposit, full, balance, top_up) or out (refund). A checkout
 * is `pending` until the payment service reports it paid (`succeeded`) or closed (`expired`).
 * A refund is `pending` from the moment it is reserved until the service confirms it.
 */
@Entity({ name: 'payments' })
export class PaymentEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index('IDX_payments_order')
  @Column({ name: 'order_id', type: 'varchar', length: 36 })
  orderId: string;

  @ManyToOne(() => OrderEntity, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'order_id' })
  order?: OrderEntity;

  @Column({ type: 'varchar', length: 8 })
  kind: PaymentKind;

  @Column({ type: 'varchar', length: 10 })
  status: PaymentRecordStatus;

  /** Always positive; a refund is money out. */
  @Column({ name: 'amount_minor', type: 'integer' })
  amountMinor: number;

  @Column({ type: 'varchar', length: 3 })
  currency: string;

  /** The key sent with the call to the payment service, so a retry never pays or refunds twice. */
  @Index('UQ_payments_idempotency_key', { unique: true })
  @Column({ name: 'idempotency_key', type: 'varchar', length: 200 })
  idempotencyKey: string;

  @Index('UQ_payments_session', { unique: true })
  @Column({ name: 'provider_session_id', type: 'varchar', length: 255, nullable: true })
  providerSessionId: string | null;

  @Column({ name: 'checkout_url', type: 'varchar', length: 2000, nullable: true })
  checkoutUrl: string | null;

  @Column({ name: 'checkout_expires_at', type: TIMESTAMP, nullable: true })
  checkoutExpiresAt: Date | null;

  @Index('IDX_payments_intent')
  @Column({ name: 'provider_payment_intent_id', type: 'varchar', length: 255, nullable: true })
  providerPaymentIntentId: string | null;

  @Index('UQ_payments_refund', { unique: true })
  @Column({ name: 'provider_refund_id', type: 'varchar', length: 255, nullable: true })
  providerRefundId: string | null;

  /** For a refund: the payment it gives money back from. */
  @Column({ name: 'refund_of_payment_id', type: 'varchar', length: 36, nullable: true })
  refundOfPaymentId: string | null;

  @ManyToOne(() => PaymentEntity, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'refund_of_payment_id' })
  refundOf?: PaymentEntity | null;

  @Column({ type: 'varchar', length: 16, nullable: true })
  operation: RefundOperation | null;

  /** For a refund reserved by a change of guests: the guest count it is for. */
  @Column({ name: 'target_guest_count', type: 'integer', nullable: true })
  targetGuestCount: number | null;

  @Column({ name: 'failure_message', type: 'varchar', length: 300, nullable: true })
  failureMessage: string | null;

  /** Demo data written by the seed, never sent to the payment service. */
  @Column({ type: 'boolean', default: false })
  seeded: boolean;

  @Column({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @Column({ name: 'settled_at', type: TIMESTAMP, nullable: true })
  settledAt: Date | null;

  @Column({ name: 'updated_at', type: TIMESTAMP, default: NOW_DEFAULT })
  updatedAt: Date;
}
