import { z } from 'zod';
import { isIsoDate, isValidTimeZone } from '../availability/iso-date.js';

/**
 * The studio's booking settings (DESIGN.md `StudioSettings`): money, payment schedule,
 * cancellation policy, capacity and calendar. The studio's name, tagline and city stay with the
 * API's settings entity; this is what the booking rules read. Every percentage is a setting:
 * nothing about deposits or refunds is fixed in code.
 */

// ---------------------------------------------------------------- currency

let knownCurrencies: ReadonlySet<string> | undefined;

/** ISO 4217 alphabetic code known to the runtime's Intl data (EUR, GBP, JPY, KWD…). */
export function isCurrencyCode(value: unknown): value is string {
  if (typeof value !== 'string' || !/^[A-Z]{3}$/.test(value)) return false;
  knownCurrencies ??= new Set(Intl.supportedValuesOf('currency'));
  return knownCurrencies.has(value);
}

export const currencySchema = z
  .string({ error: 'Choose a currency.' })
  .trim()
  .refine(isCurrencyCode, {
    message: 'Use a three-letter ISO 4217 currency code in capitals, such as EUR, GBP or JPY.',
  });

export const timeZoneSchema = z
  .string({ error: 'Choose the studio’s time zone.' })
  .trim()
  .refine(isValidTimeZone, {
    message: 'Use a time-zone name such as Europe/Brussels or America/New_York.',
  });

// ---------------------------------------------------------------- cancellation tiers

const wholeNumber = (what: string, min: number, max: number, unit = '') =>
  z
    .number({ error: `${what} must be a number.` })
    .int({ error: `${what} must be a whole number.` })
    .min(min, { error: `${what} must be ${min}${unit} or more.` })
    .max(max, { error: `${what} must be ${max}${unit} or less.` });

/**
 * One step of the cancellation policy: a cancellation made `daysBefore` days or more before the
 * event (and fewer days than the next-earlier tier) refunds `refundPercent` % of what was paid.
 */
export const cancellationTierSchema = z.object({
  daysBefore: wholeNumber('The number of days before the event', 0, 730),
  refundPercent: wholeNumber('The refund', 0, 100, ' %'),
});
export type CancellationTier = z.infer<typeof cancellationTierSchema>;

/** Tiers from the earliest cancellation (most days before the event) to the latest. */
export function sortTiers(tiers: readonly CancellationTier[]): CancellationTier[] {
  return [...tiers].sort((a, b) => b.daysBefore - a.daysBefore);
}

/**
 * Plain-words problems with a policy; empty when it is coherent. A coherent policy has one tier
 * per starting day, a tier starting 0 days before (so every date up to the event is covered),
 * and never refunds less for cancelling earlier.
 */
export function cancellationPolicyProblems(tiers: readonly CancellationTier[]): string[] {
  const problems: string[] = [];
  const seen = new Set<number>();
  for (const t of tiers) {
    if (seen.has(t.daysBefore)) {
      problems.push(
        `Two tiers both start ${t.daysBefore} days before the event. Give each tier its own number of days.`,
      );
    }
    seen.add(t.daysBefore);
  }
  if (!seen.has(0)) {
    problems.push(
      'Add a last tier that starts 0 days before the event, so a cancellation on any date up to the event has a rule.',
    );
  }
  const sorted = sortTiers(tiers);
  for (let i = 1; i < sorted.length; i++) {
    const earlier = sorted[i - 1]!;
    const later = sorted[i]!;
    if (later.refundPercent > earlier.refundPercent) {
      problems.push(
        `Cancelling earlier must never refund less: from ${earlier.daysBefore} days before, the refund is ${earlier.refundPercent} %, but from ${later.daysBefore} days before it is ${later.refundPercent} %.`,
      );
    }
  }
  return problems;
}

export const cancellationTiersSchema = z
  .array(cancellationTierSchema)
  .min(1, { error: 'Add at least one cancellation tier.' })
  .max(10, { error: 'Use at most 10 cancellation tiers.' })
  .superRefine((tiers, ctx) => {
    if (tiers.length === 0) return; // already reported by min(1)
    for (const message of cancellationPolicyProblems(tiers))
      ctx.addIssue({ code: 'custom', message });
  });

// ---------------------------------------------------------------- the settings

export const BLACKOUT_DATES_MAX = 1000;

export const studioSettingsSchema = z.object({
  /** ISO 4217 code of every price and payment. */
  currency: currencySchema,
  /** Tax (VAT, GST, sales tax) in basis points: 2100 = 21 %. */
  taxRateBp: wholeNumber('The tax rate (in basis points, 2100 = 21 %)', 0, 10_000),
  /** True when menu prices already include the tax (usual for consumers in the EU and UK). */
  pricesIncludeTax: z.boolean({ error: 'Say whether prices include tax.' }),
  /** Share of the total paid when booking. 100 = always paid in full. */
  depositPercent: wholeNumber('The deposit', 1, 100, ' %'),
  /** The balance is due this many days before the event. */
  balanceDueDaysBefore: wholeNumber('The balance due days', 0, 365),
  cancellationTiers: cancellationTiersSchema,
  /** Plates the kitchen can make for one event day, across all orders. */
  dailyPlateCapacity: wholeNumber('The daily plate capacity', 1, 100_000),
  /** Days the studio takes no events. */
  blackoutDates: z
    .array(
      z.string().refine(isIsoDate, {
        message: 'Write each closed day as a real date like 2026-12-25.',
      }),
    )
    .max(BLACKOUT_DATES_MAX, { error: `List at most ${BLACKOUT_DATES_MAX} closed days.` })
    .refine((dates) => new Set(dates).size === dates.length, {
      message: 'A closed day is listed twice.',
    })
    .default([]),
  /** Clients may change the guest count up to this many days before the event. */
  finalGuestCountDaysBefore: wholeNumber('The final guest count deadline', 0, 365),
  /** Extra plates produced above the guest count, for breakage and tasting. */
  sparePercent: wholeNumber('The spare plates', 0, 100, ' %'),
  /** IANA zone of the studio: decides what "today" is. */
  timeZone: timeZoneSchema,
  /** Guest-level dietary details are purged this many days after the event. */
  guestDataRetentionDays: wholeNumber('The guest data retention', 0, 3650).default(30),
});
export type StudioSettings = z.infer<typeof studioSettingsSchema>;
export type StudioSettingsInput = z.input<typeof studioSettingsSchema>;

/**
 * Invented defaults for a new studio and the demo seed. The percentages are examples the chef
 * is expected to change: deposits of 25–50 % are usual (REFERENCES.md — common practice, no
 * source); 21 % is Belgium's standard VAT rate (from memory), matching the demo studio's zone.
 */
export const DEFAULT_STUDIO_SETTINGS: StudioSettings = studioSettingsSchema.parse({
  currency: 'EUR',
  taxRateBp: 2100,
  pricesIncludeTax: true,
  depositPercent: 30,
  balanceDueDaysBefore: 14,
  cancellationTiers: [
    { daysBefore: 30, refundPercent: 100 },
    { daysBefore: 14, refundPercent: 50 },
    { daysBefore: 0, refundPercent: 0 },
  ],
  dailyPlateCapacity: 240,
  blackoutDates: [],
  finalGuestCountDaysBefore: 7,
  sparePercent: 5,
  timeZone: 'Europe/Brussels',
  guestDataRetentionDays: 30,
} satisfies StudioSettingsInput);
