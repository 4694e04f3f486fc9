import { Injectable } from '@nestjs/common';
import { In, type EntityManager } from 'typeorm';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { guestDetailsState } from '../privacy/guest-retention.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { BookingContext } from './booking-context.js';
import { OrderEventEntity } from './entities/order-event.entity.js';
import { OrderGuestEntity } from './entities/order-guest.entity.js';
import { OrderEntity } from './entities/order.entity.js';
import { toOrderDetail, type OrderView } from './order.mapper.js';
import type { OrderDetail } from '@nappe/shared';

/** Reads an order with everything its detail shows, in the caller's transaction. */
@Injectable()
export class OrderViews {
  constructor(private readonly context: BookingContext) {}

  async view(manager: EntityManager, order: OrderEntity): Promise<OrderView> {
    const client = await manager.findOneByOrFail(User, { id: order.clientId });
    const guests = await manager.find(OrderGuestEntity, { where: { orderId: order.id } });
    const payments = await manager.find(PaymentEntity, { where: { orderId: order.id } });
    const events = await manager.find(OrderEventEntity, {
      where: { orderId: order.id },
      order: { seq: 'ASC' },
    });
    const actorIds = [...new Set(events.map((e) => e.actorUserId).filter((id) => id !== null))];
    const actors =
      actorIds.length === 0 ? [] : await manager.find(User, { where: { id: In(actorIds) } });
    const names = new Map(actors.map((a) => [a.id, a.name]));
    return {
      order,
      client: { name: client.name, email: client.email },
      guests,
      payments,
      events: events.map((event) => ({
        event,
        actorName: event.actorUserId ? (names.get(event.actorUserId) ?? null) : null,
      })),
    };
  }

  /**
   * The order's detail. Once its guest details are removed (the retention date has passed, or
   * the client deleted their account) the guest list is empty for everyone and the detail carries
   * `guestDetailsRemoved` saying why and since when.
   */
  async detail(manager: EntityManager, order: OrderEntity): Promise<OrderDetail> {
    const studio = await manager.findOneByOrFail(StudioSettings, { id: 1 });
    const today = this.context.today(studio.timeZone);
    const removed = await guestDetailsState(
      manager,
      order,
      studio.guestDataRetentionDays,
      today,
      studio.timeZone,
    );
    const view = await this.view(manager, order);
    if (!removed) return toOrderDetail(view, today);
    return Object.assign(toOrderDetail({ ...view, guests: [] }, today), {
      guestDetailsRemoved: removed,
    });
  }

  async detailById(manager: EntityManager, id: string): Promise<OrderDetail> {
    return this.detail(manager, await manager.findOneByOrFail(OrderEntity, { id }));
  }
}
