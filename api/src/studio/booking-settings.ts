import { ServiceUnavailableException } from '@nestjs/common';
import {
  describeCancellationPolicy,
  formatRateBp,
  studioSettingsSchema,
  type BookingTerms,
  type StudioSettings as BookingSettings,
} from '@nappe/shared';
import type { EntityManager } from 'typeorm';
import { StudioSettings } from './entities/studio-settings.entity.js';

/** How long a checkout (and so the plates of an unpaid booking) is held, in minutes. */
export const CHECKOUT_HOLD_MINUTES = 30;

/**
 * The settings row as the shared booking rules read it, checked with the shared schema. A row
 * the schema refuses (a policy without a 0-day tier, an unknown zone) stops bookings with a
 * message rather than letting a wrong price through.
 */
export function bookingSettingsOf(row: StudioSettings): BookingSettings {
  const parsed = studioSettingsSchema.safeParse({
    currency: row.currency,
    taxRateBp: row.taxRateBp,
    pricesIncludeTax: row.pricesIncludeTax,
    depositPercent: row.depositPercent,
    balanceDueDaysBefore: row.balanceDueDaysBefore,
    cancellationTiers: row.cancellationTiers,
    dailyPlateCapacity: row.dailyPlateCapacity,
    blackoutDates: row.blackoutDates,
    finalGuestCountDaysBefore: row.finalGuestCountDaysBefore,
    sparePercent: row.sparePercent,
    timeZone: row.timeZone,
    guestDataRetentionDays: row.guestDataRetentionDays,
  });
  if (!parsed.success) {
    throw new ServiceUnavailableException(
      `Bookings are paused: the studio’s booking settings need attention (${parsed.error.issues
        .map((i) => `${i.path.join('.')}: ${i.message}`)
        .join('; ')}).`,
    );
  }
  return parsed.data;
}

export interface LoadedStudio {
  row: StudioSettings;
  settings: BookingSettings;
}

export async function loadStudio(manager: EntityManager): Promise<LoadedStudio> {
  const row = await manager.findOneByOrFail(StudioSettings, { id: 1 });
  return { row, settings: bookingSettingsOf(row) };
}

/** What a client accepts when booking, in plain words, from the studio's current settings. */
export function bookingTermsOf(studio: LoadedStudio): BookingTerms {
  const s = studio.settings;
  const name = studio.row.name;
  const tax =
    s.taxRateBp === 0
      ? 'No tax is charged on the prices shown.'
      : s.pricesIncludeTax
        ? `Prices are per guest, in ${s.currency}, and include tax at ${formatRateBp(s.taxRateBp)}.`
        : `Prices are per guest, in ${s.currency}; tax at ${formatRateBp(s.taxRateBp)} is added to them.`;
  const payment =
    s.depositPercent >= 100
      ? 'The whole total is paid when you book.'
      : `To book, you pay a deposit of ${s.depositPercent} % of the total. The balance is due ${s.balanceDueDaysBefore} days before the event; if you book later than that, the whole total is paid when you book.`;
  return {
    currency: s.currency,
    pricesIncludeTax: s.pricesIncludeTax,
    taxRateBp: s.taxRateBp,
    depositPercent: s.depositPercent,
    balanceDueDaysBefore: s.balanceDueDaysBefore,
    finalGuestCountDaysBefore: s.finalGuestCountDaysBefore,
    cancellationPolicy: describeCancellationPolicy(s.cancellationTiers),
    terms: [
      tax,
      payment,
      `Your date and plates are held for ${CHECKOUT_HOLD_MINUTES} minutes while you pay. Once the payment is received your booking goes to the chef, who confirms it — or, if the studio cannot take it, declines it and refunds everything you paid.`,
      `You can change the number of guests and their dietary requirements until ${s.finalGuestCountDaysBefore} days before the event. Extra guests are paid for when you add them; for guests you remove, what you paid for them is refunded under the cancellation policy.`,
      'If you cancel, the refund follows the cancellation policy below, counted in days before the event in the studio’s time zone.',
      `Allergies and diets you give us are used only to prepare your guests’ plates. They are shown only to you and to ${name}’s kitchen and service team, and deleted ${s.guestDataRetentionDays} days after the event. Please tell us about every allergy: the kitchen works with the major allergens, so while each plate is prepared and labelled with care, traces cannot be ruled out.`,
      'Card payments are handled by our payment service; the studio never sees your card number.',
    ],
  };
}
