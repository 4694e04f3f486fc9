import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PostgreSQL twin of `../1765460000000-guest-data-privacy.ts` (see there for the why). */
export class GuestDataPrivacy1765460000000 implements MigrationInterface {
  name = 'GuestDataPrivacy1765460000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "order_guest_summaries" (
        "order_id" varchar(36) PRIMARY KEY NOT NULL,
        "guests_listed" integer NOT NULL,
        "guests_with_notes" integer NOT NULL,
        "allergen_counts" text NOT NULL,
        "diet_counts" text NOT NULL,
        "plate_changes" text NOT NULL,
        "reason" varchar(16) NOT NULL,
        "retention_days" integer,
        "removed_at" timestamptz NOT NULL,
        CONSTRAINT "FK_7f587de51bf1df0224a9f3b513a" FOREIGN KEY ("order_id") REFERENCES "orders" ("id") ON DELETE CASCADE,
        CONSTRAINT "CHK_order_guest_summaries_listed" CHECK ("guests_listed" >= 0),
        CONSTRAINT "CHK_order_guest_summaries_with_notes" CHECK ("guests_with_notes" >= 0),
        CONSTRAINT "CHK_order_guest_summaries_reason" CHECK ("reason" IN ('retention', 'account_deleted')),
        CONSTRAINT "CHK_order_guest_summaries_retention" CHECK ("retention_days" >= 0)
      )`);
    await queryRunner.query(`
      CREATE TABLE "consent_records" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "user_id" varchar(36),
        "order_id" varchar(36) NOT NULL,
        "kind" varchar(16) NOT NULL,
        "statement" varchar(300) NOT NULL,
        "at" timestamptz NOT NULL,
        CONSTRAINT "FK_b823aad0deceda10806be9aa447" FOREIGN KEY ("user_id") REFERENCES "users" ("id") ON DELETE SET NULL,
        CONSTRAINT "FK_628957e8798b5e52fcca6727d7d" FOREIGN KEY ("order_id") REFERENCES "orders" ("id") ON DELETE CASCADE,
        CONSTRAINT "CHK_consent_records_kind" CHECK ("kind" IN ('booking_terms', 'guest_data'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_consent_records_user" ON "consent_records" ("user_id", "at")`,
    );
    await queryRunner.query(`
      CREATE TABLE "privacy_audit" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "action" varchar(20) NOT NULL,
        "user_id" varchar(36) NOT NULL,
        "detail" text NOT NULL,
        "at" timestamptz NOT NULL,
        CONSTRAINT "FK_38d09022d44d356c6744f124359" FOREIGN KEY ("user_id") REFERENCES "users" ("id") ON DELETE RESTRICT,
        CONSTRAINT "CHK_privacy_audit_action" CHECK ("action" IN ('data_exported', 'account_deleted'))
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_privacy_audit_user" ON "privacy_audit" ("user_id", "at")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "privacy_audit"`);
    await queryRunner.query(`DROP TABLE "consent_records"`);
    await queryRunner.query(`DROP TABLE "order_guest_summaries"`);
  }
}
