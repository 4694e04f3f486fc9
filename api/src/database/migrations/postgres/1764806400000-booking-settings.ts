import { DEFAULT_STUDIO_SETTINGS } from '@nappe/shared';
import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PostgreSQL twin of `../1764806400000-booking-settings.ts` (see there for the why). */
const d = DEFAULT_STUDIO_SETTINGS;

const COLUMNS: ReadonlyArray<[name: string, definition: string]> = [
  [
    'tax_rate_bp',
    `integer NOT NULL DEFAULT ${d.taxRateBp} CONSTRAINT "CHK_studio_settings_tax_rate" CHECK ("tax_rate_bp" BETWEEN 0 AND 10000)`,
  ],
  ['prices_include_tax', `boolean NOT NULL DEFAULT ${d.pricesIncludeTax}`],
  [
    'deposit_percent',
    `integer NOT NULL DEFAULT ${d.depositPercent} CONSTRAINT "CHK_studio_settings_deposit" CHECK ("deposit_percent" BETWEEN 1 AND 100)`,
  ],
  [
    'balance_due_days_before',
    `integer NOT NULL DEFAULT ${d.balanceDueDaysBefore} CONSTRAINT "CHK_studio_settings_balance_due" CHECK ("balance_due_days_before" BETWEEN 0 AND 365)`,
  ],
  ['cancellation_tiers', `text NOT NULL DEFAULT '[]'`],
  [
    'daily_plate_capacity',
    `integer NOT NULL DEFAULT ${d.dailyPlateCapacity} CONSTRAINT "CHK_studio_settings_capacity" CHECK ("daily_plate_capacity" >= 1)`,
  ],
  ['blackout_dates', `text NOT NULL DEFAULT '[]'`],
  [
    'final_guest_count_days_before',
    `integer NOT NULL DEFAULT ${d.finalGuestCountDaysBefore} CONSTRAINT "CHK_studio_settings_final_count" CHECK ("final_guest_count_days_before" BETWEEN 0 AND 365)`,
  ],
  [
    'spare_percent',
    `integer NOT NULL DEFAULT ${d.sparePercent} CONSTRAINT "CHK_studio_settings_spare" CHECK ("spare_percent" BETWEEN 0 AND 100)`,
  ],
  [
    'guest_data_retention_days',
    `integer NOT NULL DEFAULT ${d.guestDataRetentionDays} CONSTRAINT "CHK_studio_settings_retention" CHECK ("guest_data_retention_days" BETWEEN 0 AND 3650)`,
  ],
];

export class BookingSettings1764806400000 implements MigrationInterface {
  name = 'BookingSettings1764806400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    for (const [name, definition] of COLUMNS) {
      await queryRunner.query(`ALTER TABLE "studio_settings" ADD COLUMN "${name}" ${definition}`);
    }
    await queryRunner.query(
      `UPDATE "studio_settings" SET "cancellation_tiers" = $1, "blackout_dates" = $2`,
      [JSON.stringify(d.cancellationTiers), JSON.stringify(d.blackoutDates)],
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const [name] of [...COLUMNS].reverse()) {
      await queryRunner.query(`ALTER TABLE "studio_settings" DROP COLUMN "${name}"`);
    }
  }
}
