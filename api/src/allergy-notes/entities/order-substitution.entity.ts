import type { Substitution } from '@nappe/shared';
import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { OrderEntity } from '../../orders/entities/order.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

/**
 * What the chef changes on one guest's plate of one dessert: components left out or replaced
 * (the shared `Substitution`), and/or a free note. The guest is its position in the order with
 * the label it had, so a replaced guest list does not inherit another guest's plate.
 */
@Entity({ name: 'order_substitutions' })
@Index('UQ_order_substitutions_guest_dessert', ['orderId', 'guestPosition', 'dessertId'], {
  unique: true,
})
export class OrderSubstitutionEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @ForeignKey(() => OrderEntity, { onDelete: 'CASCADE' })
  @Column({ name: 'order_id', type: 'varchar', length: 36 })
  orderId: string;

  @Column({ name: 'guest_position', type: 'integer' })
  guestPosition: number;

  @Column({ name: 'guest_label', type: 'varchar', length: 120 })
  guestLabel: string;

  @Column({ name: 'dessert_id', type: 'varchar', length: 36 })
  dessertId: string;

  @Column({ type: 'simple-json' })
  changes: Substitution[];

  @Column({ type: 'varchar', length: 500, nullable: true })
  note: string | null;

  @ForeignKey(() => User, { onDelete: 'SET NULL' })
  @Column({ name: 'recorded_by', type: 'varchar', length: 36, nullable: true })
  recordedBy: string | null;

  @Column({ name: 'recorded_at', type: TIMESTAMP })
  recordedAt: Date;
}
