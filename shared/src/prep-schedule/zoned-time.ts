import { KitchenError } from '../kitchen/errors.js';

/**
 * Wall-clock time in an IANA time zone, worked out with `Intl.DateTimeFormat` only (no date
 * library). Instants are carried as whole minutes since the Unix epoch (UTC), the unit every
 * recipe step is written in; they leave this module as ISO 8601 date-times with the zone's
 * offset ("2026-03-29T07:00:00+02:00").
 *
 * Local times that do not exist (the hour skipped when clocks go forward) or exist twice (the
 * hour repeated when they go back) are resolved as ECMAScript Temporal's "compatible" mode
 * does: a skipped time moves forward by the length of the gap, a repeated time takes the
 * earlier of the two instants.
 */

export type EpochMinutes = number;

export const MINUTES_PER_DAY = 24 * 60;

export class InvalidTimeZoneError extends KitchenError {
  readonly code = 'invalid_time_zone';

  constructor(readonly timeZone: string) {
    super(
      `“${timeZone}” is not a time zone this system knows. Use a name such as Europe/Brussels or America/New_York.`,
    );
  }
}

export class InvalidDateTimeError extends KitchenError {
  readonly code = 'invalid_date_time';

  constructor(
    readonly what: string,
    readonly value: string,
    readonly expectation: string,
  ) {
    super(`${what} must be ${expectation}; got “${value}”.`);
  }
}

const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;
const TIME_RE = /^([01]\d|2[0-3]):([0-5]\d)$/;
const ISO_INSTANT_RE = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})$/;

/** Whether `date` is a real calendar date written YYYY-MM-DD. */
export function isCalendarDate(date: string): boolean {
  const m = DATE_RE.exec(date);
  if (!m) return false;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const t = new Date(Date.UTC(y, mo - 1, d));
  return t.getUTCFullYear() === y && t.getUTCMonth() === mo - 1 && t.getUTCDate() === d;
}

/** Whether `time` is a wall-clock time written HH:MM (00:00–23:59). */
export function isClockTime(time: string): boolean {
  return TIME_RE.test(time);
}

/** Minutes after midnight of an HH:MM time. */
export function clockMinutes(time: string): number {
  const m = TIME_RE.exec(time);
  if (!m) throw new InvalidDateTimeError('A time', time, 'written HH:MM, from 00:00 to 23:59');
  return Number(m[1]) * 60 + Number(m[2]);
}

function assertDate(date: string, what = 'A date'): void {
  if (!isCalendarDate(date)) {
    throw new InvalidDateTimeError(what, date, 'a calendar date written YYYY-MM-DD');
  }
}

/** Days since 1970-01-01 of a YYYY-MM-DD date (no time zone involved). */
export function calendarDayNumber(date: string): number {
  assertDate(date);
  return Date.UTC(+date.slice(0, 4), +date.slice(5, 7) - 1, +date.slice(8, 10)) / 86_400_000;
}

/** The YYYY-MM-DD date `days` after (or before) `date`. */
export function addCalendarDays(date: string, days: number): string {
  return dateOfCalendarDayNumber(calendarDayNumber(date) + days);
}

function dateOfCalendarDayNumber(day: number): string {
  return new Date(day * 86_400_000).toISOString().slice(0, 10);
}

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    try {
      f = new Intl.DateTimeFormat('en-US', {
        timeZone,
        hourCycle: 'h23',
        year: 'numeric',
        month: 'numeric',
        day: 'numeric',
        hour: 'numeric',
        minute: 'numeric',
        second: 'numeric',
      });
    } catch {
      throw new InvalidTimeZoneError(timeZone);
    }
    formatters.set(timeZone, f);
  }
  return f;
}

/** Whether `timeZone` is an IANA zone name the runtime knows. */
export function isTimeZone(timeZone: string): boolean {
  if (typeof timeZone !== 'string' || timeZone.trim() === '') return false;
  try {
    formatterFor(timeZone);
    return true;
  } catch {
    return false;
  }
}

/** Offsets memoised per zone and per quarter hour of UTC (every current zone changes offset on a quarter hour). */
const offsetMemo = new Map<string, Map<number, number>>();

/** The zone's offset from UTC, in minutes, at `instant` (+60 for CET, +120 for CEST). */
export function offsetMinutesAt(instant: EpochMinutes, timeZone: string): number {
  let memo = offsetMemo.get(timeZone);
  if (!memo) {
    memo = new Map();
    offsetMemo.set(timeZone, memo);
  }
  const bucket = Math.floor(instant / 15);
  const cached = memo.get(bucket);
  if (cached !== undefined) return cached;
  const parts = formatterFor(timeZone).formatToParts(new Date(bucket * 15 * 60_000));
  const get = (type: Intl.DateTimeFormatPartTypes) =>
    Number(parts.find((p) => p.type === type)?.value ?? NaN);
  const wall = Date.UTC(
    get('year'),
    get('month') - 1,
    get('day'),
    get('hour'),
    get('minute'),
    get('second'),
  );
  const offset = Math.round(wall / 60_000 - bucket * 15);
  if (memo.size > 50_000) memo.clear();
  memo.set(bucket, offset);
  return offset;
}

export interface WallClock {
  /** YYYY-MM-DD */
  date: string;
  /** HH:MM */
  time: string;
  /** 0 = Sunday … 6 = Saturday */
  weekday: number;
  offsetMinutes: number;
}

const pad = (n: number) => String(n).padStart(2, '0');

/** The date and time a clock in `timeZone` shows at `instant`. */
export function wallClockAt(instant: EpochMinutes, timeZone: string): WallClock {
  const offsetMinutes = offsetMinutesAt(instant, timeZone);
  const local = new Date((instant + offsetMinutes) * 60_000);
  return {
    date: local.toISOString().slice(0, 10),
    time: `${pad(local.getUTCHours())}:${pad(local.getUTCMinutes())}`,
    weekday: local.getUTCDay(),
    offsetMinutes,
  };
}

/** The local date (YYYY-MM-DD) in `timeZone` at `instant`. */
export function localDateAt(instant: EpochMinutes, timeZone: string): string {
  return wallClockAt(instant, timeZone).date;
}

/**
 * The instant a clock in `timeZone` shows `date` `time`. A time skipped by a change to summer
 * time moves forward by the gap (02:30 → 03:30 in Brussels on the last Sunday of March); a time
 * shown twice when summer time ends is the first of the two.
 */
export function zonedToInstant(date: string, time: string, timeZone: string): EpochMinutes {
  assertDate(date);
  const local = calendarDayNumber(date) * MINUTES_PER_DAY + clockMinutes(time);
  const before = offsetMinutesAt(local - MINUTES_PER_DAY, timeZone);
  const after = offsetMinutesAt(local + MINUTES_PER_DAY, timeZone);
  const candidates = [...new Set([before, after])]
    .map((offset) => local - offset)
    .filter((instant) => instant + offsetMinutesAt(instant, timeZone) === local);
  if (candidates.length > 0) return Math.min(...candidates);
  // In the gap: read the wall time with the offset in force before the change.
  return local - before;
}

function formatOffset(offsetMinutes: number): string {
  const sign = offsetMinutes < 0 ? '-' : '+';
  const abs = Math.abs(offsetMinutes);
  return `${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
}

/** ISO 8601 date-time with the zone's offset at that instant, e.g. 2026-10-25T07:00:00+01:00. */
export function toZonedIso(instant: EpochMinutes, timeZone: string): string {
  const w = wallClockAt(instant, timeZone);
  return `${w.date}T${w.time}:00${formatOffset(w.offsetMinutes)}`;
}

/** An ISO 8601 instant with an offset or Z (seconds optional) to epoch minutes, floored to the minute. */
export function parseInstant(iso: string, what = 'The time'): EpochMinutes {
  const ms = ISO_INSTANT_RE.test(iso) ? Date.parse(iso) : NaN;
  if (!Number.isFinite(ms)) {
    throw new InvalidDateTimeError(
      what,
      iso,
      'an ISO date-time with its offset, such as 2026-03-23T15:00:00+01:00',
    );
  }
  return Math.floor(ms / 60_000);
}

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** "Tue 24 Mar 19:30" in `timeZone`: for messages a chef reads. */
export function formatForChef(instant: EpochMinutes, timeZone: string): string {
  const w = wallClockAt(instant, timeZone);
  return `${WEEKDAYS[w.weekday]} ${Number(w.date.slice(8, 10))} ${MONTHS[Number(w.date.slice(5, 7)) - 1]} ${w.time}`;
}

/** "6 h 30 min", "45 min", "2 h", "3 d 4 h". */
export function formatDurationForChef(minutes: number): string {
  const m = Math.max(0, Math.round(minutes));
  if (m === 0) return '0 min';
  const days = Math.floor(m / MINUTES_PER_DAY);
  const hours = Math.floor((m % MINUTES_PER_DAY) / 60);
  const mins = m % 60;
  const parts: string[] = [];
  if (days) parts.push(`${days} d`);
  if (hours) parts.push(`${hours} h`);
  if (mins) parts.push(`${mins} min`);
  return parts.join(' ');
}
