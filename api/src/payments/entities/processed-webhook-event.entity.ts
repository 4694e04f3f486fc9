import { Column, Entity, PrimaryColumn } from 'typeorm';
import { TIMESTAMP } from '../../database/portable-schema.js';

/** A webhook event already applied: inserted in the same transaction as its effect. */
@Entity({ name: 'processed_webhook_events' })
export class ProcessedWebhookEventEntity {
  @PrimaryColumn({ name: 'event_id', type: 'varchar', length: 255 })
  eventId: string;

  @Column({ type: 'varchar', length: 100 })
  type: string;

  @Column({ name: 'processed_at', type: TIMESTAMP })
  processedAt: Date;
}
