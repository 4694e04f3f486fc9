import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PostgreSQL twin of `../1765100000000-settings-and-team.ts` (see there for the why). */
export class SettingsAndTeam1765100000000 implements MigrationInterface {
  name = 'SettingsAndTeam1765100000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `ALTER TABLE "studio_settings" ADD COLUMN "working_hours_start" varchar(5) NOT NULL DEFAULT '07:00'`,
    );
    await q.query(
      `ALTER TABLE "studio_settings" ADD COLUMN "working_hours_end" varchar(5) NOT NULL DEFAULT '19:00'`,
    );
    await q.query(
      `ALTER TABLE "studio_settings" ADD COLUMN "plating_buffer_minutes" integer NOT NULL DEFAULT 60 CONSTRAINT "CHK_studio_settings_plating_buffer" CHECK ("plating_buffer_minutes" BETWEEN 0 AND 720)`,
    );
    await q.query(`ALTER TABLE "users" ADD COLUMN "removed_at" timestamptz NULL`);
    // SERIAL: an integer filled from its own sequence, as SQLite's AUTOINCREMENT.
    await q.query(
      `CREATE TABLE "settings_changes" (
        "id" SERIAL PRIMARY KEY NOT NULL,
        "changed_by_id" varchar(36) NOT NULL,
        "changed_at" timestamptz NOT NULL,
        "fields" text NOT NULL,
        CONSTRAINT "FK_99501110490e4d710c79bc734c4" FOREIGN KEY ("changed_by_id") REFERENCES "users" ("id") ON DELETE RESTRICT
      )`,
    );
    await q.query(`CREATE INDEX "IDX_settings_changes_at" ON "settings_changes" ("changed_at")`);
    await q.query(
      `CREATE TABLE "staff_invitations" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "email" varchar(254) NOT NULL,
        "name" varchar(120) NOT NULL,
        "role" varchar(16) NOT NULL,
        "token_hash" varchar(64) NOT NULL,
        "invited_by_id" varchar(36) NOT NULL,
        "expires_at" timestamptz NOT NULL,
        "accepted_at" timestamptz NULL,
        "accepted_user_id" varchar(36) NULL,
        "revoked_at" timestamptz NULL,
        "created_at" timestamptz NOT NULL,
        CONSTRAINT "FK_88a24926e6a59de8f0221ed72d4" FOREIGN KEY ("invited_by_id") REFERENCES "users" ("id") ON DELETE RESTRICT,
        CONSTRAINT "FK_2f524d2f80a95169bfabd03e64b" FOREIGN KEY ("accepted_user_id") REFERENCES "users" ("id") ON DELETE SET NULL,
        CONSTRAINT "CHK_staff_invitations_role" CHECK ("role" IN ('staff', 'chef'))
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
