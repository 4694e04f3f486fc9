import { z } from 'zod';
import { isoDateSchema } from '../availability/iso-date.js';
import { guestRequirementSchema } from '../conflicts/conflicts.js';
import { GUEST_COUNT_MAX } from '../quote/quote.js';

/**
 * Request bodies the API validates and the storefront's forms check before sending, defined
 * once. They carry ids, dates and counts only: prices, totals and statuses are worked out by the
 * server, so the schemas are strict and a body carrying such a field is refused.
 */

export const GUEST_COUNT_MIN = 1;
export const ADDRESS_LINE_MAX = 120;
export const ADDRESS_LINES_MAX = 6;
export const OCCASION_MAX = 120;
export const REASON_MAX = 500;

/** Zod's message for unknown fields, in words a client can read. */
function strictError(issue: { code?: string; keys?: string[] }): string | undefined {
  if (issue.code === 'unrecognized_keys') {
    const keys = issue.keys ?? [];
    return `${keys.length === 1 ? 'This field is' : 'These fields are'} not accepted here: ${keys.join(', ')}. Prices, totals and the booking status are worked out by the studio.`;
  }
  return undefined;
}

export const guestCountSchema = z
  .number({ error: 'Enter the number of guests.' })
  .int({ error: 'Count guests in whole people.' })
  .min(GUEST_COUNT_MIN, { error: 'At least one guest.' })
  .max(GUEST_COUNT_MAX, {
    error: `For more than ${GUEST_COUNT_MAX.toLocaleString('en-GB')} guests, please contact the studio.`,
  });

export const menuIdSchema = z
  .string({ error: 'Choose a menu.' })
  .trim()
  .min(1, { error: 'Choose a menu.' })
  .max(64, { error: 'That menu id is not valid.' });

export const eventDateSchema = isoDateSchema;

/** 24-hour `HH:MM`. */
export const serviceTimeSchema = z
  .string({ error: 'Enter the time dessert is served.' })
  .trim()
  .regex(/^([01]\d|2[0-3]):[0-5]\d$/, { error: 'Write the time like 19:30 (24-hour clock).' });

const oneLine = (what: string, max: number) =>
  z
    .string({ error: `Enter ${what}.` })
    .trim()
    .min(1, { error: `Enter ${what}.` })
    .max(max, { error: `Keep ${what} under ${max} characters.` })
    .refine((v) => !/[\r\n]/.test(v), { message: `Keep ${what} on one line.` });

export const venueAddressLinesSchema = z
  .array(oneLine('the address line', ADDRESS_LINE_MAX), { error: 'Enter the venue’s address.' })
  .min(1, { error: 'Enter the venue’s address.' })
  .max(ADDRESS_LINES_MAX, { error: `Use at most ${ADDRESS_LINES_MAX} address lines.` });

/**
 * A phone number, leniently: spaces, dots, dashes, slashes and brackets are ignored, a leading
 * "00" is read as "+". What remains is an optional "+" and 6–15 digits (ITU-T E.164 allows at
 * most 15 digits; the 6-digit floor, for local numbers, is from memory). Stored normalised,
 * e.g. "+32 470 12 34 56" → "+32470123456".
 */
export const contactPhoneSchema = z
  .string({ error: 'Enter a phone number for the day of the event.' })
  .trim()
  .max(40, { error: 'That phone number is too long.' })
  .transform((v) => v.replace(/[\s.\-/()]/g, '').replace(/^00/, '+'))
  .refine((v) => /^\+?\d{6,15}$/.test(v), {
    message: 'Enter a phone number with its country code, like +32 470 12 34 56.',
  });

export const guestRequirementsSchema = z
  .array(guestRequirementSchema)
  .max(GUEST_COUNT_MAX, { error: `At most ${GUEST_COUNT_MAX} guests.` });

function requirementsFit(
  body: { guestCount: number; guestRequirements?: unknown[]; guestDataConsent?: boolean },
  ctx: z.RefinementCtx,
): void {
  const listed = body.guestRequirements?.length ?? 0;
  if (listed > body.guestCount) {
    ctx.addIssue({
      code: 'custom',
      path: ['guestRequirements'],
      message: `You listed requirements for ${listed} guests but the party is ${body.guestCount}. Raise the number of guests or remove some entries.`,
    });
  }
  if (listed > 0 && body.guestDataConsent !== true) {
    ctx.addIssue({
      code: 'custom',
      path: ['guestDataConsent'],
      message:
        'Please confirm that your guests agreed to share their allergies and diets with the studio.',
    });
  }
}

/** `POST /api/quotes`: preview a quote. */
export const createQuoteSchema = z.strictObject(
  {
    menuId: menuIdSchema,
    eventDate: eventDateSchema,
    guestCount: guestCountSchema,
  },
  { error: strictError },
);
export type CreateQuoteRequest = z.infer<typeof createQuoteSchema>;

/** `POST /api/orders`: book. No price, total or status: the server computes them. */
export const createOrderSchema = z
  .strictObject(
    {
      menuId: menuIdSchema,
      eventDate: eventDateSchema,
      serviceTime: serviceTimeSchema,
      venueAddressLines: venueAddressLinesSchema,
      occasion: oneLine('the occasion', OCCASION_MAX),
      contactPhone: contactPhoneSchema,
      guestCount: guestCountSchema,
      guestRequirements: guestRequirementsSchema.default([]),
      /** GDPR Art. 9: the client confirms the guests agreed to share health details. */
      guestDataConsent: z.boolean().optional(),
      acceptTerms: z.literal(true, {
        error: 'Please accept the booking terms and the cancellation policy to continue.',
      }),
    },
    { error: strictError },
  )
  .superRefine(requirementsFit);
export type CreateOrderRequest = z.infer<typeof createOrderSchema>;
export type CreateOrderInput = z.input<typeof createOrderSchema>;

/** Change the number of guests (and, optionally, their requirements) before the deadline. */
export const changeGuestCountSchema = z
  .strictObject(
    {
      guestCount: guestCountSchema,
      guestRequirements: guestRequirementsSchema.optional(),
      guestDataConsent: z.boolean().optional(),
    },
    { error: strictError },
  )
  .superRefine(requirementsFit);
export type ChangeGuestCountRequest = z.infer<typeof changeGuestCountSchema>;

/** Cancel, decline or any recorded transition: an optional reason for the audit trail. */
export const orderReasonSchema = z.strictObject(
  {
    reason: z
      .string()
      .trim()
      .max(REASON_MAX, { error: `Keep the reason under ${REASON_MAX} characters.` })
      .optional(),
  },
  { error: strictError },
);
export type OrderReasonRequest = z.infer<typeof orderReasonSchema>;
