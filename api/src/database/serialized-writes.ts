import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';

/**
 * On SQLite every transaction already runs alone (sqlite-serializer.ts), so a read-then-write
 * never sees another request slip in between. PostgreSQL runs transactions side by side (a pool,
 * READ COMMITTED), so each place whose correctness relied on running alone takes a lock here, at
 * the start of its transaction, before it reads what it decides on:
 *
 * - a row lock (`SELECT … FOR NO KEY UPDATE`, PostgreSQL docs 13.3.2) when the decision is about
 *   one existing row — an order (every change to a booking and its ledger, via `orderFor` and the
 *   fulfilment of payments), a sign-in session (refresh-token rotation and reuse detection), an
 *   invitation (accepted once). A second writer waits, then reads what the first committed;
 *   in READ COMMITTED each statement sees every commit made before it began (13.2.1).
 * - a transaction-scoped advisory lock (`pg_advisory_xact_lock`, 9.27.10) when there is no row
 *   to lock yet — the day book (plates of a date, booking references, a client's unpaid
 *   bookings and Idempotency-Key replays), a webhook event id, an e-mail address being
 *   registered, the outbox claim, the kitchen catalogue's cross-row rules. Taken by several API
 *   processes on one database, they serialise across processes too.
 *
 * Both end with the transaction. On SQLite the call does nothing.
 */
export type LockTarget = { row: EntityTarget<ObjectLiteral>; id: string } | { key: string };

/** Booking a date: its plates, the year's reference numbers, a client's unpaid bookings. */
export const DAY_BOOK: LockTarget = { key: 'day-book' };
/** Claiming due e-mails from the outbox. */
export const OUTBOX_CLAIM: LockTarget = { key: 'outbox-claim' };
/** Writes checked against the whole kitchen catalogue (no recipe loops, nothing in use deleted). */
export const KITCHEN_CATALOGUE: LockTarget = { key: 'kitchen-catalogue' };

export const lockKey = (kind: string, id: string): LockTarget => ({ key: `${kind}:${id}` });

export async function lockFor(manager: EntityManager, ...targets: LockTarget[]): Promise<void> {
  if (manager.connection.options.type !== 'postgres') return;
  if (!manager.queryRunner?.isTransactionActive) {
    // Outside a transaction the lock would end with the statement that took it.
    throw new Error('lockFor() must run inside a transaction');
  }
  for (const target of targets) {
    if ('key' in target) {
      // hashtextextended: a 64-bit hash of the key (PostgreSQL 11+); a collision only makes two
      // unrelated writers wait for each other.
      await manager.query('SELECT pg_advisory_xact_lock(hashtextextended($1, 0))', [target.key]);
    } else {
      await manager
        .createQueryBuilder(target.row, 'locked')
        .select('1')
        .where('locked.id = :id', { id: target.id })
        .setLock('for_no_key_update')
        .getRawMany();
    }
  }
}
