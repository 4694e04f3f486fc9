import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { OrderEntity } from '../../orders/entities/order.entity.js';
import { NOW_DEFAULT, TIMESTAMP } from '../../database/portable-schema.js';

export type OutboxStatus = 'pending' | 'sending' | 'sent' | 'failed';

/** A document rendered when the message is sent (never stored): a receipt PDF, an event file. */
export type OutboxAttachment =
  { kind: 'receipt'; orderId: string; paymentId: string } | { kind: 'event-file'; orderId: string };

/**
 * An e-mail waiting to go out, written in the same transaction as the change that causes it.
 * The worker claims it (`sending`), sends it, and marks it `sent`; a failure puts it back to
 * `pending` with a later `nextAttemptAt`, until `failed` after the last attempt.
 */
@Entity({ name: 'outbox_messages' })
@Index('IDX_outbox_due', ['status', 'nextAttemptAt'])
export class OutboxMessageEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 40 })
  kind: string;

  @ForeignKey(() => OrderEntity, { onDelete: 'SET NULL' })
  @Column({ name: 'order_id', type: 'varchar', length: 36, nullable: true })
  orderId: string | null;

  @Column({ name: 'to_address', type: 'varchar', length: 254 })
  toAddress: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ name: 'text_body', type: 'text' })
  textBody: string;

  @Column({ name: 'html_body', type: 'text' })
  htmlBody: string;

  @Column({ type: 'simple-json', default: '[]' })
  attachments: OutboxAttachment[];

  @Column({ type: 'varchar', length: 8 })
  status: OutboxStatus;

  @Column({ type: 'integer', default: 0 })
  attempts: number;

  @Column({ name: 'next_attempt_at', type: TIMESTAMP })
  nextAttemptAt: Date;

  @Column({ name: 'sent_at', type: TIMESTAMP, nullable: true })
  sentAt: Date | null;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ name: 'created_at', type: TIMESTAMP })
  createdAt: Date;

  @Column({ name: 'updated_at', type: TIMESTAMP, default: NOW_DEFAULT })
  updatedAt: Date;
}
