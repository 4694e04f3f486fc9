import {
  BadGatewayException,
  Injectable,
  Logger,
  ServiceUnavailableException,
} from '@nestjs/common';
import Stripe from 'stripe';
import { Clock } from '../common/clock.js';
import { Env } from '../config/env.js';

/** How old a webhook signature may be (Stripe's documented default). */
export const WEBHOOK_TOLERANCE_SECONDS = 300;

/**
 * Why a call to the payment service did not succeed. `definitive`: the service answered and
 * refused (a bad parameter, an over-refund): retrying the same call will not help. Otherwise
 * it was down, slow, overloaded or busy with the same idempotency key: the outcome is unknown
 * and the same call (same key) may be retried.
 */
export class PaymentServiceError extends Error {
  constructor(
    readonly definitive: boolean,
    message: string,
    readonly code: string | undefined = undefined,
  ) {
    super(message);
    this.name = 'PaymentServiceError';
  }

  toHttp(): ServiceUnavailableException | BadGatewayException {
    return this.definitive
      ? new BadGatewayException(`The payment service refused the request: ${this.message}`)
      : new ServiceUnavailableException(
          'The payment service is not answering right now. Nothing was charged or changed; please try again in a minute.',
        );
  }
}

/**
 * The one place the API talks to the payment service: the official `stripe` SDK built from the
 * environment (`STRIPE_API_HOST/PORT/PROTOCOL` point it at the local fake; unset = the real
 * service), with a timeout and two retries per call (the SDK retries connection errors, 409
 * "idempotency key in use" and 5xx). Every POST carries our own idempotency key. A call that
 * has not settled shortly after the timeout is abandoned (the SDK keeps its key, so a retry of
 * ours can never pay or refund twice) and reported as the service being unavailable. Never call
 * it inside a database transaction.
 */
@Injectable()
export class PaymentGateway {
  private readonly logger = new Logger(PaymentGateway.name);
  readonly stripe: Stripe;
  private readonly deadlineMs: number;
  private readonly webhookSecret: string;

  constructor(
    env: Env,
    private readonly clock: Clock,
  ) {
    this.stripe = new Stripe(env.STRIPE_SECRET_KEY, {
      ...(env.STRIPE_API_HOST ? { host: env.STRIPE_API_HOST } : {}),
      ...(env.STRIPE_API_PORT ? { port: env.STRIPE_API_PORT } : {}),
      ...(env.STRIPE_API_PROTOCOL ? { protocol: env.STRIPE_API_PROTOCOL } : {}),
      timeout: env.STRIPE_TIMEOUT_MS,
      maxNetworkRetries: 2,
      telemetry: false,
      appInfo: { name: 'nappe-api' },
    });
    this.deadlineMs = env.STRIPE_TIMEOUT_MS + 500;
    this.webhookSecret = env.STRIPE_WEBHOOK_SECRET;
  }

  createCheckoutSession(
    params: Stripe.Checkout.SessionCreateParams,
    idempotencyKey: string,
  ): Promise<Stripe.Checkout.Session> {
    return this.call('create a checkout', () =>
      this.stripe.checkout.sessions.create(params, { idempotencyKey }),
    );
  }

  retrieveCheckoutSession(id: string): Promise<Stripe.Checkout.Session> {
    return this.call('read a checkout', () => this.stripe.checkout.sessions.retrieve(id));
  }

  expireCheckoutSession(id: string, idempotencyKey: string): Promise<Stripe.Checkout.Session> {
    return this.call('close a checkout', () =>
      this.stripe.checkout.sessions.expire(id, {}, { idempotencyKey }),
    );
  }

  createRefund(params: Stripe.RefundCreateParams, idempotencyKey: string): Promise<Stripe.Refund> {
    return this.call('refund', () => this.stripe.refunds.create(params, { idempotencyKey }));
  }

  /**
   * Verifies the signature of a webhook's raw body and parses the event; a signature older than
   * 300 s (the SDK's default tolerance) by our clock is refused.
   */
  constructEvent(rawBody: Buffer, signature: string): Stripe.Event {
    return this.stripe.webhooks.constructEvent(
      rawBody,
      signature,
      this.webhookSecret,
      WEBHOOK_TOLERANCE_SECONDS,
      undefined,
      this.clock.now().getTime(),
    );
  }

  private async call<T>(what: string, work: () => Promise<T>): Promise<T> {
    let timer: NodeJS.Timeout | undefined;
    const deadline = new Promise<never>((_, reject) => {
      timer = setTimeout(
        () =>
          reject(
            new PaymentServiceError(false, `no answer within ${this.deadlineMs} ms`, 'timeout'),
          ),
        this.deadlineMs,
      );
    });
    const attempt = work();
    attempt.catch(() => undefined); // an abandoned call's late failure is not unhandled
    try {
      return await Promise.race([attempt, deadline]);
    } catch (error) {
      const failure = classify(error);
      if (!failure.definitive) {
        this.logger.warn(`Payment service unavailable (${what}): ${failure.message}`);
      }
      throw failure;
    } finally {
      clearTimeout(timer);
    }
  }
}

/** Sorts an error of the SDK into "refused" (definitive) and "unavailable" (retry with the same key). */
export function classify(error: unknown): PaymentServiceError {
  if (error instanceof PaymentServiceError) return error;
  const E = Stripe.errors;
  if (
    error instanceof E.StripeInvalidRequestError ||
    error instanceof E.StripeCardError ||
    error instanceof E.StripeIdempotencyError
  ) {
    return new PaymentServiceError(true, error.message, error.code ?? error.rawType);
  }
  if (error instanceof E.StripeError) {
    // Connection, 5xx, rate limit, 409 still in use after the retries, bad credentials.
    return new PaymentServiceError(false, error.message, error.code ?? error.rawType);
  }
  return new PaymentServiceError(false, error instanceof Error ? error.message : String(error));
}
