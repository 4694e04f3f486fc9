import type { MigrationInterface, QueryRunner } from 'typeorm';

export class InitialSchema1764633600000 implements MigrationInterface {
  name = 'InitialSchema1764633600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "users" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "email" varchar(254) NOT NULL,
        "name" varchar(120) NOT NULL,
        "password_hash" varchar(255) NOT NULL,
        "role" varchar(16) NOT NULL CHECK ("role" IN ('client', 'chef', 'staff')),
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX "UQ_users_email" ON "users" ("email")`);

    await queryRunner.query(`
      CREATE TABLE "auth_sessions" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "user_id" varchar(36) NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "refresh_hash" varchar(64) NOT NULL,
        "previous_refresh_hash" varchar(64),
        "expires_at" datetime NOT NULL,
        "revoked_at" datetime,
        "revoked_reason" varchar(32),
        "created_at" datetime NOT NULL DEFAULT (datetime('now')),
        "last_used_at" datetime NOT NULL
      )`);
    await queryRunner.query(`CREATE INDEX "IDX_auth_sessions_user" ON "auth_sessions" ("user_id")`);

    await queryRunner.query(`
      CREATE TABLE "studio_settings" (
        "id" integer PRIMARY KEY NOT NULL CHECK ("id" = 1),
        "name" varchar(120) NOT NULL,
        "tagline" varchar(200) NOT NULL,
        "city" varchar(120) NOT NULL,
        "currency" varchar(3) NOT NULL,
        "time_zone" varchar(64) NOT NULL,
        "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
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
