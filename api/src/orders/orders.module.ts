import { Module } from '@nestjs/common';
import { APP_FILTER } from '@nestjs/core';
import { AllergyNotesModule } from '../allergy-notes/allergy-notes.module.js';
import { DocumentsModule } from '../documents/documents.module.js';
import { MailModule } from '../mail/mail.module.js';
import { CheckoutService } from '../payments/checkout.service.js';
import { Fulfilment } from '../payments/fulfilment.js';
import { PaymentGateway } from '../payments/payment-gateway.js';
import { RefundService } from '../payments/refunds.service.js';
import { WebhookService } from '../payments/webhook.service.js';
import { WebhooksController } from '../payments/webhooks.controller.js';
import { BookingContext } from './booking-context.js';
import { BookingErrorFilter } from './booking-error.filter.js';
import { BookingController } from './booking.controller.js';
import { OrderNotifications } from './order-notifications.js';
import { OrderViews } from './order-views.js';
import { OrdersController } from './orders.controller.js';
import { OrdersService } from './orders.service.js';

/**
 * Booking: terms, availability, quotes, orders and their lifecycle, payments (checkout,
 * webhooks, refunds, the ledger), documents and the e-mails they cause.
 */
@Module({
  imports: [MailModule, DocumentsModule, AllergyNotesModule],
  controllers: [BookingController, OrdersController, WebhooksController],
  providers: [
    { provide: APP_FILTER, useClass: BookingErrorFilter },
    BookingContext,
    OrderViews,
    OrderNotifications,
    OrdersService,
    PaymentGateway,
    CheckoutService,
    Fulfilment,
    RefundService,
    WebhookService,
  ],
})
export class OrdersModule {}
