import { addIsoDays, isoDayNumber, type IsoDate } from '@nappe/shared';

/**
 * Month arithmetic for the calendar, on ISO strings: a month is "YYYY-MM", a day "YYYY-MM-DD".
 * Weeks start on Monday (ISO 8601). No `Date` in local time is involved, so a daylight-saving
 * change cannot move a day.
 */
export type IsoMonth = string;

const MONTH = /^(\d{4})-(\d{2})$/;

export function isIsoMonth(value: unknown): value is IsoMonth {
  if (typeof value !== 'string') return false;
  const m = MONTH.exec(value);
  return m !== null && Number(m[2]) >= 1 && Number(m[2]) <= 12 && Number(m[1]) >= 1000;
}

export function monthOf(date: IsoDate): IsoMonth {
  return date.slice(0, 7);
}

export function firstDayOf(month: IsoMonth): IsoDate {
  return `${month}-01`;
}

export function daysInMonth(month: IsoMonth): number {
  const [y, m] = month.split('-').map(Number) as [number, number];
  return new Date(Date.UTC(y, m, 0)).getUTCDate();
}

export function lastDayOf(month: IsoMonth): IsoDate {
  return `${month}-${String(daysInMonth(month)).padStart(2, '0')}`;
}

export function addMonths(month: IsoMonth, n: number): IsoMonth {
  const [y, m] = month.split('-').map(Number) as [number, number];
  const index = y * 12 + (m - 1) + n;
  return `${String(Math.floor(index / 12)).padStart(4, '0')}-${String((index % 12) + 1).padStart(2, '0')}`;
}

export function compareMonths(a: IsoMonth, b: IsoMonth): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** ISO weekday: Monday 1 … Sunday 7. Day 0 (1970-01-01) was a Thursday. */
export function isoWeekday(date: IsoDate): number {
  return ((((isoDayNumber(date) + 3) % 7) + 7) % 7) + 1;
}

/** The month as weeks of seven cells, Monday first; days of other months are null. */
export function monthGrid(month: IsoMonth): (IsoDate | null)[][] {
  const first = firstDayOf(month);
  const lead = isoWeekday(first) - 1;
  const count = daysInMonth(month);
  const cells: (IsoDate | null)[] = [
    ...Array.from({ length: lead }, () => null),
    ...Array.from({ length: count }, (_, i) => addIsoDays(first, i)),
  ];
  while (cells.length % 7 !== 0) cells.push(null);
  const weeks: (IsoDate | null)[][] = [];
  for (let i = 0; i < cells.length; i += 7) weeks.push(cells.slice(i, i + 7));
  return weeks;
}

/** The same day of another month, or its last day when that month is shorter (31 Jan → 28 Feb). */
export function sameDayInMonth(date: IsoDate, month: IsoMonth): IsoDate {
  const day = Math.min(Number(date.slice(8, 10)), daysInMonth(month));
  return `${month}-${String(day).padStart(2, '0')}`;
}

export type CalendarKey =
  'ArrowLeft' | 'ArrowRight' | 'ArrowUp' | 'ArrowDown' | 'Home' | 'End' | 'PageUp' | 'PageDown';

/**
 * Where a key moves the focused day, as in the WAI-ARIA Authoring Practices' date picker grid:
 * arrows by a day or a week, Home/End to the start/end of the week, Page Up/Down by a month
 * (with Shift, by a year).
 */
export function moveDate(date: IsoDate, key: string, shift = false): IsoDate | null {
  switch (key) {
    case 'ArrowLeft':
      return addIsoDays(date, -1);
    case 'ArrowRight':
      return addIsoDays(date, 1);
    case 'ArrowUp':
      return addIsoDays(date, -7);
    case 'ArrowDown':
      return addIsoDays(date, 7);
    case 'Home':
      return addIsoDays(date, 1 - isoWeekday(date));
    case 'End':
      return addIsoDays(date, 7 - isoWeekday(date));
    case 'PageUp':
      return sameDayInMonth(date, addMonths(monthOf(date), shift ? -12 : -1));
    case 'PageDown':
      return sameDayInMonth(date, addMonths(monthOf(date), shift ? 12 : 1));
    default:
      return null;
  }
}

const monthLabelFormat = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  month: 'long',
  year: 'numeric',
});

/** "July 2026". */
export function monthLabel(month: IsoMonth): string {
  return monthLabelFormat.format(isoDayNumber(firstDayOf(month)) * 86_400_000);
}

/** Today on this device's calendar, as the starting month before the server says otherwise. */
export function localToday(now: Date = new Date()): IsoDate {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, '0');
  const d = String(now.getDate()).padStart(2, '0');
  return `${y}-${m}-${d}`;
}
