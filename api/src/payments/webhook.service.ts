import { Injectable, Logger } from '@nestjs/common';
import type Stripe from 'stripe';
import { DataSource } from 'typeorm';
import { Clock } from '../common/clock.js';
import { lockFor, lockKey } from '../database/serialized-writes.js';
import { ProcessedWebhookEventEntity } from './entities/processed-webhook-event.entity.js';
import { Fulfilment } from './fulfilment.js';

/**
 * Applies verified webhook events, each id once: the `processed_webhook_events` row is written
 * in the same transaction as the event's effect, so a duplicate (or a concurrent delivery of the
 * same event) finds it and does nothing, and a failure leaves neither. On PostgreSQL concurrent
 * deliveries of one id wait for each other on a lock named after it, so the later one finds the
 * row instead of failing on its key.
 */
@Injectable()
export class WebhookService {
  private readonly logger = new Logger(WebhookService.name);

  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly fulfilment: Fulfilment,
  ) {}

  async apply(event: Stripe.Event): Promise<'applied' | 'duplicate'> {
    return this.dataSource.transaction(async (m) => {
      await lockFor(m, lockKey('webhook-event', event.id));
      if (await m.findOneBy(ProcessedWebhookEventEntity, { eventId: event.id })) return 'duplicate';
      await m.insert(ProcessedWebhookEventEntity, {
        eventId: event.id,
        type: event.type.slice(0, 100),
        processedAt: this.clock.now(),
      });
      switch (event.type) {
        case 'checkout.session.completed':
        case 'checkout.session.async_payment_succeeded':
        case 'checkout.session.expired':
          await this.fulfilment.applyCheckoutSession(m, event.data.object);
          break;
        case 'payment_intent.succeeded':
          await this.fulfilment.applyPaymentIntentSucceeded(m, event.data.object);
          break;
        case 'charge.refunded':
          await this.fulfilment.applyChargeRefunded(m, event.data.object, event.id);
          break;
        case 'payment_intent.payment_failed':
          // A declined card: the checkout stays open for another card; nothing to record.
          break;
        default:
          this.logger.debug?.(`Webhook ${event.type} acknowledged, nothing to do`);
      }
      return 'applied';
    });
  }
}
