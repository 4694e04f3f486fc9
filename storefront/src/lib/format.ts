import { formatMoney, plural } from '@nappe/shared';

/**
 * How the storefront writes money and counts (dates: `dates.ts`). Money arrives as integer minor
 * units and is only turned into text here, through the shared formatter (Intl.NumberFormat on an
 * exact decimal string): the storefront never does arithmetic on prices.
 */

export const LOCALE = 'en-GB';

export function money(minor: number, currency: string): string {
  return formatMoney(minor, currency, LOCALE);
}

/**
 * A menu's lead days in words: "Book at least 10 days ahead", in weeks when they divide evenly
 * ("2 weeks"), "Can be booked for today" when no notice is needed.
 */
export function leadTimeInWords(days: number): string {
  if (days <= 0) return 'Can be booked for the same day';
  if (days % 7 === 0) return `Book at least ${plural(days / 7, 'week')} ahead`;
  return `Book at least ${plural(days, 'day')} ahead`;
}

/** "12 to 80 guests", or "Exactly 12 guests" when both limits agree. */
export function guestRange(min: number, max: number): string {
  return min === max ? `Exactly ${plural(min, 'guest')}` : `${min} to ${plural(max, 'guest')}`;
}
