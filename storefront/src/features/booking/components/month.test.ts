import { describe, expect, it } from 'vitest';
import {
  addMonths,
  daysInMonth,
  isoWeekday,
  monthGrid,
  monthLabel,
  moveDate,
  sameDayInMonth,
} from './month';

describe('calendar month arithmetic', () => {
  it('numbers weekdays as ISO 8601 does (Monday 1 … Sunday 7)', () => {
    // The Unix epoch, 1970-01-01, was a Thursday (POSIX.1 "Seconds Since the Epoch").
    expect(isoWeekday('1970-01-01')).toBe(4);
    // Checked against ECMAScript's own calendar (Date.prototype.getUTCDay, Sunday = 0).
    for (const date of ['2026-07-01', '2026-02-28', '2000-02-29', '1969-12-31', '2028-12-31']) {
      const js = new Date(`${date}T00:00:00Z`).getUTCDay();
      expect(isoWeekday(date)).toBe(js === 0 ? 7 : js);
    }
  });

  it('lays a month out in Monday-first weeks', () => {
    // July 2026 starts on a Wednesday and has 31 days: two blanks, then 1–31, then blanks.
    const weeks = monthGrid('2026-07');
    expect(weeks).toHaveLength(5);
    expect(weeks[0]).toEqual([
      null,
      null,
      '2026-07-01',
      '2026-07-02',
      '2026-07-03',
      '2026-07-04',
      '2026-07-05',
    ]);
    expect(weeks[4]).toEqual([
      '2026-07-27',
      '2026-07-28',
      '2026-07-29',
      '2026-07-30',
      '2026-07-31',
      null,
      null,
    ]);
    // February 2027 starts on a Monday and fills exactly four weeks.
    expect(monthGrid('2027-02')).toHaveLength(4);
  });

  it('knows the Gregorian month lengths, leap years included', () => {
    // Gregorian rule: divisible by 4, except centuries not divisible by 400.
    expect(daysInMonth('2028-02')).toBe(29);
    expect(daysInMonth('2026-02')).toBe(28);
    expect(daysInMonth('2000-02')).toBe(29);
    expect(daysInMonth('2100-02')).toBe(28);
    expect(daysInMonth('2026-04')).toBe(30);
  });

  it('adds months across years', () => {
    expect(addMonths('2026-11', 3)).toBe('2027-02');
    expect(addMonths('2026-01', -1)).toBe('2025-12');
    expect(monthLabel('2026-07')).toBe('July 2026');
  });

  it('moves focus as the WAI-ARIA date picker grid pattern says', () => {
    // Authoring Practices Guide, "Date Picker Dialog": arrows by a day and a week, Home/End to
    // the first/last day of the week, Page Up/Down by a month, Shift+Page by a year.
    expect(moveDate('2026-07-31', 'ArrowRight')).toBe('2026-08-01');
    expect(moveDate('2026-07-01', 'ArrowLeft')).toBe('2026-06-30');
    expect(moveDate('2026-07-01', 'ArrowUp')).toBe('2026-06-24');
    expect(moveDate('2026-07-29', 'ArrowDown')).toBe('2026-08-05');
    expect(moveDate('2026-07-01', 'Home')).toBe('2026-06-29');
    expect(moveDate('2026-07-01', 'End')).toBe('2026-07-05');
    expect(moveDate('2026-07-18', 'PageDown')).toBe('2026-08-18');
    expect(moveDate('2026-07-18', 'PageUp', true)).toBe('2025-07-18');
    // The same day of the next month, or its last day when that month is shorter (APG, as above).
    expect(moveDate('2026-01-31', 'PageDown')).toBe('2026-02-28');
    expect(sameDayInMonth('2028-03-31', '2028-02')).toBe('2028-02-29');
    expect(moveDate('2026-07-18', 'Enter')).toBeNull();
  });
});
