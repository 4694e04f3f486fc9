import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * PostgreSQL twin of `../1765810000000-rate-limit-hits.ts`. UNLOGGED (PostgreSQL docs, CREATE
 * TABLE): no write-ahead log, so counting a request costs no disk flush; after a crash the table
 * comes back empty, which for rate-limit counters only means a fresh window.
 */
export class RateLimitHits1765810000000 implements MigrationInterface {
  name = 'RateLimitHits1765810000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE UNLOGGED TABLE "rate_limit_hits" (
        "key" varchar(64) NOT NULL,
        "throttler" varchar(40) NOT NULL,
        "hits" integer NOT NULL,
        "expires_at" timestamptz NOT NULL,
        "blocked_until" timestamptz,
        PRIMARY KEY ("key", "throttler")
      )`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "rate_limit_hits"`);
  }
}
