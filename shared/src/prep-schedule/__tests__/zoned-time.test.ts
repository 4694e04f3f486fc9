import { describe, expect, it } from 'vitest';
import {
  InvalidDateTimeError,
  InvalidTimeZoneError,
  addCalendarDays,
  formatDurationForChef,
  formatForChef,
  isCalendarDate,
  isTimeZone,
  offsetMinutesAt,
  parseInstant,
  toZonedIso,
  wallClockAt,
  zonedToInstant,
} from '../zoned-time.js';

const BXL = 'Europe/Brussels';
const min = (iso: string) => Date.parse(iso) / 60_000;

// EU summer time (Directive 2000/84/EC, Art. 2–3): from 01:00 UTC on the last Sunday of March to
// 01:00 UTC on the last Sunday of October. In 2026 those Sundays are 29 March and 25 October.
// Belgium's standard time is UTC+1 (tz database, Europe/Brussels).
describe('Europe/Brussels across the 2026 clock changes (Directive 2000/84/EC)', () => {
  it('is UTC+1 before 29 March 01:00 UTC and UTC+2 from then', () => {
    expect(offsetMinutesAt(min('2026-03-29T00:59:00Z'), BXL)).toBe(60);
    expect(offsetMinutesAt(min('2026-03-29T01:00:00Z'), BXL)).toBe(120);
    expect(toZonedIso(min('2026-03-29T00:59:00Z'), BXL)).toBe('2026-03-29T01:59:00+01:00');
    expect(toZonedIso(min('2026-03-29T01:00:00Z'), BXL)).toBe('2026-03-29T03:00:00+02:00');
  });

  it('is back to UTC+1 from 25 October 01:00 UTC', () => {
    expect(toZonedIso(min('2026-10-25T00:59:00Z'), BXL)).toBe('2026-10-25T02:59:00+02:00');
    expect(toZonedIso(min('2026-10-25T01:00:00Z'), BXL)).toBe('2026-10-25T02:00:00+01:00');
  });

  it('07:00 on the wall is 06:00 UTC the day before the change and 05:00 UTC on the day', () => {
    expect(zonedToInstant('2026-03-28', '07:00', BXL)).toBe(min('2026-03-28T06:00:00Z'));
    expect(zonedToInstant('2026-03-29', '07:00', BXL)).toBe(min('2026-03-29T05:00:00Z'));
    expect(zonedToInstant('2026-10-24', '07:00', BXL)).toBe(min('2026-10-24T05:00:00Z'));
    expect(zonedToInstant('2026-10-25', '07:00', BXL)).toBe(min('2026-10-25T06:00:00Z'));
  });

  it('a skipped wall time moves forward by the gap; a repeated one takes the first (Temporal “compatible”)', () => {
    expect(toZonedIso(zonedToInstant('2026-03-29', '02:30', BXL), BXL)).toBe(
      '2026-03-29T03:30:00+02:00',
    );
    expect(zonedToInstant('2026-10-25', '02:30', BXL)).toBe(min('2026-10-25T00:30:00Z'));
  });

  it('a 12-hour wait from 18:00 on Saturday 28 March ends at 07:00 on the Sunday wall clock', () => {
    const start = zonedToInstant('2026-03-28', '18:00', BXL);
    expect(toZonedIso(start + 12 * 60, BXL)).toBe('2026-03-29T07:00:00+02:00');
    const autumn = zonedToInstant('2026-10-24', '18:00', BXL);
    expect(toZonedIso(autumn + 12 * 60, BXL)).toBe('2026-10-25T05:00:00+01:00');
  });
});

describe('other zones', () => {
  // US daylight time (15 U.S.C. §260a): second Sunday of March to first Sunday of November,
  // changing at 02:00 local. 2026: 8 March and 1 November. Eastern standard time is UTC−5.
  it('America/New_York is UTC−5 on 7 March 2026 and UTC−4 on 9 March', () => {
    expect(
      toZonedIso(zonedToInstant('2026-03-07', '12:00', 'America/New_York'), 'America/New_York'),
    ).toBe('2026-03-07T12:00:00-05:00');
    expect(
      toZonedIso(zonedToInstant('2026-03-09', '12:00', 'America/New_York'), 'America/New_York'),
    ).toBe('2026-03-09T12:00:00-04:00');
  });

  it('Asia/Kolkata keeps UTC+5:30 all year (no daylight time; from memory)', () => {
    expect(toZonedIso(zonedToInstant('2026-03-28', '07:00', 'Asia/Kolkata'), 'Asia/Kolkata')).toBe(
      '2026-03-28T07:00:00+05:30',
    );
    expect(zonedToInstant('2026-07-01', '05:30', 'Asia/Kolkata')).toBe(min('2026-07-01T00:00:00Z'));
  });

  it('round-trips with the platform’s own parser', () => {
    for (const [date, time] of [
      ['2026-01-15', '09:15'],
      ['2026-03-29', '04:00'],
      ['2026-10-25', '03:10'],
      ['2026-12-31', '23:59'],
    ] as const) {
      const t = zonedToInstant(date, time, BXL);
      const iso = toZonedIso(t, BXL);
      expect(iso.slice(0, 16)).toBe(`${date}T${time}`);
      expect(Date.parse(iso) / 60_000).toBe(t);
    }
  });
});

describe('dates, times and messages', () => {
  it('knows real calendar dates (2028 is a leap year, 2026 is not)', () => {
    expect(isCalendarDate('2028-02-29')).toBe(true);
    expect(isCalendarDate('2026-02-29')).toBe(false);
    expect(isCalendarDate('2026-3-1')).toBe(false);
    expect(addCalendarDays('2026-02-28', 1)).toBe('2026-03-01');
    expect(addCalendarDays('2026-03-01', -1)).toBe('2026-02-28');
  });

  it('refuses an unknown zone with a readable message', () => {
    expect(isTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(() => zonedToInstant('2026-03-28', '07:00', 'Mars/Olympus_Mons')).toThrow(
      InvalidTimeZoneError,
    );
    expect(() => zonedToInstant('2026-03-28', '07:00', 'Mars/Olympus_Mons')).toThrow(
      /Europe\/Brussels/,
    );
  });

  it('needs the offset on an instant', () => {
    expect(parseInstant('2026-03-23T15:00:00+01:00')).toBe(min('2026-03-23T14:00:00Z'));
    expect(parseInstant('2026-03-23T14:00Z')).toBe(min('2026-03-23T14:00:00Z'));
    expect(() => parseInstant('2026-03-23T15:00')).toThrow(InvalidDateTimeError);
    expect(() => zonedToInstant('2026-03-23', '24:00', BXL)).toThrow(/HH:MM/);
  });

  it('writes times and durations for a chef', () => {
    expect(formatForChef(zonedToInstant('2026-03-24', '19:30', BXL), BXL)).toBe('Tue 24 Mar 19:30');
    expect(wallClockAt(zonedToInstant('2026-03-24', '19:30', BXL), BXL).weekday).toBe(2);
    expect(formatDurationForChef(390)).toBe('6 h 30 min');
    expect(formatDurationForChef(45)).toBe('45 min');
    expect(formatDurationForChef(120)).toBe('2 h');
    expect(formatDurationForChef(3 * 1440 + 60)).toBe('3 d 1 h');
  });
});
