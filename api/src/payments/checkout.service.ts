import { randomUUID } from 'node:crypto';
import { ConflictException, Injectable, Logger, NotFoundException } from '@nestjs/common';
import {
  canBook,
  formatIsoDate,
  formatRateBp,
  OrderStatus,
  type CheckoutResponse,
  type OrderDetail,
} from '@nappe/shared';
import type Stripe from 'stripe';
import { DataSource, IsNull, type EntityManager } from 'typeorm';
import type { Principal } from '../auth/principal.js';
import { PAYMENT_KIND_LABELS } from '../documents/documents.service.js';
import { BookingContext } from '../orders/booking-context.js';
import { DAY_BOOK, lockFor } from '../database/serialized-writes.js';
import { platesTaken } from '../orders/capacity.js';
import { OrderEntity } from '../orders/entities/order.entity.js';
import { amountToPay, summarizeLedger, type CheckoutPlan } from '../orders/order-money.js';
import { orderFor } from '../orders/order-records.js';
import { OrderViews } from '../orders/order-views.js';
import { CHECKOUT_HOLD_MINUTES } from '../studio/booking-settings.js';
import { User } from '../users/entities/user.entity.js';
import { PaymentEntity } from './entities/payment.entity.js';
import { Fulfilment } from './fulfilment.js';
import { PaymentGateway, PaymentServiceError } from './payment-gateway.js';

/** A checkout kept open this long or less is not handed out again; a new one is made. */
const REUSE_MARGIN_MS = 5 * 60_000;

interface PreparedCheckout {
  order: OrderEntity;
  row: PaymentEntity;
  clientEmail: string;
  /** True when this request wrote the row (and must remove it if the service says nothing). */
  fresh: boolean;
  holdBefore: Date | null;
  holdAfter: Date | null;
}

/**
 * Opening a checkout at the payment service, and coming back from it.
 *
 * The ledger row comes first, in a transaction: it fixes the amount, the expiry and the
 * idempotency key `order:<id>:<plan>:v<amountVersion>`, so two concurrent "Pay" clicks send the
 * SAME request with the SAME key and get one session (the service answers the second with the
 * first's result). The call itself is made outside any transaction.
 */
@Injectable()
export class CheckoutService {
  private readonly logger = new Logger(CheckoutService.name);

  constructor(
    private readonly dataSource: DataSource,
    private readonly gateway: PaymentGateway,
    private readonly context: BookingContext,
    private readonly fulfilment: Fulfilment,
    private readonly views: OrderViews,
  ) {}

  async start(
    principal: Principal,
    orderId: string,
    plan: CheckoutPlan,
  ): Promise<CheckoutResponse> {
    const prepared = await this.dataSource.transaction((m) =>
      this.prepare(m, principal, orderId, plan),
    );
    return this.open(prepared);
  }

  private async prepare(
    m: EntityManager,
    principal: Principal,
    orderId: string,
    plan: CheckoutPlan,
  ): Promise<PreparedCheckout> {
    const order = await orderFor(m, principal, orderId);
    const client = await m.findOneByOrFail(User, { id: order.clientId });
    const studio = await this.context.studio(m);
    const now = this.context.now();
    const today = this.context.today(studio.settings.timeZone);
    const payments = await m.find(PaymentEntity, { where: { orderId } });
    const ledger = summarizeLedger(payments);
    if (ledger.pendingRefundMinor > 0) {
      throw conflict('A refund on this booking is still being confirmed; try again in a minute.');
    }
    const { kind, amountMinor } = amountToPay(order, ledger, plan, today);

    const reusable = payments.find(
      (p) =>
        p.status === 'pending' &&
        p.kind === kind &&
        p.amountMinor === amountMinor &&
        p.checkoutExpiresAt !== null &&
        p.checkoutExpiresAt.getTime() - now.getTime() > REUSE_MARGIN_MS,
    );
    if (reusable) {
      return {
        order,
        row: reusable,
        clientEmail: client.email,
        fresh: false,
        holdBefore: order.holdExpiresAt,
        holdAfter: order.holdExpiresAt,
      };
    }

    const holdBefore = order.holdExpiresAt;
    if (order.status === OrderStatus.PendingPayment && (!holdBefore || holdBefore <= now)) {
      // The hold ended: the plates were free for others meanwhile. Take them again if they are there.
      const menu = await this.context.menu(m, order.menuId);
      await lockFor(m, DAY_BOOK); // taking plates from the day again: one booking at a time
      const taken = await platesTaken(m, order.eventDate, order.eventDate, now, order.id);
      const check = canBook(order.eventDate, order.guestCount, {
        settings: studio.settings,
        platesTaken: taken,
        today,
        menu: {
          name: order.pricing.menuName,
          leadDays: 0,
          minGuests: 1,
          maxGuests: Number.MAX_SAFE_INTEGER,
          platesPerGuest: Math.max(1, Math.round(order.plates / order.guestCount)),
        },
      });
      if (!menu || !check.ok) {
        throw conflict(
          `${formatIsoDate(order.eventDate)} is no longer available for this booking${check.ok ? '' : `: ${check.message}`}`,
        );
      }
    }
    // The payment service wants at least 30 minutes between its own receipt of the request and
    // expires_at: a minute of margin covers the trip and any clock skew between the two.
    const expiresAt = new Date(
      Math.ceil(now.getTime() / 1000) * 1000 + CHECKOUT_HOLD_MINUTES * 60_000 + 60_000,
    );
    const row = m.create(PaymentEntity, {
      id: randomUUID(),
      orderId,
      kind,
      status: 'pending',
      amountMinor,
      currency: order.currency,
      idempotencyKey: `order:${order.id}:${plan}:v${order.amountVersion}`,
      providerSessionId: null,
      checkoutUrl: null,
      checkoutExpiresAt: expiresAt,
      providerPaymentIntentId: null,
      providerRefundId: null,
      refundOfPaymentId: null,
      operation: null,
      targetGuestCount: null,
      failureMessage: null,
      seeded: false,
      createdAt: now,
      settledAt: null,
      updatedAt: now,
    });
    await m.insert(PaymentEntity, row);
    const holdAfter =
      order.status === OrderStatus.PendingPayment &&
      (!holdBefore || holdBefore.getTime() < expiresAt.getTime())
        ? expiresAt
        : holdBefore;
    await m.update(
      OrderEntity,
      { id: order.id },
      { amountVersion: order.amountVersion + 1, holdExpiresAt: holdAfter, updatedAt: now },
    );
    return { order, row, clientEmail: client.email, fresh: true, holdBefore, holdAfter };
  }

  private sessionParams(p: PreparedCheckout): Stripe.Checkout.SessionCreateParams {
    const { order, row } = p;
    const base = this.context.storefrontUrl();
    const currency = order.currency.toLowerCase();
    const what = `${order.pricing.menuName}, ${order.guestCount} guests, ${formatIsoDate(order.eventDate)}`;
    const lines: Stripe.Checkout.SessionCreateParams.LineItem[] =
      row.kind === 'full'
        ? [
            ...order.quote.lines.map((line) => ({
              quantity: line.quantity,
              price_data: {
                currency,
                unit_amount: line.unitPriceMinor,
                product_data: { name: `${line.description} — ${formatIsoDate(order.eventDate)}` },
              },
            })),
            ...(order.quote.pricesIncludeTax || order.quote.taxMinor === 0
              ? []
              : [
                  {
                    quantity: 1,
                    price_data: {
                      currency,
                      unit_amount: order.quote.taxMinor,
                      product_data: { name: `Tax at ${formatRateBp(order.quote.taxRateBp)}` },
                    },
                  },
                ]),
          ]
        : [
            {
              quantity: 1,
              price_data: {
                currency,
                unit_amount: row.amountMinor,
                product_data: {
                  name: `${PAYMENT_KIND_LABELS[row.kind]}${row.kind === 'deposit' ? ` (${order.pricing.depositPercent} %)` : ''} — ${what}`,
                },
              },
            },
          ];
    return {
      mode: 'payment',
      line_items: lines,
      customer_email: p.clientEmail,
      client_reference_id: order.id,
      metadata: {
        orderId: order.id,
        paymentId: row.id,
        plan: row.kind,
        reference: order.reference,
      },
      payment_intent_data: {
        description: `${order.reference} ${PAYMENT_KIND_LABELS[row.kind]}`,
        metadata: { orderId: order.id, paymentId: row.id },
      },
      success_url: `${base}/my-events/${order.id}/booked?session_id={CHECKOUT_SESSION_ID}`,
      cancel_url: `${base}/my-events/${order.id}`,
      expires_at: Math.floor(row.checkoutExpiresAt!.getTime() / 1000),
    };
  }

  private response(row: PaymentEntity, url: string, sessionId: string): CheckoutResponse {
    return {
      checkoutUrl: url,
      sessionId,
      amountMinor: row.amountMinor,
      currency: row.currency,
      expiresAt: row.checkoutExpiresAt!.toISOString(),
    };
  }

  private async open(p: PreparedCheckout): Promise<CheckoutResponse> {
    const { row } = p;
    if (row.providerSessionId && row.checkoutUrl) {
      return this.response(row, row.checkoutUrl, row.providerSessionId);
    }
    let session: Stripe.Checkout.Session;
    try {
      session = await this.gateway.createCheckoutSession(this.sessionParams(p), row.idempotencyKey);
    } catch (error) {
      if (!(error instanceof PaymentServiceError)) throw error;
      if (p.fresh) await this.undo(p);
      throw error.toHttp();
    }
    if (!session.url) throw new PaymentServiceError(false, 'the checkout has no page').toHttp();
    await this.dataSource.transaction((m) =>
      m.update(
        PaymentEntity,
        { id: row.id },
        { providerSessionId: session.id, checkoutUrl: session.url, updatedAt: this.context.now() },
      ),
    );
    await this.closeOtherCheckouts(p.order.id, row.id);
    return this.response(row, session.url, session.id);
  }

  /** The service never answered: take back the row and the hold this request wrote. */
  private async undo(p: PreparedCheckout): Promise<void> {
    await this.dataSource.transaction(async (m) => {
      await m.delete(PaymentEntity, {
        id: p.row.id,
        status: 'pending',
        providerSessionId: IsNull(),
      });
      if (p.holdAfter !== p.holdBefore) {
        await m.update(
          OrderEntity,
          { id: p.order.id, holdExpiresAt: p.holdAfter as Date },
          { holdExpiresAt: p.holdBefore },
        );
      }
    });
  }

  /** Only one checkout of an order stays open: older ones are closed (best effort). */
  private async closeOtherCheckouts(orderId: string, keepId: string): Promise<void> {
    const others = await this.dataSource.transaction((m) =>
      m.find(PaymentEntity, { where: { orderId, status: 'pending' } }),
    );
    for (const other of others) {
      if (other.id === keepId || other.kind === 'refund' || !other.providerSessionId) continue;
      try {
        await this.gateway.expireCheckoutSession(
          other.providerSessionId,
          `order:${orderId}:close:${other.id}`,
        );
      } catch (error) {
        this.logger.warn(`Could not close checkout ${other.providerSessionId}: ${String(error)}`);
      }
    }
  }

  /**
   * The browser is back from the payment page: read the session from the service (outside any
   * transaction), then apply it with the same fulfilment function as the webhook.
   */
  async returnFromCheckout(
    principal: Principal,
    orderId: string,
    sessionId: string,
  ): Promise<OrderDetail> {
    await this.dataSource.transaction(async (m) => {
      await orderFor(m, principal, orderId);
      const row = await m.findOneBy(PaymentEntity, { orderId, providerSessionId: sessionId });
      if (!row) throw new NotFoundException('This booking has no checkout with that id.');
    });
    let session: Stripe.Checkout.Session;
    try {
      session = await this.gateway.retrieveCheckoutSession(sessionId);
    } catch (error) {
      if (error instanceof PaymentServiceError) throw error.toHttp();
      throw error;
    }
    return this.dataSource.transaction(async (m) => {
      if ((session.metadata?.orderId ?? session.client_reference_id) === orderId) {
        await this.fulfilment.applyCheckoutSession(m, session);
      }
      return this.views.detail(m, await orderFor(m, principal, orderId));
    });
  }
}

function conflict(message: string): ConflictException {
  return new ConflictException({ statusCode: 409, message, error: 'Conflict' });
}
