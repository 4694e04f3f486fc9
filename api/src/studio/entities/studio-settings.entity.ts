import { DEFAULT_STUDIO_SETTINGS, type CancellationTier } from '@nappe/shared';
import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { TIMESTAMP } from '../../database/portable-schema.js';

/**
 * The studio's own settings: exactly one row, id 1 — its public card and the booking settings
 * the shared rules read (`studioSettingsSchema` in `@nappe/shared`; see `bookingSettingsOf`).
 */
/** The column defaults the booking-settings migration gave the existing row. */
const d = DEFAULT_STUDIO_SETTINGS;

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
  @Column({ name: 'tax_rate_bp', type: 'integer', default: d.taxRateBp })
  taxRateBp: number;

  @Column({ name: 'prices_include_tax', type: 'boolean', default: d.pricesIncludeTax })
  pricesIncludeTax: boolean;

  @Column({ name: 'deposit_percent', type: 'integer', default: d.depositPercent })
  depositPercent: number;

  @Column({ name: 'balance_due_days_before', type: 'integer', default: d.balanceDueDaysBefore })
  balanceDueDaysBefore: number;

  @Column({ name: 'cancellation_tiers', type: 'simple-json', default: '[]' })
  cancellationTiers: CancellationTier[];

  @Column({ name: 'daily_plate_capacity', type: 'integer', default: d.dailyPlateCapacity })
  dailyPlateCapacity: number;

  /** `YYYY-MM-DD` days the studio takes no events. */
  @Column({ name: 'blackout_dates', type: 'simple-json', default: '[]' })
  blackoutDates: string[];

  @Column({
    name: 'final_guest_count_days_before',
    type: 'integer',
    default: d.finalGuestCountDaysBefore,
  })
  finalGuestCountDaysBefore: number;

  @Column({ name: 'spare_percent', type: 'integer', default: d.sparePercent })
  sparePercent: number;

  @Column({
    name: 'guest_data_retention_days',
    type: 'integer',
    default: d.guestDataRetentionDays,
  })
  guestDataRetentionDays: number;

  /** Hands-on kitchen work happens between these local times (`HH:MM`). */
  @Column({ name: 'working_hours_start', type: 'varchar', length: 5, default: '07:00' })
  workingHoursStart: string;

  @Column({ name: 'working_hours_end', type: 'varchar', length: 5, default: '19:00' })
  workingHoursEnd: string;

  /** Every component is finished at least this long before service, for plating. */
  @Column({ name: 'plating_buffer_minutes', type: 'integer', default: 60 })
  platingBufferMinutes: number;

  @UpdateDateColumn({ name: 'updated_at', type: TIMESTAMP })
  updatedAt: Date;
}
