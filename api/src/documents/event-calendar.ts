import { zonedToInstant } from '@nappe/shared';
import ical, { ICalEventStatus } from 'ical-generator';

export interface EventFileFacts {
  orderId: string;
  reference: string;
  studioName: string;
  menuName: string;
  guestCount: number;
  /** `YYYY-MM-DD` and `HH:MM` on the studio's wall clock. */
  eventDate: string;
  serviceTime: string;
  timeZone: string;
  venueAddressLines: string[];
  eventUrl: string;
  cancelled: boolean;
  createdAt: Date;
}

/** The dessert service, nominally one hour from the service time. */
export const SERVICE_MINUTES = 60;

/**
 * The event as an iCalendar file (RFC 5545) made with ical-generator. The service time is read
 * on the studio's wall clock (`zonedToInstant`, the runtime's IANA zone data) and written as UTC,
 * so every calendar shows it at the right moment in its own zone. No guest details.
 */
export function renderEventFile(facts: EventFileFacts): string {
  const start = new Date(
    zonedToInstant(facts.eventDate, facts.serviceTime, facts.timeZone) * 60_000,
  );
  const end = new Date(start.getTime() + SERVICE_MINUTES * 60_000);
  const calendar = ical({
    name: `${facts.studioName} — ${facts.reference}`,
    prodId: { company: 'Nappe', product: 'bookings', language: 'EN' },
  });
  calendar.createEvent({
    id: `${facts.orderId}@nappe`,
    start,
    end,
    stamp: facts.createdAt,
    summary: `${facts.menuName} by ${facts.studioName}`,
    description: `Dessert service for ${facts.guestCount} ${facts.guestCount === 1 ? 'guest' : 'guests'}. Booking ${facts.reference}. Details: ${facts.eventUrl}`,
    location: facts.venueAddressLines.join(', '),
    url: facts.eventUrl,
    status: facts.cancelled ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
  });
  return calendar.toString();
}
