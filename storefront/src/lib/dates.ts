import { formatIsoDate, isIsoDate, isoDayNumber, type IsoDate } from '@nappe/shared';
import { LOCALE } from './format';

/**
 * How the storefront writes dates. Apart from format.ts because the shared date module carries
 * its validation schema, and with it zod: the menus screens, which write no dates, load neither.
 */

/** "Saturday 4 July 2026". */
export function longDate(date: IsoDate): string {
  return isIsoDate(date) ? formatIsoDate(date) : date;
}

const shortDateFormat = new Intl.DateTimeFormat(LOCALE, {
  timeZone: 'UTC',
  weekday: 'short',
  day: 'numeric',
  month: 'short',
  year: 'numeric',
});

/** "Sat 4 Jul 2026". */
export function shortDate(date: IsoDate): string {
  if (!isIsoDate(date)) return date;
  return shortDateFormat.format(isoDayNumber(date) * 86_400_000);
}

const instantFormat = new Intl.DateTimeFormat(LOCALE, {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

/** An instant from the API ("2026-06-01T09:30:00Z") on this device's clock: "1 Jun 2026, 11:30". */
export function dateTime(instant: string): string {
  const at = Date.parse(instant);
  return Number.isNaN(at) ? instant : instantFormat.format(at);
}
