import Stripe from 'stripe';
import { describe, expect, it } from 'vitest';
import { Clock } from '../common/clock.js';
import { validateEnv } from '../config/env.js';
import { classify, PaymentGateway, PaymentServiceError } from './payment-gateway.js';

const raw = (
  type: Stripe.RawErrorType,
  extra: Record<string, unknown> = {},
): Stripe.StripeRawError => ({
  type,
  message: 'x',
  ...extra,
});

describe('classify (Stripe API reference, "Errors": what to retry with the same key)', () => {
  it('treats a refusal by the service as definitive', () => {
    const E = Stripe.errors;
    for (const error of [
      new E.StripeInvalidRequestError(raw('invalid_request_error', { code: 'parameter_missing' })),
      new E.StripeCardError(raw('card_error', { code: 'card_declined' })),
      new E.StripeIdempotencyError(raw('idempotency_error')),
    ]) {
      expect(classify(error).definitive).toBe(true);
    }
  });

  it('treats connection failures, 5xx, rate limits and a busy key as unknown outcomes', () => {
    const E = Stripe.errors;
    for (const error of [
      new E.StripeConnectionError({ message: 'connect ECONNREFUSED' }),
      new E.StripeAPIError(raw('api_error', { statusCode: 500 })),
      new E.StripeRateLimitError(raw('rate_limit_error')),
      new E.StripeAPIError(
        raw('invalid_request_error', { statusCode: 409, code: 'idempotency_key_in_use' }),
      ),
      new Error('socket hang up'),
    ]) {
      const failure = classify(error);
      expect(failure.definitive).toBe(false);
      expect(failure.toHttp().getStatus()).toBe(503);
    }
  });

  it('answers a definitive refusal with 502 and its reason', () => {
    const failure = new PaymentServiceError(
      true,
      'Refund amount is greater than unrefunded amount',
    );
    expect(failure.toHttp().getStatus()).toBe(502);
    expect(JSON.stringify(failure.toHttp().getResponse())).toMatch(/greater than unrefunded/);
  });
});

describe('PaymentGateway', () => {
  it('builds the SDK client from the environment: host, port, protocol, timeout, two retries', () => {
    const env = validateEnv({
      STRIPE_API_HOST: 'localhost',
      STRIPE_API_PORT: '12111',
      STRIPE_API_PROTOCOL: 'http',
      STRIPE_TIMEOUT_MS: '4000',
    });
    const gateway = new PaymentGateway(env, new Clock());
    const settings = gateway.stripe as unknown as {
      _api: {
        host: string;
        port: string | number;
        protocol: string;
        timeout: number;
        maxNetworkRetries: number;
      };
    };
    expect(settings._api).toMatchObject({
      host: 'localhost',
      protocol: 'http',
      timeout: 4000,
      maxNetworkRetries: 2,
    });
    expect(String(settings._api.port)).toBe('12111');
  });

  it('gives up on a call that does not settle shortly after the timeout', async () => {
    const env = validateEnv({ STRIPE_TIMEOUT_MS: '200' });
    const gateway = new PaymentGateway(env, new Clock());
    (gateway.stripe.checkout.sessions as unknown as { retrieve: () => Promise<never> }).retrieve =
      () => new Promise<never>(() => undefined);
    const started = Date.now();
    const error = await gateway.retrieveCheckoutSession('cs_test_x').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(PaymentServiceError);
    expect((error as PaymentServiceError).definitive).toBe(false);
    expect(Date.now() - started).toBeLessThan(1500);
  });
});
