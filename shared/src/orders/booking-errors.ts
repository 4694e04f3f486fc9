/**
 * Errors a client or the chef may see from the booking rules (quote, refunds, availability,
 * order lifecycle). Each has a stable `code` the API maps to an HTTP status — 400 for bad input
 * (`invalid_booking_input`, `guest_count_out_of_range`, `event_date_passed`), 409 for a request
 * the order's state refuses (`menu_not_offered`, `final_count_deadline_passed`, `event_passed`,
 * `illegal_transition`, `actor_not_allowed`) — and a message written for the person booking,
 * not for a developer.
 */
export abstract class BookingError extends Error {
  abstract readonly code: string;

  constructor(message: string) {
    super(message);
    this.name = new.target.name;
  }
}

export function isBookingError(value: unknown): value is BookingError {
  return value instanceof BookingError;
}

/** A number, date or setting that cannot be used (a fractional amount of money, a bad date…). */
export class InvalidBookingInputError extends BookingError {
  readonly code = 'invalid_booking_input';

  constructor(
    readonly what: string,
    readonly value: unknown,
    readonly expectation: string,
  ) {
    super(`${what} must be ${expectation}; got ${JSON.stringify(value) ?? String(value)}.`);
  }
}

/** The guest count is outside what the menu (or the booking form) allows. */
export class GuestCountOutOfRangeError extends BookingError {
  readonly code = 'guest_count_out_of_range';

  constructor(
    readonly guestCount: number,
    readonly minGuests: number,
    readonly maxGuests: number,
    readonly menuName: string,
  ) {
    super(
      guestCount < minGuests
        ? `“${menuName}” is served to at least ${minGuests} guests; you asked for ${guestCount}.`
        : `“${menuName}” is served to at most ${maxGuests} guests; you asked for ${guestCount}. For a larger party, please contact the studio.`,
    );
  }
}

/** The menu is switched off by the chef. */
export class MenuNotOfferedError extends BookingError {
  readonly code = 'menu_not_offered';

  constructor(readonly menuName: string) {
    super(`“${menuName}” is not offered at the moment. Please choose another menu.`);
  }
}

/** A quote or booking for a date before today. */
export class EventDatePassedError extends BookingError {
  readonly code = 'event_date_passed';

  constructor(
    readonly eventDate: string,
    readonly today: string,
  ) {
    super(
      `The date ${eventDate} has already passed (today is ${today}). Please pick a later date.`,
    );
  }
}

/** The guest count can no longer change: the final-count deadline has passed. */
export class FinalGuestCountDeadlineError extends BookingError {
  readonly code = 'final_count_deadline_passed';

  constructor(
    readonly deadline: string,
    readonly daysBefore: number,
  ) {
    super(
      `The final number of guests was due by ${deadline} (${daysBefore} ${daysBefore === 1 ? 'day' : 'days'} before the event), so it can no longer be changed here. Please contact the studio.`,
    );
  }
}

/** Cancelling (or re-quoting) an event whose date is behind us. */
export class EventPassedError extends BookingError {
  readonly code = 'event_passed';

  constructor(readonly eventDate: string) {
    super(`The event on ${eventDate} has already taken place, so it can no longer be cancelled.`);
  }
}
