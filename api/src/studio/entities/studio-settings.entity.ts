import type { CancellationTier } from '@nappe/shared';
import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/**
 * The studio's own settings: exactly one row, id 1 — its public card and the booking settings
 * the shared rules read (`studioSettingsSchema` in `@nappe/shared`; see `bookingSettingsOf`).
 */
@Entity({ name: 'studio_settings' })
export class StudioSettings {
  @PrimaryColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 200 })
  tagline: string;

  @Column({ type: 'varchar', length: 120 })
  city: string;

  /** ISO 4217 code, e.g. EUR. */
  @Column({ type: 'varchar', length: 3 })
  currency: string;

  /** IANA time-zone name, e.g. Europe/Brussels. */
  @Column({ name: 'time_zone', type: 'varchar', length: 64 })
  timeZone: string;

  /** Tax in basis points: 2100 = 21 %. */
  @Column({ name: 'tax_rate_bp', type: 'integer' })
  taxRateBp: number;

  @Column({ name: 'prices_include_tax', type: 'boolean' })
  pricesIncludeTax: boolean;

  @Column({ name: 'deposit_percent', type: 'integer' })
  depositPercent: number;

  @Column({ name: 'balance_due_days_before', type: 'integer' })
  balanceDueDaysBefore: number;

  @Column({ name: 'cancellation_tiers', type: 'simple-json' })
  cancellationTiers: CancellationTier[];

  @Column({ name: 'daily_plate_capacity', type: 'integer' })
  dailyPlateCapacity: number;

  /** `YYYY-MM-DD` days the studio takes no events. */
  @Column({ name: 'blackout_dates', type: 'simple-json' })
  blackoutDates: string[];

  @Column({ name: 'final_guest_count_days_before', type: 'integer' })
  finalGuestCountDaysBefore: number;

  @Column({ name: 'spare_percent', type: 'integer' })
  sparePercent: number;

  @Column({ name: 'guest_data_retention_days', type: 'integer' })
  guestDataRetentionDays: number;

  /** Hands-on kitchen work happens between these local times (`HH:MM`). */
  @Column({ name: 'working_hours_start', type: 'varchar', length: 5 })
  workingHoursStart: string;

  @Column({ name: 'working_hours_end', type: 'varchar', length: 5 })
  workingHoursEnd: string;

  /** Every component is finished at least this long before service, for plating. */
  @Column({ name: 'plating_buffer_minutes', type: 'integer' })
  platingBufferMinutes: number;

  @UpdateDateColumn({ name: 'updated_at' })
  updatedAt: Date;
}
