import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { OrderEntity } from './order.entity.js';

/** One guest's dietary requirement (health data: shown to the client who entered it and the studio). */
@Entity({ name: 'order_guests' })
export class OrderGuestEntity {
  @PrimaryColumn({ name: 'order_id', type: 'varchar', length: 36 })
  orderId: string;

  @ManyToOne(() => OrderEntity, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'order_id' })
  order?: OrderEntity;

  @PrimaryColumn({ type: 'integer' })
  position: number;

  @Column({ type: 'varchar', length: 120 })
  label: string;

  @Column({ name: 'table_label', type: 'varchar', length: 40, nullable: true })
  tableLabel: string | null;

  @Column({ type: 'simple-json' })
  allergens: string[];

  @Column({ type: 'simple-json' })
  diets: string[];

  @Column({ type: 'varchar', length: 500, nullable: true })
  notes: string | null;
}
