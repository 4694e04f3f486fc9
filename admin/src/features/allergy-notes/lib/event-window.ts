import { addIsoDays, dateInTimeZone } from '@nappe/shared';

/** Past events stay on the list this many days after service (the kitchen may still be asked). */
export const RECENT_DAYS = 7;

/** Today in the studio's time zone, and the first day of "recent". */
export function eventWindow(timeZone: string, now: Date = new Date()) {
  const today = dateInTimeZone(now, timeZone);
  return { today, from: addIsoDays(today, -RECENT_DAYS) };
}

/** "Tuesday 15 December 2026" for an ISO date (read as a calendar day, not an instant). */
export function formatEventDate(isoDate: string, style: 'long' | 'short' = 'long'): string {
  const [y, m, d] = isoDate.split('-').map(Number);
  const date = new Date(Date.UTC(y!, m! - 1, d!));
  return new Intl.DateTimeFormat(
    'en-GB',
    style === 'long'
      ? { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }
      : { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' },
  ).format(date);
}

/** "15 Dec 2026, 14:05" for an instant, on the studio's clock. */
export function formatInstant(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
  }).format(new Date(iso));
}
