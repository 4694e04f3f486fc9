import type { OrderStatus } from '@nappe/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity.js';
import { OrderEntity } from './order.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

export type OrderEventActorRole = 'client' | 'chef' | 'staff' | 'system';

/** The audit trail: every change of an order, who made it, when and why. Never updated or deleted. */
@Entity({ name: 'order_events' })
@Index('UQ_order_events_order_seq', ['orderId', 'seq'], { unique: true })
export class OrderEventEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ name: 'order_id', type: 'varchar', length: 36 })
  orderId: string;

  @ManyToOne(() => OrderEntity, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'order_id' })
  order?: OrderEntity;

  /** 1, 2, 3… within the order: the timeline's order, whatever the clock says. */
  @Column({ type: 'integer' })
  seq: number;

  /** Null for the system (a payment received, a checkout expired). */
  @Column({ name: 'actor_user_id', type: 'varchar', length: 36, nullable: true })
  actorUserId: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'actor_user_id' })
  actor?: User | null;

  @Column({ name: 'actor_role', type: 'varchar', length: 8 })
  actorRole: OrderEventActorRole;

  @Column({ name: 'from_status', type: 'varchar', length: 20, nullable: true })
  fromStatus: OrderStatus | null;

  @Column({ name: 'to_status', type: 'varchar', length: 20, nullable: true })
  toStatus: OrderStatus | null;

  @Column({ type: 'varchar', length: 300 })
  summary: string;

  @Column({ type: 'varchar', length: 500, nullable: true })
  reason: string | null;

  @Column({ type: TIMESTAMP })
  at: Date;
}
