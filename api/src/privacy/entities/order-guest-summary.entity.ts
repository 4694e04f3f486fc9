import type { Substitution } from '@nappe/shared';
import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn } from 'typeorm';
import { OrderEntity } from '../../orders/entities/order.entity.js';
import { TIMESTAMP } from '../../database/portable-schema.js';

/** Why an order's guest details were removed. */
export type GuestDetailsRemovalReason = 'retention' | 'account_deleted';

/** Changed plates of one dessert, all with the same changes: a number, no guest. */
export interface KeptPlateChange {
  dessertId: string;
  changes: Substitution[];
  plates: number;
}

/**
 * What is kept of an order's guests once their details are removed (DESIGN.md, "Guest data is
 * health data"): anonymous counts only — how many guests stated a requirement, how many per
 * allergen group and per diet, and how many plates of which dessert changed in which way — so
 * the chef's history, the prep plan and the figures still add up. No name, table or note.
 */
@Entity({ name: 'order_guest_summaries' })
export class OrderGuestSummaryEntity {
  @PrimaryColumn({ name: 'order_id', type: 'varchar', length: 36 })
  orderId: string;

  @OneToOne(() => OrderEntity, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'order_id' })
  order?: OrderEntity;

  /** Guests listed with an allergen, a diet or a note when the details were removed. */
  @Column({ name: 'guests_listed', type: 'integer' })
  guestsListed: number;

  /** Of those, how many had written a note (the text itself is gone). */
  @Column({ name: 'guests_with_notes', type: 'integer' })
  guestsWithNotes: number;

  /** Guests per allergen group (EU 14 codes), e.g. `{ "nuts": 2, "gluten": 1 }`. */
  @Column({ name: 'allergen_counts', type: 'simple-json' })
  allergenCounts: Record<string, number>;

  /** Guests per diet, e.g. `{ "vegan": 1 }`. */
  @Column({ name: 'diet_counts', type: 'simple-json' })
  dietCounts: Record<string, number>;

  @Column({ name: 'plate_changes', type: 'simple-json' })
  plateChanges: KeptPlateChange[];

  @Column({ type: 'varchar', length: 16 })
  reason: GuestDetailsRemovalReason;

  /** The retention setting in force when they were removed (null for an account deletion). */
  @Column({ name: 'retention_days', type: 'integer', nullable: true })
  retentionDays: number | null;

  @Column({ name: 'removed_at', type: TIMESTAMP })
  removedAt: Date;
}
