import { describe, expect, it } from 'vitest';
import { formatStudioDate, greeting, studioHour } from './studio-time';

// Offsets from the IANA time zone database: Europe/Paris is UTC+1 in winter (CET) and UTC+2
// in summer (CEST, from the last Sunday of March); America/New_York is UTC−5 in winter (EST).
describe('studio time', () => {
  const lateUtc = new Date('2025-12-01T23:30:00Z');

  it('puts the same instant on different days in different studios', () => {
    // CLDR versions differ on a comma after the weekday in en-GB; the day is what matters.
    expect(formatStudioDate(lateUtc, 'Europe/Paris')).toMatch(/^Tuesday,? 2 December 2025$/);
    expect(formatStudioDate(lateUtc, 'America/New_York')).toMatch(/^Monday,? 1 December 2025$/);
  });

  it('reads the hour on the studio clock, daylight saving included', () => {
    expect(studioHour(lateUtc, 'Europe/Paris')).toBe(0);
    expect(studioHour(lateUtc, 'America/New_York')).toBe(18);
    // 29 March 2026 is the last Sunday of March: Paris moves to UTC+2 at 01:00 UTC.
    expect(studioHour(new Date('2026-03-29T00:30:00Z'), 'Europe/Paris')).toBe(1);
    expect(studioHour(new Date('2026-03-29T01:30:00Z'), 'Europe/Paris')).toBe(3);
  });

  it('greets by the studio clock', () => {
    expect(greeting(new Date('2025-12-02T07:00:00Z'), 'Europe/Paris')).toBe('Good morning');
    expect(greeting(new Date('2025-12-02T12:00:00Z'), 'Europe/Paris')).toBe('Good afternoon');
    expect(greeting(new Date('2025-12-02T17:30:00Z'), 'Europe/Paris')).toBe('Good evening');
    expect(greeting(lateUtc, 'Europe/Paris')).toBe('Good evening');
  });
});
