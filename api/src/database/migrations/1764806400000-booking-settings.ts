import { DEFAULT_STUDIO_SETTINGS } from '@nappe/shared';
import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The studio's booking settings (DESIGN.md `StudioSettings`) on its single settings row: tax,
 * deposit, balance due date, cancellation tiers, daily plate capacity, blackout dates, the
 * final-guest-count deadline, spare plates and how long guests' dietary details are kept. The
 * existing row gets the invented defaults of `DEFAULT_STUDIO_SETTINGS`; the chef changes them.
 * Lists are JSON text. The currency and time zone were already there.
 */
const d = DEFAULT_STUDIO_SETTINGS;

const COLUMNS: ReadonlyArray<[name: string, definition: string]> = [
  [
    'tax_rate_bp',
    `integer NOT NULL DEFAULT (${d.taxRateBp}) CHECK ("tax_rate_bp" BETWEEN 0 AND 10000)`,
  ],
  [
    'prices_include_tax',
    `boolean NOT NULL DEFAULT (${d.pricesIncludeTax ? 1 : 0}) CHECK ("prices_include_tax" IN (0, 1))`,
  ],
  [
    'deposit_percent',
    `integer NOT NULL DEFAULT (${d.depositPercent}) CHECK ("deposit_percent" BETWEEN 1 AND 100)`,
  ],
  [
    'balance_due_days_before',
    `integer NOT NULL DEFAULT (${d.balanceDueDaysBefore}) CHECK ("balance_due_days_before" BETWEEN 0 AND 365)`,
  ],
  ['cancellation_tiers', `text NOT NULL DEFAULT ('[]')`],
  [
    'daily_plate_capacity',
    `integer NOT NULL DEFAULT (${d.dailyPlateCapacity}) CHECK ("daily_plate_capacity" >= 1)`,
  ],
  ['blackout_dates', `text NOT NULL DEFAULT ('[]')`],
  [
    'final_guest_count_days_before',
    `integer NOT NULL DEFAULT (${d.finalGuestCountDaysBefore}) CHECK ("final_guest_count_days_before" BETWEEN 0 AND 365)`,
  ],
  [
    'spare_percent',
    `integer NOT NULL DEFAULT (${d.sparePercent}) CHECK ("spare_percent" BETWEEN 0 AND 100)`,
  ],
  [
    'guest_data_retention_days',
    `integer NOT NULL DEFAULT (${d.guestDataRetentionDays}) CHECK ("guest_data_retention_days" BETWEEN 0 AND 3650)`,
  ],
];

export class BookingSettings1764806400000 implements MigrationInterface {
  name = 'BookingSettings1764806400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    for (const [name, definition] of COLUMNS) {
      await queryRunner.query(`ALTER TABLE "studio_settings" ADD COLUMN "${name}" ${definition}`);
    }
    await queryRunner.query(
      `UPDATE "studio_settings" SET "cancellation_tiers" = ?, "blackout_dates" = ?`,
      [JSON.stringify(d.cancellationTiers), JSON.stringify(d.blackoutDates)],
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const [name] of [...COLUMNS].reverse()) {
      await queryRunner.query(`ALTER TABLE "studio_settings" DROP COLUMN "${name}"`);
    }
  }
}
