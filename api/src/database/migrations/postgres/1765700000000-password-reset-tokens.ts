import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PostgreSQL twin of `../1765700000000-password-reset-tokens.ts` (see there for the why). */
export class PasswordResetTokens1765700000000 implements MigrationInterface {
  name = 'PasswordResetTokens1765700000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE TABLE "password_reset_tokens" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "user_id" varchar(36) NOT NULL,
        "token_hash" varchar(64) NOT NULL,
        "created_at" timestamptz NOT NULL,
        "expires_at" timestamptz NOT NULL,
        "used_at" timestamptz NULL,
        "replaced_at" timestamptz NULL,
        CONSTRAINT "FK_52ac39dd8a28730c63aeb428c9c" FOREIGN KEY ("user_id") REFERENCES "users" ("id") ON DELETE CASCADE
      )`,
    );
    await q.query(
      `CREATE UNIQUE INDEX "UQ_password_reset_tokens_token" ON "password_reset_tokens" ("token_hash")`,
    );
    await q.query(
      `CREATE INDEX "IDX_password_reset_tokens_user" ON "password_reset_tokens" ("user_id", "created_at")`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "password_reset_tokens"`);
  }
}
