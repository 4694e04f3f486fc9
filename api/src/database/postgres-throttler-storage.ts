import type { ThrottlerStorage } from '@nestjs/throttler';
import type { DataSource } from 'typeorm';

interface ThrottlerRecord {
  totalHits: number;
  timeToExpire: number;
  isBlocked: boolean;
  timeToBlockExpire: number;
}

/** Rows of windows that ended this long ago (and are not blocking) are deleted now and then. */
const KEEP_ENDED_WINDOWS = '1 hour';
const SWEEP_EVERY = 500;

/**
 * `@nestjs/throttler`'s storage in the `rate_limit_hits` table, for API processes that share one
 * PostgreSQL database: each request is counted by one atomic upsert, so the limits hold across
 * processes (the default storage counts in each process's memory). Times come from the database's
 * clock, the same for every process.
 *
 * The rule, per key and limit: a window of `ttl` opens with the first request and counts the
 * requests in it; the one that passes `limit` blocks the key for `blockDuration` (the window's
 * length when none is set); once the block ends, counting starts again. The in-memory storage of
 * `@nestjs/throttler` 6 expires each request separately (a sliding log), so a burst at a window's
 * edge may pass one window's worth more here; the limit per window is the same.
 */
export class PostgresThrottlerStorage implements ThrottlerStorage {
  private calls = 0;

  constructor(private readonly dataSource: DataSource) {}

  async increment(
    key: string,
    ttl: number,
    limit: number,
    blockDuration: number,
    throttlerName: string,
  ): Promise<ThrottlerRecord> {
    const block = blockDuration > 0 ? blockDuration : ttl;
    // In the DO UPDATE branch, r.* are the values before this request (PostgreSQL docs, INSERT:
    // ON CONFLICT DO UPDATE), so every column is decided from the same old row.
    const rows = (await this.dataSource.query(
      `INSERT INTO "rate_limit_hits" AS r ("key", "throttler", "hits", "expires_at", "blocked_until")
       VALUES ($1, $2, 1, now() + $3 * interval '1 millisecond',
               CASE WHEN 1 > $4 THEN now() + $5 * interval '1 millisecond' END)
       ON CONFLICT ("key", "throttler") DO UPDATE SET
         "hits" = CASE
           WHEN r."blocked_until" > now() THEN r."hits"
           WHEN r."blocked_until" IS NOT NULL OR r."expires_at" <= now() THEN 1
           ELSE r."hits" + 1 END,
         "expires_at" = CASE
           WHEN r."blocked_until" > now() THEN r."expires_at"
           WHEN r."blocked_until" IS NOT NULL OR r."expires_at" <= now() THEN EXCLUDED."expires_at"
           ELSE r."expires_at" END,
         "blocked_until" = CASE
           WHEN r."blocked_until" > now() THEN r."blocked_until"
           WHEN (CASE WHEN r."blocked_until" IS NOT NULL OR r."expires_at" <= now() THEN 1
                      ELSE r."hits" + 1 END) > $4
             THEN now() + $5 * interval '1 millisecond'
           END
       RETURNING "hits",
         EXTRACT(EPOCH FROM ("expires_at" - now())) AS "expiresIn",
         EXTRACT(EPOCH FROM ("blocked_until" - now())) AS "blockedFor"`,
      [key, throttlerName, ttl, limit, block],
    )) as Array<{ hits: number; expiresIn: string | number; blockedFor: string | number | null }>;
    const row = rows[0]!;
    this.calls += 1;
    if (this.calls % SWEEP_EVERY === 0) await this.sweep();
    const blockedFor = row.blockedFor === null ? 0 : Number(row.blockedFor);
    return {
      totalHits: Number(row.hits),
      timeToExpire: Math.max(0, Math.ceil(Number(row.expiresIn))),
      isBlocked: blockedFor > 0,
      timeToBlockExpire: Math.max(0, Math.ceil(blockedFor)),
    };
  }

  /** Deletes counters whose window ended long ago and that block nothing. */
  async sweep(): Promise<void> {
    await this.dataSource.query(
      `DELETE FROM "rate_limit_hits"
       WHERE "expires_at" < now() - interval '${KEEP_ENDED_WINDOWS}'
         AND ("blocked_until" IS NULL OR "blocked_until" < now())`,
    );
  }
}
