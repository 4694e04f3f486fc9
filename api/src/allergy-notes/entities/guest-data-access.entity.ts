import type { GuestDataView } from '@nappe/shared';
import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { OrderEntity } from '../../orders/entities/order.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

/** One opening of a guest's health data by the chef or staff (DESIGN.md, "Guest data is health data"). */
@Entity({ name: 'guest_data_access_log' })
@Index('IDX_guest_data_access_log_order', ['orderId', 'at'])
export class GuestDataAccessEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @ForeignKey(() => OrderEntity, { onDelete: 'CASCADE' })
  @Column({ name: 'order_id', type: 'varchar', length: 36 })
  orderId: string;

  @ForeignKey(() => User, { onDelete: 'SET NULL' })
  @Column({ name: 'user_id', type: 'varchar', length: 36, nullable: true })
  userId: string | null;

  @Column({ type: 'varchar', length: 8 })
  role: string;

  @Column({ type: 'varchar', length: 20 })
  what: GuestDataView;

  @Column({ type: TIMESTAMP })
  at: Date;
}
