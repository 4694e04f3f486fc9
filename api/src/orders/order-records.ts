import { randomUUID } from 'node:crypto';
import { ConflictException, NotFoundException } from '@nestjs/common';
import { OrderStatus, Role, transition, type OrderActor } from '@nappe/shared';
import { In, type EntityManager } from 'typeorm';
import type { Principal } from '../auth/principal.js';
import { lockFor } from '../database/serialized-writes.js';
import { OrderEventEntity, type OrderEventActorRole } from './entities/order-event.entity.js';
import { OrderEntity } from './entities/order.entity.js';

/** Who makes a change: a signed-in user, or the system (payments, expiry). */
export interface Actor {
  userId: string | null;
  role: OrderEventActorRole;
}

export const SYSTEM: Actor = { userId: null, role: 'system' };

export function actorOf(principal: Principal): Actor {
  return { userId: principal.id, role: principal.role };
}

/** The actor as the shared transition table knows them (staff make no transitions). */
function tableActor(actor: Actor): OrderActor | null {
  return actor.role === 'staff' ? null : actor.role;
}

export function noSuchOrder(): NotFoundException {
  return new NotFoundException('There is no booking with that id.');
}

/**
 * The order as `principal` may see it: a client only their own (another client's id is simply
 * not found — OWASP API1), the chef and staff any. Call it first in the transaction: on
 * PostgreSQL it locks the order's row until the transaction ends, so every change to a booking
 * and its ledger runs one at a time, as on SQLite (serialized-writes.ts).
 */
export async function orderFor(
  manager: EntityManager,
  principal: Principal,
  id: string,
): Promise<OrderEntity> {
  await lockFor(manager, { row: OrderEntity, id });
  const order = await manager.findOneBy(OrderEntity, { id });
  if (!order || (principal.role === Role.Client && order.clientId !== principal.id)) {
    throw noSuchOrder();
  }
  return order;
}

export interface EventRecord {
  from?: OrderStatus | null;
  to?: OrderStatus | null;
  summary: string;
  reason?: string | null;
}

/** One line of the audit trail, written in the caller's transaction. */
export async function recordEvent(
  manager: EntityManager,
  now: Date,
  orderId: string,
  actor: Actor,
  event: EventRecord,
): Promise<void> {
  const last = await manager
    .createQueryBuilder(OrderEventEntity, 'e')
    .select('MAX(e.seq)', 'seq')
    .where('e.orderId = :orderId', { orderId })
    .getRawOne<{ seq: number | string | null }>();
  await manager.insert(OrderEventEntity, {
    id: randomUUID(),
    orderId,
    seq: Number(last?.seq ?? 0) + 1,
    actorUserId: actor.userId,
    actorRole: actor.role,
    fromStatus: event.from ?? null,
    toStatus: event.to ?? null,
    summary: event.summary.slice(0, 300),
    reason: event.reason?.trim() ? event.reason.trim().slice(0, 500) : null,
    at: now,
  });
}

/**
 * Moves an order to `to` if the ONE transition table allows it for this actor (else the shared
 * OrderTransitionError, a 409), writing the status, any other changed columns and the audit line
 * in the caller's transaction. The update is guarded by the status read, so a concurrent change
 * on a database without our connection lock still cannot be overwritten.
 */
export async function transitionOrder(
  manager: EntityManager,
  now: Date,
  order: OrderEntity,
  to: OrderStatus,
  actor: Actor,
  event: { summary: string; reason?: string | null },
  changes: Partial<Pick<OrderEntity, 'holdExpiresAt'>> = {},
): Promise<void> {
  const who = tableActor(actor);
  if (who === null) {
    throw new ConflictException({
      statusCode: 409,
      message: 'Staff accounts cannot change a booking’s status.',
      error: 'Conflict',
    });
  }
  const result = transition(order.status, to, who);
  if (!result.ok) throw result.error;
  const from = order.status;
  const update = await manager.update(
    OrderEntity,
    { id: order.id, status: from },
    { status: to, updatedAt: now, ...changes },
  );
  if (update.affected !== 1) {
    throw new ConflictException({
      statusCode: 409,
      message: 'This booking was changed at the same moment; reload it and try again.',
      error: 'Conflict',
    });
  }
  order.status = to;
  Object.assign(order, changes);
  await recordEvent(manager, now, order.id, actor, { from, to, ...event });
}

/**
 * When each order was last confirmed, from the audit trail: the moment work on it could begin,
 * from which its lead time is checked once it is confirmed.
 */
export async function confirmationTimes(
  manager: EntityManager,
  orderIds: readonly string[],
): Promise<Record<string, string>> {
  if (orderIds.length === 0) return {};
  const rows = await manager.find(OrderEventEntity, {
    select: { orderId: true, at: true },
    where: { orderId: In([...orderIds]), toStatus: OrderStatus.Confirmed },
  });
  const times: Record<string, string> = {};
  for (const row of rows) {
    const at = new Date(row.at).toISOString();
    const known = times[row.orderId];
    if (!known || at > known) times[row.orderId] = at;
  }
  return times;
}
