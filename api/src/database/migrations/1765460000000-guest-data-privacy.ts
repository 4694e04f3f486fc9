import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Guest data is health data (DESIGN.md): the anonymous counts kept when an order's guest details
 * are removed (retention or account deletion), the consents given with a booking, and the audit
 * of a client's export and erasure requests.
 */
export class GuestDataPrivacy1765460000000 implements MigrationInterface {
  name = 'GuestDataPrivacy1765460000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "order_guest_summaries" (
        "order_id" varchar(36) PRIMARY KEY NOT NULL REFERENCES "orders" ("id") ON DELETE CASCADE,
        "guests_listed" integer NOT NULL CHECK ("guests_listed" >= 0),
        "guests_with_notes" integer NOT NULL CHECK ("guests_with_notes" >= 0),
        "allergen_counts" text NOT NULL,
        "diet_counts" text NOT NULL,
        "plate_changes" text NOT NULL,
        "reason" varchar(16) NOT NULL CHECK ("reason" IN ('retention', 'account_deleted')),
        "retention_days" integer CHECK ("retention_days" >= 0),
        "removed_at" datetime NOT NULL
      )`);
    await queryRunner.query(`
      CREATE TABLE "consent_records" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "user_id" varchar(36) REFERENCES "users" ("id") ON DELETE SET NULL,
        "order_id" varchar(36) NOT NULL REFERENCES "orders" ("id") ON DELETE CASCADE,
        "kind" varchar(16) NOT NULL CHECK ("kind" IN ('booking_terms', 'guest_data')),
        "statement" varchar(300) NOT NULL,
        "at" datetime NOT NULL
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_consent_records_user" ON "consent_records" ("user_id", "at")`,
    );
    await queryRunner.query(`
      CREATE TABLE "privacy_audit" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "action" varchar(20) NOT NULL CHECK ("action" IN ('data_exported', 'account_deleted')),
        "user_id" varchar(36) NOT NULL REFERENCES "users" ("id") ON DELETE RESTRICT,
        "detail" text NOT NULL,
        "at" datetime NOT NULL
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
