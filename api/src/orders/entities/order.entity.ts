import type { OrderStatus, PricingSnapshot, Quote } from '@nappe/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { MenuEntity } from '../../kitchen/entities/menu.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { NOW_DEFAULT, TIMESTAMP } from '../../database/portable-schema.js';

/**
 * A booking. Its money is fixed by `pricing` (what the menu and the studio's settings were when
 * it was booked) and `quote` (the quote at the current guest count, made from that snapshot).
 * `plates` (guests × desserts) is what it takes from the day's capacity while its status holds
 * plates; a `pending_payment` order holds them until `holdExpiresAt`.
 */
@Entity({ name: 'orders' })
@Index('UQ_orders_client_request', ['clientId', 'clientRequestId'], { unique: true })
@Index('IDX_orders_event_date_status', ['eventDate', 'status'])
@Index('IDX_orders_status', ['status', 'createdAt'])
export class OrderEntity {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  /** `N-YYYY-NNNN`, for people. */
  @Index('UQ_orders_reference', { unique: true })
  @Column({ type: 'varchar', length: 20 })
  reference: string;

  @Column({ name: 'client_id', type: 'varchar', length: 36 })
  clientId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'client_id' })
  client?: User;

  @Index('IDX_orders_menu')
  @Column({ name: 'menu_id', type: 'varchar', length: 36 })
  menuId: string;

  @ManyToOne(() => MenuEntity, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'menu_id' })
  menu?: MenuEntity;

  @Column({ type: 'varchar', length: 20 })
  status: OrderStatus;

  /** `YYYY-MM-DD` in the studio's time zone. */
  @Column({ name: 'event_date', type: 'varchar', length: 10 })
  eventDate: string;

  /** `HH:MM`, the studio's time zone. */
  @Column({ name: 'service_time', type: 'varchar', length: 5 })
  serviceTime: string;

  @Column({ name: 'venue_address_lines', type: 'simple-json' })
  venueAddressLines: string[];

  @Column({ type: 'varchar', length: 120 })
  occasion: string;

  @Column({ name: 'contact_phone', type: 'varchar', length: 20 })
  contactPhone: string;

  @Column({ name: 'guest_count', type: 'integer' })
  guestCount: number;

  @Column({ type: 'integer' })
  plates: number;

  @Column({ type: 'varchar', length: 3 })
  currency: string;

  /** The current quote's total, integer minor units. */
  @Column({ name: 'total_minor', type: 'integer' })
  totalMinor: number;

  /** Paid money kept under the cancellation policy when guests were removed. */
  @Column({ name: 'retained_minor', type: 'integer', default: 0 })
  retainedMinor: number;

  @Column({ type: 'simple-json' })
  pricing: PricingSnapshot;

  @Column({ type: 'simple-json' })
  quote: Quote;

  /** The client's `Idempotency-Key` for the booking request; unique per client. */
  @Column({ name: 'client_request_id', type: 'varchar', length: 64 })
  clientRequestId: string;

  /** SHA-256 of the booking request, to tell a retry from another booking under the same key. */
  @Column({ name: 'request_hash', type: 'varchar', length: 64 })
  requestHash: string;

  @Column({ name: 'hold_expires_at', type: TIMESTAMP, nullable: true })
  holdExpiresAt: Date | null;

  /** Bumped whenever a new checkout is opened, so each amount gets its own idempotency key. */
  @Column({ name: 'amount_version', type: 'integer', default: 1 })
  amountVersion: number;

  @Column({ name: 'created_at', type: TIMESTAMP, default: NOW_DEFAULT })
  createdAt: Date;

  @Column({ name: 'updated_at', type: TIMESTAMP, default: NOW_DEFAULT })
  updatedAt: Date;
}
