import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidBookingInputError } from '../../orders/booking-errors.js';
import {
  addIsoDays,
  dateInTimeZone,
  isoDayNumber,
  daysBetween,
  formatIsoDate,
  isoDateFromDayNumber,
  isIsoDate,
  isValidTimeZone,
  isoDateSchema,
} from '../iso-date.js';

describe('ISO 8601 calendar dates', () => {
  it('only real Gregorian dates (leap years: divisible by 4, centuries only by 400)', () => {
    expect(isIsoDate('2028-02-29')).toBe(true);
    expect(isIsoDate('2000-02-29')).toBe(true);
    expect(isIsoDate('2026-02-29')).toBe(false);
    expect(isIsoDate('1900-02-29')).toBe(false);
    expect(isIsoDate('2026-04-31')).toBe(false);
    expect(isIsoDate('2026-12-31')).toBe(true);
    expect(isIsoDate('2026-13-01')).toBe(false);
    expect(isIsoDate('2026-6-1')).toBe(false);
    expect(isIsoDate('2026-06-01T00:00:00Z')).toBe(false);
    expect(isIsoDate(20260601)).toBe(false);
    expect(isoDateSchema.safeParse(' 2026-06-01 ').data).toBe('2026-06-01');
  });

  it('day arithmetic: 1970-01-01 is day 0 (POSIX epoch); month and leap-year ends', () => {
    expect(isoDayNumber('1970-01-01')).toBe(0);
    expect(isoDayNumber('2000-03-01')).toBe(11017); // POSIX: 951868800 s ÷ 86400
    expect(addIsoDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(addIsoDays('2026-02-28', 1)).toBe('2026-03-01');
    expect(addIsoDays('2026-01-01', -1)).toBe('2025-12-31');
    expect(daysBetween('2026-06-11', '2026-07-01')).toBe(20);
  });

  it('counts days across a daylight-saving change without losing or gaining one', () => {
    // Directive 2000/84/EC: summer time starts at 01:00 UTC on the last Sunday of March
    // (30 March 2025) and ends at 01:00 UTC on the last Sunday of October (26 October 2025).
    expect(daysBetween('2025-03-29', '2025-03-31')).toBe(2);
    expect(daysBetween('2025-10-25', '2025-10-27')).toBe(2);
    expect(addIsoDays('2025-03-30', 1)).toBe('2025-03-31');
  });

  it('addIsoDays and daysBetween are inverse', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -30_000, max: 30_000 }),
        fc.integer({ min: -1000, max: 1000 }),
        (d, n) => {
          const date = isoDateFromDayNumber(d + 20_000);
          expect(daysBetween(date, addIsoDays(date, n))).toBe(n);
          expect(isIsoDate(addIsoDays(date, n))).toBe(true);
        },
      ),
    );
  });

  it('reads for people', () => {
    expect(formatIsoDate('2026-06-21')).toBe('Sunday 21 June 2026');
    expect(formatIsoDate('2026-06-21', 'fr-BE')).toMatch(/^dimanche,? 21 juin 2026$/);
    expect(() => formatIsoDate('2026-02-30')).toThrowError(InvalidBookingInputError);
  });
});

describe('today in the studio’s time zone', () => {
  it('Europe/Brussels around the start of summer time (Directive 2000/84/EC, Art. 1–2)', () => {
    // Before: CET = UTC+1. 22:30 UTC on 29 March is 23:30 in Brussels — still the 29th.
    expect(dateInTimeZone(Date.parse('2025-03-29T22:30:00Z'), 'Europe/Brussels')).toBe(
      '2025-03-29',
    );
    // 23:30 UTC on the 29th is already 00:30 on the 30th in Brussels, still the 29th in UTC.
    expect(dateInTimeZone(Date.parse('2025-03-29T23:30:00Z'), 'Europe/Brussels')).toBe(
      '2025-03-30',
    );
    expect(dateInTimeZone(Date.parse('2025-03-29T23:30:00Z'), 'UTC')).toBe('2025-03-29');
    // After: CEST = UTC+2. The same 22:30 UTC now falls after local midnight.
    expect(dateInTimeZone(Date.parse('2025-03-30T22:30:00Z'), 'Europe/Brussels')).toBe(
      '2025-03-31',
    );
    expect(dateInTimeZone(Date.parse('2025-03-30T21:59:59Z'), 'Europe/Brussels')).toBe(
      '2025-03-30',
    );
  });

  it('Europe/Brussels around the end of summer time', () => {
    // 22:30 UTC on 25 October is 00:30 CEST on the 26th; on the 26th (CET again) it is 23:30.
    expect(dateInTimeZone(new Date('2025-10-25T22:30:00Z'), 'Europe/Brussels')).toBe('2025-10-26');
    expect(dateInTimeZone(new Date('2025-10-26T22:30:00Z'), 'Europe/Brussels')).toBe('2025-10-26');
  });

  it('across midnight UTC in both directions (IANA tz database; offsets from memory)', () => {
    // Los Angeles is UTC−8 in January: 05:00 UTC on 1 January is 21:00 on 31 December.
    expect(dateInTimeZone(Date.parse('2026-01-01T05:00:00Z'), 'America/Los_Angeles')).toBe(
      '2025-12-31',
    );
    // Auckland is UTC+13 in (southern) summer: 12:00 UTC on 31 December is 01:00 on 1 January.
    expect(dateInTimeZone(Date.parse('2025-12-31T12:00:00Z'), 'Pacific/Auckland')).toBe(
      '2026-01-01',
    );
  });

  it('time-zone names are checked', () => {
    expect(isValidTimeZone('Europe/Brussels')).toBe(true);
    expect(isValidTimeZone('UTC')).toBe(true);
    expect(isValidTimeZone('America/Argentina/Buenos_Aires')).toBe(true);
    expect(isValidTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(isValidTimeZone('+01:00')).toBe(false);
    expect(isValidTimeZone('')).toBe(false);
    expect(() => dateInTimeZone(0, 'Mars/Olympus_Mons')).toThrowError(/IANA name/);
    expect(() => dateInTimeZone(Number.NaN, 'UTC')).toThrowError(InvalidBookingInputError);
  });
});
