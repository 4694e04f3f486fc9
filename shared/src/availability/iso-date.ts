import { z } from 'zod';
import { InvalidBookingInputError } from '../orders/booking-errors.js';

/**
 * Calendar dates as ISO 8601 `YYYY-MM-DD` strings. No `Date` object crosses the API: an event
 * happens on a calendar day in the studio's time zone, and day arithmetic on such strings is
 * done on a day count (days since 1970-01-01), so daylight-saving changes cannot shift it.
 */
export type IsoDate = string;

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const MS_PER_DAY = 86_400_000;

function parts(value: string): [number, number, number] | undefined {
  const m = ISO_DATE.exec(value);
  if (!m) return undefined;
  const y = Number(m[1]);
  const mo = Number(m[2]);
  const d = Number(m[3]);
  if (y < 1000 || mo < 1 || mo > 12 || d < 1) return undefined;
  // Day 0 of the next month is the last day of this one (proleptic Gregorian calendar).
  const lastDay = new Date(Date.UTC(y, mo, 0)).getUTCDate();
  return d <= lastDay ? [y, mo, d] : undefined;
}

/** A real calendar date written `YYYY-MM-DD` (2026-02-29 is not one; 2028-02-29 is). */
export function isIsoDate(value: unknown): value is IsoDate {
  return typeof value === 'string' && parts(value) !== undefined;
}

export const isoDateSchema = z
  .string({ error: 'Enter a date.' })
  .trim()
  .refine(isIsoDate, { message: 'Use a real date written like 2026-06-21 (year-month-day).' });

export function assertIsoDate(what: string, value: unknown): asserts value is IsoDate {
  if (!isIsoDate(value)) {
    throw new InvalidBookingInputError(what, value, 'a real date written YYYY-MM-DD');
  }
}

/** Days since 1970-01-01 (negative before). */
export function isoDayNumber(date: IsoDate): number {
  const p = parts(date);
  if (!p) throw new InvalidBookingInputError('The date', date, 'a real date written YYYY-MM-DD');
  return Date.UTC(p[0], p[1] - 1, p[2]) / MS_PER_DAY;
}

export function isoDateFromDayNumber(day: number): IsoDate {
  if (!Number.isInteger(day)) {
    throw new InvalidBookingInputError('A day number', day, 'a whole number');
  }
  return new Date(day * MS_PER_DAY).toISOString().slice(0, 10);
}

export function addIsoDays(date: IsoDate, days: number): IsoDate {
  return isoDateFromDayNumber(isoDayNumber(date) + days);
}

/** Whole calendar days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  return isoDayNumber(to) - isoDayNumber(from);
}

export function compareIsoDates(a: IsoDate, b: IsoDate): number {
  return isoDayNumber(a) - isoDayNumber(b);
}

// ---------------------------------------------------------------- time zones

const dayFormatters = new Map<string, Intl.DateTimeFormat>();

function dayFormatter(timeZone: string): Intl.DateTimeFormat {
  let f = dayFormatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', {
      timeZone,
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      calendar: 'gregory',
      numberingSystem: 'latn',
    });
    dayFormatters.set(timeZone, f);
  }
  return f;
}

/** An IANA time-zone name the runtime knows ("Europe/Brussels", "UTC"); offsets like "+01:00" are refused. */
export function isValidTimeZone(value: unknown): value is string {
  if (typeof value !== 'string' || !/^[A-Za-z][A-Za-z0-9_+-]*(\/[A-Za-z0-9_+-]+)*$/.test(value)) {
    return false;
  }
  try {
    dayFormatter(value);
    return true;
  } catch {
    return false;
  }
}

/**
 * The calendar date at `instant` on the wall clocks of `timeZone` — "today" for the studio.
 * Uses the runtime's time-zone database through `Intl.DateTimeFormat`.
 */
export function dateInTimeZone(instant: Date | number, timeZone: string): IsoDate {
  if (!isValidTimeZone(timeZone)) {
    throw new InvalidBookingInputError(
      'The time zone',
      timeZone,
      'an IANA name such as Europe/Brussels',
    );
  }
  const at = typeof instant === 'number' ? instant : instant.getTime();
  if (!Number.isFinite(at)) {
    throw new InvalidBookingInputError('The moment', instant, 'a valid point in time');
  }
  const byType: Record<string, string> = {};
  for (const part of dayFormatter(timeZone).formatToParts(at)) byType[part.type] = part.value;
  return `${byType.year!.padStart(4, '0')}-${byType.month!}-${byType.day!}`;
}

const LONG_DATE: Intl.DateTimeFormatOptions = {
  timeZone: 'UTC',
  weekday: 'long',
  day: 'numeric',
  month: 'long',
  year: 'numeric',
};
/** Building an Intl formatter costs far more than using one: one per locale, kept. */
const longDateFormatters = new Map<string, Intl.DateTimeFormat>();
function longDateFormatter(locale: string): Intl.DateTimeFormat {
  let f = longDateFormatters.get(locale);
  if (!f) {
    f = new Intl.DateTimeFormat(locale, LONG_DATE);
    longDateFormatters.set(locale, f);
  }
  return f;
}

/**
 * A date for people to read. Without a locale: English, "Sunday 21 June 2026", built from the
 * names Intl gives so the punctuation does not change with the runtime's CLDR version (some
 * versions write "Sunday, 21 June 2026"). With a locale: that locale's full date format.
 */
export function formatIsoDate(date: IsoDate, locale?: string): string {
  const at = isoDayNumber(date) * MS_PER_DAY;
  if (locale) return longDateFormatter(locale).format(at);
  const byType: Record<string, string> = {};
  for (const part of longDateFormatter('en-GB').formatToParts(at)) {
    byType[part.type] = part.value;
  }
  return `${byType.weekday!} ${byType.day!} ${byType.month!} ${byType.year!}`;
}
