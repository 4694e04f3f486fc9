import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEMO_MENUS } from '../../kitchen/demo-catalogue.js';
import { InvalidBookingInputError } from '../../orders/booking-errors.js';
import {
  availabilityRange,
  canBook,
  dayAvailability,
  menuBookingRules,
  type AvailabilityInput,
} from '../availability.js';
import { dateInTimeZone } from '../iso-date.js';

// Invented studio: 100 plates a day, closed on 2026-06-24.
const input = (over: Partial<AvailabilityInput> = {}): AvailabilityInput => ({
  settings: { dailyPlateCapacity: 100, blackoutDates: ['2026-06-24'] },
  platesTaken: { '2026-06-20': 100, '2026-06-21': 95, '2026-06-22': 60 },
  today: '2026-06-10',
  menu: { name: 'Test Supper', leadDays: 4, minGuests: 8, maxGuests: 60, platesPerGuest: 1 },
  ...over,
});

describe('the status of each date', () => {
  it('past, too soon, blackout, full, open', () => {
    const days = availabilityRange('2026-06-09', '2026-06-24', input());
    const status = Object.fromEntries(days.map((d) => [d.date, d.status]));
    expect(status['2026-06-09']).toBe('past');
    expect(status['2026-06-10']).toBe('too_soon'); // today, 4 lead days
    expect(status['2026-06-13']).toBe('too_soon');
    expect(status['2026-06-14']).toBe('open'); // today + 4
    expect(status['2026-06-20']).toBe('full'); // 100 of 100 taken
    expect(status['2026-06-21']).toBe('full'); // 5 left < 8 guests minimum
    expect(status['2026-06-22']).toBe('open');
    expect(status['2026-06-24']).toBe('blackout');
    expect(days).toHaveLength(16);
  });

  it('remaining plates, and what can still be booked', () => {
    const d = dayAvailability('2026-06-22', input());
    expect(d).toMatchObject({
      capacity: 100,
      platesTaken: 60,
      remainingPlates: 40,
      bookablePlates: 40,
    });
    expect(d.message).toBe('Monday 22 June 2026 is open: 40 plates left.');
    const full = dayAvailability('2026-06-21', input());
    expect(full).toMatchObject({ remainingPlates: 5, bookablePlates: 0 });
    // Overbooked by hand: never negative.
    const over = dayAvailability(
      '2026-06-22',
      input({ platesTaken: new Map([['2026-06-22', 130]]) }),
    );
    expect(over.remainingPlates).toBe(0);
    expect(over.status).toBe('full');
  });

  it('the earliest date comes from the lead days, in words', () => {
    const d = dayAvailability('2026-06-12', input());
    expect(d.earliestDate).toBe('2026-06-14');
    expect(d.message).toBe(
      '“Test Supper” needs 4 days’ notice: the earliest date is Sunday 14 June 2026.',
    );
  });

  it('past beats blackout beats too soon beats full', () => {
    const i = input({
      settings: { dailyPlateCapacity: 100, blackoutDates: ['2026-06-09', '2026-06-11'] },
      platesTaken: { '2026-06-09': 100, '2026-06-11': 100, '2026-06-12': 100 },
    });
    expect(dayAvailability('2026-06-09', i).status).toBe('past');
    expect(dayAvailability('2026-06-11', i).status).toBe('blackout');
    expect(dayAvailability('2026-06-12', i).status).toBe('too_soon');
  });

  it('without a menu: any date with one plate left is open', () => {
    const i = input({ menu: undefined });
    expect(dayAvailability('2026-06-10', i).status).toBe('open');
    expect(dayAvailability('2026-06-21', i).status).toBe('open');
    expect(dayAvailability('2026-06-20', i).status).toBe('full');
  });

  it('“today” is the studio’s local date: just after midnight in Brussels, yesterday is past', () => {
    // 22:30 UTC on 9 June is 00:30 on 10 June in Brussels (CEST, UTC+2).
    const today = dateInTimeZone(Date.parse('2026-06-09T22:30:00Z'), 'Europe/Brussels');
    expect(today).toBe('2026-06-10');
    expect(dayAvailability('2026-06-09', input({ today, menu: undefined })).status).toBe('past');
    // In UTC it is still the 9th, which would wrongly leave the 9th open.
    const utcToday = dateInTimeZone(Date.parse('2026-06-09T22:30:00Z'), 'UTC');
    expect(dayAvailability('2026-06-09', input({ today: utcToday, menu: undefined })).status).toBe(
      'open',
    );
  });

  it('bad input is a readable error', () => {
    expect(() => dayAvailability('2026-06-31', input())).toThrowError(/real date/);
    expect(() => availabilityRange('2026-06-10', '2026-06-01', input())).toThrowError(
      /on or after the first date/,
    );
    expect(() => availabilityRange('2026-01-01', '2027-12-31', input())).toThrowError(
      /at most 400 days/,
    );
    expect(() =>
      dayAvailability('2026-06-22', input({ platesTaken: { '2026-06-22': 2.5 } })),
    ).toThrowError(InvalidBookingInputError);
  });
});

describe('can these guests be booked on this date?', () => {
  it('yes, with the plates left afterwards', () => {
    expect(canBook('2026-06-22', 40, input())).toEqual({
      ok: true,
      platesNeeded: 40,
      remainingAfter: 0,
      message: 'Monday 22 June 2026 is available for 40 guests.',
    });
  });

  it('no, and why', () => {
    expect(canBook('2026-06-22', 41, input())).toMatchObject({
      ok: false,
      reason: 'not_enough_plates',
      message:
        'Only 40 plates are left on Monday 22 June 2026; 41 guests need 41. Try fewer guests or another date.',
    });
    expect(canBook('2026-06-22', 7, input())).toMatchObject({
      reason: 'too_few_guests',
      message: '“Test Supper” is served to at least 8 guests.',
    });
    expect(canBook('2026-06-22', 61, input())).toMatchObject({ reason: 'too_many_guests' });
    expect(canBook('2026-06-22', 0, input())).toMatchObject({ reason: 'invalid_guest_count' });
    expect(canBook('2026-06-24', 10, input())).toMatchObject({
      reason: 'blackout',
      message: 'The studio takes no events on Wednesday 24 June 2026.',
    });
    expect(canBook('2026-06-11', 10, input())).toMatchObject({ reason: 'too_soon' });
    expect(canBook('2026-06-01', 10, input())).toMatchObject({
      reason: 'past',
      message: 'Monday 1 June 2026 has passed.',
    });
    expect(canBook('2026-06-20', 10, input())).toMatchObject({
      reason: 'full',
      message: 'Saturday 20 June 2026 is fully booked.',
    });
  });

  it('a menu of three desserts takes three plates per guest', () => {
    const trio = menuBookingRules(DEMO_MENUS[1]!);
    expect(trio.platesPerGuest).toBe(3);
    const i = input({ menu: trio, today: '2026-06-01' });
    // 40 plates left on the 22nd: 13 guests × 3 = 39 fit; but the menu needs 20 guests (60 plates).
    expect(dayAvailability('2026-06-22', i).status).toBe('full');
    const roomy = input({ menu: trio, today: '2026-06-01', platesTaken: {} });
    expect(canBook('2026-06-22', 30, roomy)).toMatchObject({
      ok: true,
      platesNeeded: 90,
      remainingAfter: 10,
    });
    expect(canBook('2026-06-22', 34, roomy)).toMatchObject({
      ok: false,
      reason: 'not_enough_plates',
      message:
        'Only 100 plates are left on Monday 22 June 2026; 34 guests need 102 (3 desserts for each guest). Try fewer guests or another date.',
    });
  });

  it('never books beyond the day’s capacity (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 500 }),
        fc.integer({ min: 0, max: 600 }),
        fc.integer({ min: 1, max: 200 }),
        fc.integer({ min: 1, max: 4 }),
        fc.integer({ min: 0, max: 30 }),
        (capacity, taken, guests, perGuest, ahead) => {
          const date = '2026-07-15';
          const i: AvailabilityInput = {
            settings: { dailyPlateCapacity: capacity, blackoutDates: [] },
            platesTaken: { [date]: taken },
            today: '2026-07-01',
            menu: { leadDays: ahead, minGuests: 1, maxGuests: 200, platesPerGuest: perGuest },
          };
          const r = canBook(date, guests, i);
          if (r.ok) {
            expect(taken + r.platesNeeded).toBeLessThanOrEqual(capacity);
            expect(r.remainingAfter).toBe(capacity - taken - guests * perGuest);
            expect(dayAvailability(date, i).status).toBe('open');
          } else {
            expect(r.message.length).toBeGreaterThan(10);
            if (ahead <= 14 && taken + guests * perGuest <= capacity) {
              expect.unreachable(`refused a booking that fits: ${r.message}`);
            }
          }
        },
      ),
    );
  });
});
