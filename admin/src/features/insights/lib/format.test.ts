import { describe, expect, it } from 'vitest';
import {
  formatMinor,
  formatMinorCompact,
  formatMonthLong,
  formatPercent,
  formatWeekLong,
  moneyTicks,
  relativeDay,
} from './format';

// Money strings follow CLDR's en-GB patterns through Intl (symbol first, comma grouping, the
// currency's ISO 4217 minor unit: 2 decimals for EUR, none for JPY). Calendar facts from the
// ISO 8601 (proleptic Gregorian) calendar.

describe('money', () => {
  it('formats integer minor units exactly in the currency', () => {
    expect(formatMinor(156_000, 'EUR')).toBe('€1,560.00');
    expect(formatMinor(-10_000, 'EUR')).toBe('-€100.00');
    expect(formatMinor(156_000, 'JPY')).toBe('JP¥156,000');
  });

  it('shortens axis amounts', () => {
    expect(formatMinorCompact(300_000, 'EUR')).toBe('€3k');
    expect(formatMinorCompact(0, 'EUR')).toBe('€0');
    expect(formatMinorCompact(250_000, 'EUR')).toBe('€2.5k');
  });

  it('puts axis ticks on round amounts of the major unit', () => {
    // Up to €3,208.40: steps of €1,000.
    expect(moneyTicks(0, 320_840, 2)).toEqual([0, 100_000, 200_000, 300_000, 400_000]);
    // Yen have no minor unit: steps of ¥50,000 up to ¥123,456.
    expect(moneyTicks(0, 123_456, 0)).toEqual([0, 50_000, 100_000, 150_000]);
    // A month with more refunds than payments goes below zero.
    expect(moneyTicks(-5_000, 20_000, 2)).toEqual([-10_000, 0, 10_000, 20_000]);
    // Nothing yet: a plain scale from zero.
    expect(moneyTicks(0, 0, 2)).toEqual([0, 10_000]);
  });
});

describe('days, months and weeks', () => {
  it('counts calendar days from the studio’s today', () => {
    expect(relativeDay('2026-12-02', '2026-12-02')).toBe('today');
    expect(relativeDay('2026-12-03', '2026-12-02')).toBe('tomorrow');
    expect(relativeDay('2026-12-01', '2026-12-02')).toBe('yesterday');
    // Across a year end: 2026-12-30 to 2027-01-02 is 3 days.
    expect(relativeDay('2027-01-02', '2026-12-30')).toBe('in 3 days');
    expect(relativeDay('2026-11-28', '2026-12-02')).toBe('4 days ago');
  });

  it('names months and weeks without shifting them by the device’s zone', () => {
    expect(formatMonthLong('2026-01')).toBe('January 2026');
    expect(formatWeekLong('2026-11-30')).toBe('Week of 30 November 2026');
  });

  it('writes a percentage with at most one decimal', () => {
    expect(formatPercent(31.4)).toBe('31.4 %');
    expect(formatPercent(24)).toBe('24 %');
  });
});
