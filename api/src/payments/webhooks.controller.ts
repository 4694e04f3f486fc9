import {
  BadRequestException,
  Controller,
  Headers,
  HttpCode,
  HttpStatus,
  Logger,
  Post,
  Req,
  type RawBodyRequest,
} from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import { SkipThrottle } from '@nestjs/throttler';
import type { Request } from 'express';
import type Stripe from 'stripe';
import { Public } from '../auth/decorators/public.decorator.js';
import { PaymentGateway } from './payment-gateway.js';
import { WebhookService } from './webhook.service.js';

/**
 * `POST /api/payments/webhook`: public, authenticated by the signature over the raw body
 * (a bad signature or a timestamp older than 300 s → 400, nothing changes).
 */
@ApiExcludeController()
@Controller('payments')
export class WebhooksController {
  private readonly logger = new Logger(WebhooksController.name);

  constructor(
    private readonly gateway: PaymentGateway,
    private readonly webhooks: WebhookService,
  ) {}

  @Public()
  @SkipThrottle()
  @Post('webhook')
  @HttpCode(HttpStatus.OK)
  async receive(
    @Req() req: RawBodyRequest<Request>,
    @Headers('stripe-signature') signature: string | undefined,
  ): Promise<{ received: true }> {
    if (!req.rawBody || !signature) {
      throw new BadRequestException('A signed JSON body is required.');
    }
    let event: Stripe.Event;
    try {
      event = this.gateway.constructEvent(req.rawBody, signature);
    } catch (error) {
      this.logger.warn(
        `Webhook refused: ${error instanceof Error ? error.message : String(error)}`,
      );
      throw new BadRequestException('The webhook signature does not match.');
    }
    await this.webhooks.apply(event);
    return { received: true };
  }
}
