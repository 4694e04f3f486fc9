import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Settings and team: the kitchen's working hours and plating buffer on the settings row, an
 * audit row per settings change, staff invitations (only a SHA-256 of the one-time token is
 * stored), and `removed_at` on users so a removed team member's history stays intact.
 */
export class SettingsAndTeam1765100000000 implements MigrationInterface {
  name = 'SettingsAndTeam1765100000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `ALTER TABLE "studio_settings" ADD COLUMN "working_hours_start" varchar(5) NOT NULL DEFAULT ('07:00')`,
    );
    await q.query(
      `ALTER TABLE "studio_settings" ADD COLUMN "working_hours_end" varchar(5) NOT NULL DEFAULT ('19:00')`,
    );
    await q.query(
      `ALTER TABLE "studio_settings" ADD COLUMN "plating_buffer_minutes" integer NOT NULL DEFAULT (60) CHECK ("plating_buffer_minutes" BETWEEN 0 AND 720)`,
    );
    await q.query(`ALTER TABLE "users" ADD COLUMN "removed_at" datetime NULL`);
    await q.query(
      `CREATE TABLE "settings_changes" (
        "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
        "changed_by_id" varchar(36) NOT NULL REFERENCES "users" ("id") ON DELETE RESTRICT,
        "changed_at" datetime NOT NULL,
        "fields" text NOT NULL
      )`,
    );
    await q.query(`CREATE INDEX "IDX_settings_changes_at" ON "settings_changes" ("changed_at")`);
    await q.query(
      `CREATE TABLE "staff_invitations" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "email" varchar(254) NOT NULL,
        "name" varchar(120) NOT NULL,
        "role" varchar(16) NOT NULL CHECK ("role" IN ('staff', 'chef')),
        "token_hash" varchar(64) NOT NULL,
        "invited_by_id" varchar(36) NOT NULL REFERENCES "users" ("id") ON DELETE RESTRICT,
        "expires_at" datetime NOT NULL,
        "accepted_at" datetime NULL,
        "accepted_user_id" varchar(36) NULL REFERENCES "users" ("id") ON DELETE SET NULL,
        "revoked_at" datetime NULL,
        "created_at" datetime NOT NULL
      )`,
    );
    await q.query(
      `CREATE UNIQUE INDEX "UQ_staff_invitations_token" ON "staff_invitations" ("token_hash")`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "staff_invitations"`);
    await q.query(`DROP TABLE "settings_changes"`);
    await q.query(`ALTER TABLE "users" DROP COLUMN "removed_at"`);
    await q.query(`ALTER TABLE "studio_settings" DROP COLUMN "plating_buffer_minutes"`);
    await q.query(`ALTER TABLE "studio_settings" DROP COLUMN "working_hours_end"`);
    await q.query(`ALTER TABLE "studio_settings" DROP COLUMN "working_hours_start"`);
  }
}
