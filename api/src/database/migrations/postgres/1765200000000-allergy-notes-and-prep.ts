import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PostgreSQL twin of `../1765200000000-allergy-notes-and-prep.ts` (see there for the why). */
export class AllergyNotesAndPrep1765200000000 implements MigrationInterface {
  name = 'AllergyNotesAndPrep1765200000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "order_substitutions" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "order_id" varchar(36) NOT NULL,
        "guest_position" integer NOT NULL,
        "guest_label" varchar(120) NOT NULL,
        "dessert_id" varchar(36) NOT NULL,
        "changes" text NOT NULL,
        "note" varchar(500),
        "recorded_by" varchar(36),
        "recorded_at" timestamptz NOT NULL,
        CONSTRAINT "FK_9d930456ff8f2cceaffb50a5921" FOREIGN KEY ("order_id") REFERENCES "orders" ("id") ON DELETE CASCADE,
        CONSTRAINT "FK_556043b71795bee41556051d338" FOREIGN KEY ("recorded_by") REFERENCES "users" ("id") ON DELETE SET NULL,
        CONSTRAINT "CHK_order_substitutions_guest_position" CHECK ("guest_position" >= 0)
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_order_substitutions_guest_dessert" ON "order_substitutions" ("order_id", "guest_position", "dessert_id")`,
    );
    await queryRunner.query(`
      CREATE TABLE "guest_data_access_log" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "order_id" varchar(36) NOT NULL,
        "user_id" varchar(36),
        "role" varchar(8) NOT NULL,
        "what" varchar(20) NOT NULL,
        "at" timestamptz NOT NULL,
        CONSTRAINT "FK_57754cf0e7c3e8aa3d7db07954e" FOREIGN KEY ("order_id") REFERENCES "orders" ("id") ON DELETE CASCADE,
        CONSTRAINT "FK_a1780d8a9f959fbb60116769b94" FOREIGN KEY ("user_id") REFERENCES "users" ("id") ON DELETE SET NULL,
        CONSTRAINT "CHK_guest_data_access_log_what" CHECK ("what" IN ('allergy_notes', 'briefing', 'briefing_pdf', 'guest_list'))
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
        "done_by" varchar(36),
        "done_by_name" varchar(120) NOT NULL,
        "done_at" timestamptz NOT NULL,
        CONSTRAINT "FK_5c4231a508537d510536a859792" FOREIGN KEY ("done_by") REFERENCES "users" ("id") ON DELETE SET NULL
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
