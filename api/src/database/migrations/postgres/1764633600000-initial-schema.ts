import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * PostgreSQL twin of `../1764633600000-initial-schema.ts`: the same tables, columns, keys and
 * rules, in PostgreSQL's types (`timestamptz` for points in time). Constraints carry the names
 * TypeORM gives them in the entities (foreign keys) or that `postgres-checks.ts` declares (checks),
 * so the schema builder finds nothing to change.
 */
export class InitialSchema1764633600000 implements MigrationInterface {
  name = 'InitialSchema1764633600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "users" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "email" varchar(254) NOT NULL,
        "name" varchar(120) NOT NULL,
        "password_hash" varchar(255) NOT NULL,
        "role" varchar(16) NOT NULL,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "CHK_users_role" CHECK ("role" IN ('client', 'chef', 'staff'))
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX "UQ_users_email" ON "users" ("email")`);

    await queryRunner.query(`
      CREATE TABLE "auth_sessions" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "user_id" varchar(36) NOT NULL,
        "refresh_hash" varchar(64) NOT NULL,
        "previous_refresh_hash" varchar(64),
        "expires_at" timestamptz NOT NULL,
        "revoked_at" timestamptz,
        "revoked_reason" varchar(32),
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "last_used_at" timestamptz NOT NULL,
        CONSTRAINT "FK_50ccaa6440288a06f0ba693ccc6" FOREIGN KEY ("user_id") REFERENCES "users" ("id") ON DELETE CASCADE
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_auth_sessions_user" ON "auth_sessions" ("user_id")`);

    await queryRunner.query(`
      CREATE TABLE "studio_settings" (
        "id" integer PRIMARY KEY NOT NULL,
        "name" varchar(120) NOT NULL,
        "tagline" varchar(200) NOT NULL,
        "city" varchar(120) NOT NULL,
        "currency" varchar(3) NOT NULL,
        "time_zone" varchar(64) NOT NULL,
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "CHK_studio_settings_single_row" CHECK ("id" = 1)
      )`);
    // The studio always has a settings row; the seed or the chef fills in the real values.
    await queryRunner.query(`
      INSERT INTO "studio_settings" ("id", "name", "tagline", "city", "currency", "time_zone")
      VALUES (1, 'Your dessert studio', 'Plated desserts for private events', '', 'EUR', 'UTC')`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "studio_settings"`);
    await queryRunner.query(`DROP INDEX "IDX_auth_sessions_user"`);
    await queryRunner.query(`DROP TABLE "auth_sessions"`);
    await queryRunner.query(`DROP INDEX "UQ_users_email"`);
    await queryRunner.query(`DROP TABLE "users"`);
  }
}
