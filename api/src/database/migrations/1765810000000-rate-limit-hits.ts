import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Rate-limit counters kept in the database, so that several API processes sharing a PostgreSQL
 * database enforce one limit between them. On SQLite (one process) the counters stay in memory
 * and this table stays empty; it exists so both databases have the same schema.
 */
export class RateLimitHits1765810000000 implements MigrationInterface {
  name = 'RateLimitHits1765810000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE TABLE "rate_limit_hits" (
        "key" varchar(64) NOT NULL,
        "throttler" varchar(40) NOT NULL,
        "hits" integer NOT NULL,
        "expires_at" datetime NOT NULL,
        "blocked_until" datetime,
        PRIMARY KEY ("key", "throttler")
      )`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "rate_limit_hits"`);
  }
}
