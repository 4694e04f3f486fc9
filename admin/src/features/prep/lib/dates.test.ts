import { describe, expect, it } from 'vitest';
import {
  dayFromParams,
  defaultPlanRange,
  rangeFromParams,
  rangeProblem,
  studioToday,
} from './dates';

describe('prep dates', () => {
  it('reads “today” on the studio’s wall clock, not the device’s', () => {
    // 2026-03-28T23:30Z is already Sunday 29 March in Paris (CET = UTC+1 before the 29 March
    // change; IANA tz database) but still Saturday in New York (EDT = UTC−4).
    const instant = new Date('2026-03-28T23:30:00Z');
    expect(studioToday('Europe/Paris', instant)).toBe('2026-03-29');
    expect(studioToday('America/New_York', instant)).toBe('2026-03-28');
  });

  it('defaults the plan to today and the six days after, across a month end', () => {
    expect(defaultPlanRange('2026-02-26')).toEqual({ from: '2026-02-26', to: '2026-03-04' });
    expect(defaultPlanRange('2028-02-26')).toEqual({ from: '2028-02-26', to: '2028-03-03' }); // leap year
    expect(defaultPlanRange('2026-03-01', 14)).toEqual({ from: '2026-03-01', to: '2026-03-14' });
  });

  it('says in words why a range cannot be planned', () => {
    expect(rangeProblem('2026-02-30', '2026-03-05')).toBe('Choose a real first day.');
    expect(rangeProblem('2026-03-01', 'soon')).toBe('Choose a real last day.');
    expect(rangeProblem('2026-03-10', '2026-03-09')).toBe(
      'The last day must be on or after the first day.',
    );
    // The API plans at most 92 days: 1 March + 91 days = 31 May is the last allowed.
    expect(rangeProblem('2026-03-01', '2026-05-31')).toBeNull();
    expect(rangeProblem('2026-03-01', '2026-06-01')).toBe('Plan at most 92 days at a time.');
    expect(rangeProblem('2026-03-01', '2026-03-01')).toBeNull();
  });

  it('reads ranges and days from the URL', () => {
    expect(rangeFromParams(new URLSearchParams(''))).toEqual({ kind: 'missing' });
    expect(rangeFromParams(new URLSearchParams('from=2026-03-01&to=2026-03-07'))).toEqual({
      kind: 'ok',
      range: { from: '2026-03-01', to: '2026-03-07' },
    });
    expect(rangeFromParams(new URLSearchParams('from=2026-03-01'))).toMatchObject({
      kind: 'invalid',
      problem: 'Choose a real last day.',
    });
    expect(dayFromParams(new URLSearchParams('date=2026-03-01'))).toEqual({
      kind: 'ok',
      date: '2026-03-01',
    });
    expect(dayFromParams(new URLSearchParams('date=tomorrow'))).toEqual({
      kind: 'invalid',
      value: 'tomorrow',
    });
    expect(dayFromParams(new URLSearchParams())).toEqual({ kind: 'missing' });
  });
});
