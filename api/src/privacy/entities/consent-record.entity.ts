import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { OrderEntity } from '../../orders/entities/order.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

export type ConsentKind = 'booking_terms' | 'guest_data';

/**
 * A confirmation given with a booking (GDPR Art. 7(1): the studio must be able to show it):
 * the booking terms, and that the guests agreed to share their allergies and diets (Art. 9(2)(a)).
 */
@Entity({ name: 'consent_records' })
@Index('IDX_consent_records_user', ['userId', 'at'])
export class ConsentRecordEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  /** Who confirmed (a client, or the chef entering guests for them). */
  @ForeignKey(() => User, { onDelete: 'SET NULL' })
  @Column({ name: 'user_id', type: 'varchar', length: 36, nullable: true })
  userId: string | null;

  @ForeignKey(() => OrderEntity, { onDelete: 'CASCADE' })
  @Column({ name: 'order_id', type: 'varchar', length: 36 })
  orderId: string;

  @Column({ type: 'varchar', length: 16 })
  kind: ConsentKind;

  /** The statement confirmed, in the words the form used. */
  @Column({ type: 'varchar', length: 300 })
  statement: string;

  @Column({ type: TIMESTAMP })
  at: Date;
}
