import {
  addIsoDays,
  isoDayNumber,
  ORDER_STATUSES,
  OrderStatus,
  type IsoDate,
  type OrderSummary,
} from '@nappe/shared';

/** A month of the studio's calendar, written `YYYY-MM` as in the address bar. */
export type Month = string;

const MONTH = /^(\d{4})-(0[1-9]|1[0-2])$/;

export function isMonth(value: unknown): value is Month {
  return typeof value === 'string' && MONTH.test(value);
}

/** The month a date falls in. */
export function monthOf(date: IsoDate): Month {
  return date.slice(0, 7);
}

export function addMonths(month: Month, count: number): Month {
  const [, y, m] = MONTH.exec(month)!;
  const index = Number(y) * 12 + (Number(m) - 1) + count;
  const year = Math.floor(index / 12);
  return `${String(year).padStart(4, '0')}-${String((index % 12) + 1).padStart(2, '0')}`;
}

export function firstDayOf(month: Month): IsoDate {
  return `${month}-01`;
}

export function lastDayOf(month: Month): IsoDate {
  return addIsoDays(firstDayOf(addMonths(month, 1)), -1);
}

/** 0 = Monday … 6 = Sunday (ISO 8601 weeks); 1970-01-01, day 0, was a Thursday. */
export function weekdayOf(date: IsoDate): number {
  return (((isoDayNumber(date) + 3) % 7) + 7) % 7;
}

/**
 * The weeks shown for a month, Monday first (ISO 8601, as in the studio's part of the world):
 * from the Monday on or before the 1st to the Sunday on or after the last day — 4 to 6 weeks
 * of 7 dates, the neighbouring months' days included.
 */
export function monthGrid(month: Month): IsoDate[][] {
  const start = addIsoDays(firstDayOf(month), -weekdayOf(firstDayOf(month)));
  const last = lastDayOf(month);
  const end = addIsoDays(last, 6 - weekdayOf(last));
  const weeks: IsoDate[][] = [];
  for (let day = start; day <= end; day = addIsoDays(day, 7)) {
    weeks.push(Array.from({ length: 7 }, (_, i) => addIsoDays(day, i)));
  }
  return weeks;
}

/** The first and last date of the month's grid: what the calendar asks the API for. */
export function gridRange(month: Month): { from: IsoDate; to: IsoDate } {
  const weeks = monthGrid(month);
  return { from: weeks[0]![0]!, to: weeks.at(-1)![6]! };
}

const utcNoon = (date: IsoDate) => isoDayNumber(date) * 86_400_000 + 43_200_000;

/** "March 2026". */
export function monthLabel(month: Month): string {
  return new Intl.DateTimeFormat('en-GB', {
    month: 'long',
    year: 'numeric',
    timeZone: 'UTC',
  }).format(utcNoon(firstDayOf(month)));
}

/** Monday … Sunday, long and short. */
export const WEEKDAYS = [
  'Monday',
  'Tuesday',
  'Wednesday',
  'Thursday',
  'Friday',
  'Saturday',
  'Sunday',
];

/** "Tuesday 3 March": a day of the grid, for a heading or a screen reader. */
export function dayLabel(date: IsoDate): string {
  return new Intl.DateTimeFormat('en-GB', {
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    timeZone: 'UTC',
  }).format(utcNoon(date));
}

/**
 * Orders that belong on the calendar: those holding or having used the day's plates. A checkout
 * that expired, a declined or a cancelled booking takes nothing from the kitchen.
 */
export const CALENDAR_STATUSES: readonly OrderStatus[] = ORDER_STATUSES.filter(
  (s) => s !== OrderStatus.Expired && s !== OrderStatus.Declined && s !== OrderStatus.Cancelled,
);

/** Orders by event date, each day's in service-time order. */
export function ordersByDay(orders: readonly OrderSummary[]): Map<IsoDate, OrderSummary[]> {
  const days = new Map<IsoDate, OrderSummary[]>();
  for (const order of orders) {
    if (!CALENDAR_STATUSES.includes(order.status)) continue;
    const list = days.get(order.eventDate) ?? [];
    list.push(order);
    days.set(order.eventDate, list);
  }
  for (const list of days.values()) {
    list.sort(
      (a, b) =>
        a.serviceTime.localeCompare(b.serviceTime) || a.reference.localeCompare(b.reference),
    );
  }
  return days;
}

/**
 * Plates a day's orders take from the kitchen's capacity, or null when the API did not say
 * (an API older than the `plates` field): the screen then shows no figure rather than a guess.
 */
export function platesOn(orders: readonly OrderSummary[]): number | null {
  let total = 0;
  for (const order of orders) {
    if (order.plates === undefined) return null;
    total += order.plates;
  }
  return total;
}
