import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Password reset: one row per link sent. Only a SHA-256 of the one-time token is stored; a link
 * works once, for 30 minutes, and a newer request replaces it. Rows stay after use so the number
 * of e-mails sent to an account in the last hour can be counted (the per-account cap).
 */
export class PasswordResetTokens1765700000000 implements MigrationInterface {
  name = 'PasswordResetTokens1765700000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE TABLE "password_reset_tokens" (
        "id" varchar(36) PRIMARY KEY NOT NULL,
        "user_id" varchar(36) NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "token_hash" varchar(64) NOT NULL,
        "created_at" datetime NOT NULL,
        "expires_at" datetime NOT NULL,
        "used_at" datetime NULL,
        "replaced_at" datetime NULL
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
