import { Injectable, NotFoundException } from '@nestjs/common';
import { dateInTimeZone, formatIsoDate, OrderStatus, type PaymentKind } from '@nappe/shared';
import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { PaymentEntity } from '../payments/entities/payment.entity.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';
import { renderEventFile } from './event-calendar.js';
import { renderReceiptPdf } from './receipt-pdf.js';

export const PAYMENT_KIND_LABELS: Record<PaymentKind, string> = {
  deposit: 'Deposit',
  full: 'Payment in full',
  balance: 'Balance',
  top_up: 'Payment for added guests',
  refund: 'Refund',
};

export interface RenderedDocument<T> {
  filename: string;
  content: T;
}

/**
 * The Receipt (PDF) and the Event file (.ics), rendered on request from the stored rows.
 * Callers check who may see the order first; this service only finds and renders.
 */
@Injectable()
export class DocumentsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly env: Env,
  ) {}

  async receipt(orderId: string, paymentId: string): Promise<RenderedDocument<Buffer>> {
    const found = await this.dataSource.transaction(async (m) => {
      const payment = await m.findOneBy(PaymentEntity, { id: paymentId, orderId });
      if (!payment || payment.status !== 'succeeded' || !payment.settledAt) return null;
      const order = await m.findOneByOrFail(OrderEntity, { id: orderId });
      const client = await m.findOneByOrFail(User, { id: order.clientId });
      const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
      return { payment, order, client, studio };
    });
    if (!found) throw new NotFoundException('There is no receipt for that payment.');
    const { payment, order, client, studio } = found;
    const receiptNumber = `${order.reference}-${payment.id.slice(0, 8).toUpperCase()}`;
    const depositNote = payment.kind === 'deposit' ? ` (${order.pricing.depositPercent} %)` : '';
    const content = await renderReceiptPdf({
      studioName: studio.name,
      studioCity: studio.city,
      receiptNumber,
      issuedOn: formatIsoDate(dateInTimeZone(payment.settledAt!, studio.timeZone)),
      clientName: client.name,
      clientEmail: client.email,
      reference: order.reference,
      menuName: order.pricing.menuName,
      guestCount: order.guestCount,
      eventOn: `${formatIsoDate(order.eventDate)} at ${order.serviceTime}`,
      description: `${PAYMENT_KIND_LABELS[payment.kind]}${depositNote}`,
      isRefund: payment.kind === 'refund',
      amountMinor: payment.amountMinor,
      currency: payment.currency,
      taxRateBp: order.pricing.taxRateBp,
      seeded: payment.seeded,
    });
    return { filename: `receipt-${receiptNumber}.pdf`, content };
  }

  async eventFile(orderId: string): Promise<RenderedDocument<string>> {
    const found = await this.dataSource.transaction(async (m) => {
      const order = await m.findOneBy(OrderEntity, { id: orderId });
      if (!order) return null;
      const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
      return { order, studio };
    });
    if (!found) throw new NotFoundException('There is no booking with that id.');
    const { order, studio } = found;
    const base = (this.env.PUBLIC_STOREFRONT_URL ?? '').replace(/\/$/, '');
    const content = renderEventFile({
      orderId: order.id,
      reference: order.reference,
      studioName: studio.name,
      menuName: order.pricing.menuName,
      guestCount: order.guestCount,
      eventDate: order.eventDate,
      serviceTime: order.serviceTime,
      timeZone: studio.timeZone,
      venueAddressLines: order.venueAddressLines,
      eventUrl: `${base}/my-events/${order.id}`,
      cancelled: [OrderStatus.Cancelled, OrderStatus.Declined, OrderStatus.Expired].includes(
        order.status,
      ),
      createdAt: order.createdAt,
    });
    return { filename: `event-${order.reference}.ics`, content };
  }
}
