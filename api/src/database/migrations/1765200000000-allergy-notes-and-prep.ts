import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Allergy notes and prep: the substitution the chef records per guest and dessert, the log of
 * who opened a guest's health data (GDPR Art. 9 data: every opening by the studio is kept), and
 * the ticks staff put on prep tasks (who and when).
 */
export class AllergyNotesAndPrep1765200000000 implements MigrationInterface {
  name = 'AllergyNotesAndPrep1765200000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "order_substitutions" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "order_id" varchar(36) NOT NULL REFERENCES "orders" ("id") ON DELETE CASCADE,
        "guest_position" integer NOT NULL CHECK ("guest_position" >= 0),
        "guest_label" varchar(120) NOT NULL,
        "dessert_id" varchar(36) NOT NULL,
        "changes" text NOT NULL,
        "note" varchar(500),
        "recorded_by" varchar(36) REFERENCES "users" ("id") ON DELETE SET NULL,
        "recorded_at" datetime NOT NULL
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_order_substitutions_guest_dessert" ON "order_substitutions" ("order_id", "guest_position", "dessert_id")`,
    );
    await queryRunner.query(`
      CREATE TABLE "guest_data_access_log" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "order_id" varchar(36) NOT NULL REFERENCES "orders" ("id") ON DELETE CASCADE,
        "user_id" varchar(36) REFERENCES "users" ("id") ON DELETE SET NULL,
        "role" varchar(8) NOT NULL,
        "what" varchar(20) NOT NULL CHECK ("what" IN ('allergy_notes', 'briefing', 'briefing_pdf', 'guest_list')),
        "at" datetime NOT NULL
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_guest_data_access_log_order" ON "guest_data_access_log" ("order_id", "at")`,
    );
    await queryRunner.query(`
      CREATE TABLE "prep_task_ticks" (
        "task_key" varchar(64) PRIMARY KEY NOT NULL,
        "production_date" varchar(10) NOT NULL,
        "recipe_id" varchar(36) NOT NULL,
        "step_index" integer NOT NULL,
        "done_by" varchar(36) REFERENCES "users" ("id") ON DELETE SET NULL,
        "done_by_name" varchar(120) NOT NULL,
        "done_at" datetime NOT NULL
      )`);
    await queryRunner.query(
      `CREATE INDEX "IDX_prep_task_ticks_date" ON "prep_task_ticks" ("production_date")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "prep_task_ticks"`);
    await queryRunner.query(`DROP TABLE "guest_data_access_log"`);
    await queryRunner.query(`DROP TABLE "order_substitutions"`);
  }
}
