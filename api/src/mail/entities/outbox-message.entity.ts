import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

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

  @Column({ type: 'simple-json' })
  attachments: OutboxAttachment[];

  @Column({ type: 'varchar', length: 8 })
  status: OutboxStatus;

  @Column({ type: 'integer' })
  attempts: number;

  @Column({ name: 'next_attempt_at', type: 'datetime' })
  nextAttemptAt: Date;

  @Column({ name: 'sent_at', type: 'datetime', nullable: true })
  sentAt: Date | null;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ name: 'created_at', type: 'datetime' })
  createdAt: Date;

  @Column({ name: 'updated_at', type: 'datetime' })
  updatedAt: Date;
}
