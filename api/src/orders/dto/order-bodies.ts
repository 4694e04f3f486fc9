import { orderReasonSchema } from '@nappe/shared';
import { z } from 'zod';

/** `POST /api/orders/:id/checkout`. */
export const checkoutBody = z.strictObject(
  {
    plan: z.enum(['deposit', 'full', 'balance', 'top_up'], {
      error: 'Choose what to pay: deposit, full, balance or top_up.',
    }),
  },
  {
    error: (issue) =>
      issue.code === 'unrecognized_keys'
        ? 'Only “plan” is accepted here: the amount is worked out by the studio.'
        : undefined,
  },
);
export type CheckoutBody = z.infer<typeof checkoutBody>;

/** `POST /api/orders/:id/checkout/return`. */
export const checkoutReturnBody = z.strictObject({
  sessionId: z
    .string({ error: 'Send the checkout’s session id.' })
    .trim()
    .min(1, { error: 'Send the checkout’s session id.' })
    .max(255),
});
export type CheckoutReturnBody = z.infer<typeof checkoutReturnBody>;

/** The client's `Idempotency-Key` for a booking request: printable ASCII, at most 64 characters. */
export const idempotencyKeySchema = z
  .string({ error: 'Send an Idempotency-Key header (a random id per booking attempt).' })
  .min(1, { error: 'Send an Idempotency-Key header (a random id per booking attempt).' })
  .max(64, { error: 'The Idempotency-Key header must be at most 64 characters.' })
  .regex(/^[\x21-\x7e]+$/, { error: 'The Idempotency-Key header must be printable ASCII.' });

/**
 * `POST /api/orders/:id/cancel`: the reason, and — for the chef only — whether the refund follows
 * the cancellation policy (the default) or returns everything paid.
 */
export const cancelOrderBody = orderReasonSchema.extend({
  refund: z
    .enum(['policy', 'full'], { error: 'Choose the refund: policy or full.' })
    .default('policy'),
});
export type CancelOrderBody = z.output<typeof cancelOrderBody>;
