import { OrderStatus, STATUSES_HOLDING_CAPACITY, type IsoDate } from '@nappe/shared';
import { Brackets, type EntityManager } from 'typeorm';
import { OrderEntity } from './entities/order.entity.js';

/** Statuses that hold their plates whatever the time; `pending_payment` holds them until its hold ends. */
const FIRM_HOLDS = STATUSES_HOLDING_CAPACITY.filter((s) => s !== OrderStatus.PendingPayment);

/**
 * Plates already held per event date between `from` and `to` (both included): orders requested
 * or confirmed, and orders awaiting payment whose hold has not ended at `now`. Run it in the
 * transaction that books, so the check and the insert see the same rows.
 */
export async function platesTaken(
  manager: EntityManager,
  from: IsoDate,
  to: IsoDate,
  now: Date,
  excludeOrderId?: string,
): Promise<Map<IsoDate, number>> {
  const qb = manager
    .createQueryBuilder(OrderEntity, 'o')
    .select('o.eventDate', 'date')
    .addSelect('SUM(o.plates)', 'plates')
    .where('o.eventDate BETWEEN :from AND :to', { from, to })
    .andWhere(
      new Brackets((w) => {
        w.where('o.status IN (:...firm)', { firm: FIRM_HOLDS }).orWhere(
          '(o.status = :pending AND o.holdExpiresAt > :now)',
          { pending: OrderStatus.PendingPayment, now },
        );
      }),
    )
    .groupBy('o.eventDate');
  if (excludeOrderId) qb.andWhere('o.id <> :exclude', { exclude: excludeOrderId });
  const rows = await qb.getRawMany<{ date: string; plates: number | string }>();
  return new Map(rows.map((r) => [r.date, Number(r.plates)]));
}
