import { describe, expect, it } from 'vitest';
import { renderEventFile } from './event-calendar.js';

const facts = {
  orderId: 'order-1',
  reference: 'N-2026-0007',
  studioName: 'Atelier Test',
  menuName: 'Garden Supper',
  guestCount: 24,
  serviceTime: '19:30',
  venueAddressLines: ['Kouter 8', '9000 Gent'],
  eventUrl: 'http://localhost:5173/my-events/order-1',
  cancelled: false,
  createdAt: new Date('2026-03-01T10:00:00Z'),
};

/** The UTC offset in minutes of a zone at an instant, read from Intl's `longOffset` (the oracle). */
function offsetMinutes(timeZone: string, at: Date): number {
  const name = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'longOffset' })
    .formatToParts(at)
    .find((p) => p.type === 'timeZoneName')!.value; // "GMT-04:00"
  const m = /GMT([+-])(\d{2}):(\d{2})/.exec(name);
  return m ? (m[1] === '-' ? -1 : 1) * (Number(m[2]) * 60 + Number(m[3])) : 0;
}

describe('renderEventFile (RFC 5545 via ical-generator)', () => {
  it('writes 19:30 on the studio’s wall clock as UTC, across zones and daylight saving', () => {
    const cases = [
      // IANA tz database: New York is EDT (UTC−4) in July, EST (UTC−5) in January.
      { timeZone: 'America/New_York', eventDate: '2026-07-04', utc: '20260704T233000Z' },
      { timeZone: 'America/New_York', eventDate: '2026-01-10', utc: '20260111T003000Z' },
      // Tokyo has no daylight saving: JST is UTC+9 all year.
      { timeZone: 'Asia/Tokyo', eventDate: '2026-07-04', utc: '20260704T103000Z' },
      // Brussels on the night clocks go forward (29 March 2026): 19:30 is already CEST, UTC+2.
      { timeZone: 'Europe/Brussels', eventDate: '2026-03-29', utc: '20260329T173000Z' },
    ];
    for (const c of cases) {
      const ics = renderEventFile({ ...facts, timeZone: c.timeZone, eventDate: c.eventDate });
      expect(ics, c.timeZone).toContain(`DTSTART:${c.utc}`);
      // Cross-check with Intl: the UTC instant plus the zone's offset at it is 19:30 local.
      const y = c.utc;
      const instant = new Date(
        Date.UTC(
          +y.slice(0, 4),
          +y.slice(4, 6) - 1,
          +y.slice(6, 8),
          +y.slice(9, 11),
          +y.slice(11, 13),
        ),
      );
      const local = new Date(instant.getTime() + offsetMinutes(c.timeZone, instant) * 60_000);
      expect(local.toISOString().slice(11, 16)).toBe('19:30');
    }
  });

  it('holds no guest details and marks a closed booking cancelled', () => {
    const ics = renderEventFile({
      ...facts,
      timeZone: 'Europe/Brussels',
      eventDate: '2026-06-20',
      cancelled: true,
    });
    expect(ics).toContain('STATUS:CANCELLED');
    expect(ics).toContain('UID:order-1@nappe');
    expect(ics).toMatch(/LOCATION:Kouter 8\\, 9000 Gent/);
    expect(ics.startsWith('BEGIN:VCALENDAR')).toBe(true);
  });
});
