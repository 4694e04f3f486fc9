import { Column, Entity, PrimaryColumn } from 'typeorm';
import { TIMESTAMP } from './portable-schema.js';

/**
 * Requests counted against one rate limit, for API processes that share a PostgreSQL database
 * (postgres-throttler-storage.ts). A single process on SQLite counts in memory and leaves the
 * table empty.
 */
@Entity({ name: 'rate_limit_hits' })
export class RateLimitHitEntity {
  /** The throttler's key: a SHA-256 (hex) of the route and the client (address, account). */
  @PrimaryColumn({ type: 'varchar', length: 64 })
  key: string;

  /** Which limit: `default`, or the name of a route's own. */
  @PrimaryColumn({ type: 'varchar', length: 40 })
  throttler: string;

  @Column({ type: 'integer' })
  hits: number;

  /** When the current window ends and the count starts again. */
  @Column({ name: 'expires_at', type: TIMESTAMP })
  expiresAt: Date;

  /** Set when the limit was passed: refused until then. */
  @Column({ name: 'blocked_until', type: TIMESTAMP, nullable: true })
  blockedUntil: Date | null;
}
