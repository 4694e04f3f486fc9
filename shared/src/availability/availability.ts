import type { Menu } from '../kitchen/types.js';
import { InvalidBookingInputError } from '../orders/booking-errors.js';
import type { StudioSettings } from '../settings/studio-settings.js';
import {
  addIsoDays,
  assertIsoDate,
  compareIsoDates,
  daysBetween,
  formatIsoDate,
  type IsoDate,
} from './iso-date.js';

/**
 * Which dates can still be booked: the daily plate capacity minus the plates already held on
 * that day (orders that are pending payment, requested or confirmed), blackout dates, each
 * menu's lead days and minimum guests, and "today" in the studio's time zone. A menu of several
 * desserts serves each guest every dessert, so it takes guests × desserts plates.
 */

export type DayStatus = 'open' | 'full' | 'blackout' | 'too_soon' | 'past';

/** What availability needs of a menu (absent = any booking of at least one plate). */
export interface MenuBookingRules {
  name?: string;
  leadDays: number;
  minGuests: number;
  maxGuests: number;
  /** Plates per guest: the number of desserts in the menu. */
  platesPerGuest: number;
}

export function menuBookingRules(menu: Menu): MenuBookingRules {
  return {
    name: menu.name,
    leadDays: menu.leadDays,
    minGuests: menu.minGuests,
    maxGuests: menu.maxGuests,
    platesPerGuest: menu.dessertIds.length,
  };
}

/** Plates an order takes from the day's capacity. */
export function platesForGuests(guests: number, platesPerGuest: number): number {
  return guests * platesPerGuest;
}

export interface AvailabilityInput {
  settings: Pick<StudioSettings, 'dailyPlateCapacity' | 'blackoutDates'>;
  /** Plates already held per date. Dates not listed hold none. */
  platesTaken: ReadonlyMap<IsoDate, number> | Readonly<Record<IsoDate, number>>;
  /** Today in the studio's time zone (`dateInTimeZone(now, settings.timeZone)`). */
  today: IsoDate;
  menu?: MenuBookingRules;
}

export interface DayAvailability {
  date: IsoDate;
  status: DayStatus;
  capacity: number;
  platesTaken: number;
  /** capacity − taken, never below 0. */
  remainingPlates: number;
  /** Plates that can still be booked on this date: the remaining plates when open, else 0. */
  bookablePlates: number;
  /** The earliest date the menu can be booked for (today + lead days). */
  earliestDate: IsoDate;
  message: string;
}

function menuLabel(menu: MenuBookingRules): string {
  return menu.name ? `“${menu.name}”` : 'This menu';
}

function wholeAtLeast(what: string, value: number, min: number): void {
  if (!Number.isInteger(value) || value < min) {
    throw new InvalidBookingInputError(what, value, `a whole number, ${min} or more`);
  }
}

function takenOn(input: AvailabilityInput, date: IsoDate): number {
  const taken =
    input.platesTaken instanceof Map
      ? input.platesTaken.get(date)
      : (input.platesTaken as Readonly<Record<IsoDate, number>>)[date];
  const plates = taken ?? 0;
  wholeAtLeast(`The plates already booked on ${date}`, plates, 0);
  return plates;
}

function checkInput(input: AvailabilityInput): MenuBookingRules {
  assertIsoDate('Today’s date', input.today);
  wholeAtLeast('The daily plate capacity', input.settings.dailyPlateCapacity, 0);
  const menu = input.menu ?? {
    leadDays: 0,
    minGuests: 1,
    maxGuests: Number.MAX_SAFE_INTEGER,
    platesPerGuest: 1,
  };
  wholeAtLeast('The lead days', menu.leadDays, 0);
  wholeAtLeast('The minimum number of guests', menu.minGuests, 1);
  wholeAtLeast('The plates per guest', menu.platesPerGuest, 1);
  return menu;
}

function dayWithRules(
  date: IsoDate,
  input: AvailabilityInput,
  menu: MenuBookingRules,
): DayAvailability {
  assertIsoDate('The date', date);
  const capacity = input.settings.dailyPlateCapacity;
  const platesTaken = takenOn(input, date);
  const remainingPlates = Math.max(0, capacity - platesTaken);
  const earliestDate = addIsoDays(input.today, menu.leadDays);
  const day = formatIsoDate(date);
  const base = { date, capacity, platesTaken, remainingPlates, earliestDate };
  const smallest = platesForGuests(menu.minGuests, menu.platesPerGuest);

  if (compareIsoDates(date, input.today) < 0) {
    return { ...base, status: 'past', bookablePlates: 0, message: `${day} has passed.` };
  }
  if (input.settings.blackoutDates.includes(date)) {
    return {
      ...base,
      status: 'blackout',
      bookablePlates: 0,
      message: `The studio takes no events on ${day}.`,
    };
  }
  if (compareIsoDates(date, earliestDate) < 0) {
    return {
      ...base,
      status: 'too_soon',
      bookablePlates: 0,
      message: `${menuLabel(menu)} needs ${menu.leadDays} ${menu.leadDays === 1 ? 'day' : 'days'}’ notice: the earliest date is ${formatIsoDate(earliestDate)}.`,
    };
  }
  if (remainingPlates < smallest) {
    return { ...base, status: 'full', bookablePlates: 0, message: `${day} is fully booked.` };
  }
  return {
    ...base,
    status: 'open',
    bookablePlates: remainingPlates,
    message: `${day} is open: ${remainingPlates} ${remainingPlates === 1 ? 'plate' : 'plates'} left.`,
  };
}

/** One date's status and remaining plates. */
export function dayAvailability(date: IsoDate, input: AvailabilityInput): DayAvailability {
  return dayWithRules(date, input, checkInput(input));
}

export const AVAILABILITY_RANGE_MAX_DAYS = 400;

/** Every date from `from` to `to`, both included (at most 400 days). */
export function availabilityRange(
  from: IsoDate,
  to: IsoDate,
  input: AvailabilityInput,
): DayAvailability[] {
  assertIsoDate('The first date', from);
  assertIsoDate('The last date', to);
  const days = daysBetween(from, to) + 1;
  if (days < 1) {
    throw new InvalidBookingInputError('The last date', to, `on or after the first date (${from})`);
  }
  if (days > AVAILABILITY_RANGE_MAX_DAYS) {
    throw new InvalidBookingInputError(
      'The date range',
      `${from} – ${to}`,
      `at most ${AVAILABILITY_RANGE_MAX_DAYS} days long`,
    );
  }
  const menu = checkInput(input);
  return Array.from({ length: days }, (_, i) => dayWithRules(addIsoDays(from, i), input, menu));
}

export type CanBookReason =
  DayStatus | 'not_enough_plates' | 'too_few_guests' | 'too_many_guests' | 'invalid_guest_count';

export type CanBookResult =
  | { ok: true; platesNeeded: number; remainingAfter: number; message: string }
  | { ok: false; reason: Exclude<CanBookReason, 'open'>; platesNeeded: number; message: string };

/** Whether `guests` guests of the menu can be booked on `date`, with a reason a client can read. */
export function canBook(date: IsoDate, guests: number, input: AvailabilityInput): CanBookResult {
  const menu = checkInput(input);
  if (!Number.isInteger(guests) || guests < 1) {
    return {
      ok: false,
      reason: 'invalid_guest_count',
      platesNeeded: 0,
      message: 'Enter the number of guests as a whole number, at least 1.',
    };
  }
  const platesNeeded = platesForGuests(guests, menu.platesPerGuest);
  const menuName = menuLabel(menu);
  if (guests < menu.minGuests) {
    return {
      ok: false,
      reason: 'too_few_guests',
      platesNeeded,
      message: `${menuName} is served to at least ${menu.minGuests} guests.`,
    };
  }
  if (guests > menu.maxGuests) {
    return {
      ok: false,
      reason: 'too_many_guests',
      platesNeeded,
      message: `${menuName} is served to at most ${menu.maxGuests} guests. For a larger party, please contact the studio.`,
    };
  }
  const day = dayWithRules(date, input, menu);
  if (day.status !== 'open') {
    return { ok: false, reason: day.status, platesNeeded, message: day.message };
  }
  if (platesNeeded > day.remainingPlates) {
    const perGuest =
      menu.platesPerGuest > 1 ? ` (${menu.platesPerGuest} desserts for each guest)` : '';
    return {
      ok: false,
      reason: 'not_enough_plates',
      platesNeeded,
      message: `Only ${day.remainingPlates} plates are left on ${formatIsoDate(date)}; ${guests} guests need ${platesNeeded}${perGuest}. Try fewer guests or another date.`,
    };
  }
  return {
    ok: true,
    platesNeeded,
    remainingAfter: day.remainingPlates - platesNeeded,
    message: `${formatIsoDate(date)} is available for ${guests} guests.`,
  };
}
