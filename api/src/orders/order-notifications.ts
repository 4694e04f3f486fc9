import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { PAYMENT_KIND_LABELS } from '../documents/documents.service.js';
import {
  bookingReceivedMail,
  cancellationMail,
  declinedMail,
  guestChangeMail,
  orderConfirmedMail,
  paymentReceivedMail,
  type MailContent,
  type MailStudio,
  type OrderMailFacts,
} from '../mail/booking-mail.js';
import type { OutboxAttachment } from '../mail/entities/outbox-message.entity.js';
import { OutboxService } from '../mail/outbox.service.js';
import type { PaymentEntity } from '../payments/entities/payment.entity.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { BookingContext } from './booking-context.js';
import type { OrderEntity } from './entities/order.entity.js';

/**
 * The e-mails an order's changes cause, queued in the outbox inside the caller's transaction —
 * the message exists if and only if the change does.
 */
@Injectable()
export class OrderNotifications {
  constructor(
    private readonly outbox: OutboxService,
    private readonly context: BookingContext,
  ) {}

  private async send(
    manager: EntityManager,
    order: OrderEntity,
    kind: string,
    build: (studio: MailStudio, facts: OrderMailFacts) => MailContent,
    attachments: OutboxAttachment[] = [],
  ): Promise<void> {
    const client = await manager.findOneByOrFail(User, { id: order.clientId });
    const settings = await manager.findOneByOrFail(StudioSettings, { id: 1 });
    const studio: MailStudio = { name: settings.name, storefrontUrl: this.context.storefrontUrl() };
    const facts: OrderMailFacts = {
      orderId: order.id,
      reference: order.reference,
      clientName: client.name,
      menuName: order.pricing.menuName,
      eventDate: order.eventDate,
      serviceTime: order.serviceTime,
      guestCount: order.guestCount,
      currency: order.currency,
    };
    await this.outbox.enqueue(manager, {
      kind,
      orderId: order.id,
      to: client.email,
      content: build(studio, facts),
      attachments,
    });
  }

  bookingReceived(m: EntityManager, order: OrderEntity, payment: PaymentEntity): Promise<void> {
    return this.send(
      m,
      order,
      'booking_received',
      (s, f) => bookingReceivedMail(s, f, payment.amountMinor, PAYMENT_KIND_LABELS[payment.kind]),
      [{ kind: 'receipt', orderId: order.id, paymentId: payment.id }],
    );
  }

  paymentReceived(
    m: EntityManager,
    order: OrderEntity,
    payment: PaymentEntity,
    balanceMinor: number,
  ): Promise<void> {
    return this.send(
      m,
      order,
      'payment_received',
      (s, f) =>
        paymentReceivedMail(
          s,
          f,
          payment.amountMinor,
          PAYMENT_KIND_LABELS[payment.kind],
          balanceMinor,
        ),
      [{ kind: 'receipt', orderId: order.id, paymentId: payment.id }],
    );
  }

  confirmed(m: EntityManager, order: OrderEntity): Promise<void> {
    return this.send(m, order, 'order_confirmed', orderConfirmedMail, [
      { kind: 'event-file', orderId: order.id },
    ]);
  }

  cancelled(
    m: EntityManager,
    order: OrderEntity,
    refundMinor: number,
    policyMessage: string,
    byStudio: boolean,
  ): Promise<void> {
    return this.send(m, order, 'order_cancelled', (s, f) =>
      cancellationMail(s, f, refundMinor, policyMessage, byStudio),
    );
  }

  declined(m: EntityManager, order: OrderEntity, refundMinor: number): Promise<void> {
    return this.send(m, order, 'order_declined', (s, f) => declinedMail(s, f, refundMinor));
  }

  guestsChanged(
    m: EntityManager,
    order: OrderEntity,
    previousGuestCount: number,
    change: { refundMinor: number; collectMinor: number; message: string },
  ): Promise<void> {
    return this.send(m, order, 'guests_changed', (s, f) =>
      guestChangeMail(s, f, previousGuestCount, change),
    );
  }
}
