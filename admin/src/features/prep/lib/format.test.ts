import { describe, expect, it } from 'vitest';
import { celsius, grams, instantInZone, longDate, shortDate, when } from './format';

describe('prep formatting', () => {
  it('writes kitchen grams as the planner rounded them', () => {
    expect(grams(11880)).toBe('11,880 g');
    expect(grams(58.1)).toBe('58.1 g');
    expect(grams(100)).toBe('100 g');
  });

  it('writes dates and the planner’s zoned times without shifting them', () => {
    expect(shortDate('2026-12-04')).toBe('Fri 4 Dec');
    expect(longDate('2026-12-04')).toBe('Friday 4 December 2026');
    // The planner's times are already on the studio's clock: 17:05 stays 17:05.
    expect(when('2026-12-04T17:05:00+01:00', '2026-12-04')).toBe('17:05');
    expect(when('2026-12-05T04:20:00+01:00', '2026-12-04')).toBe('Sat 5 Dec 04:20');
  });

  it('shows a tick’s instant on the studio’s clock', () => {
    // 08:15 UTC is 09:15 in Paris in winter (CET, UTC+1) and 10:15 in summer (CEST, UTC+2).
    expect(instantInZone('2026-03-23T08:15:00.000Z', 'Europe/Paris', '2026-03-23')).toBe('09:15');
    expect(instantInZone('2026-07-01T08:15:00.000Z', 'Europe/Paris', '2026-07-01')).toBe('10:15');
    expect(instantInZone('2026-03-22T23:30:00.000Z', 'Europe/Paris', '2026-03-22')).toBe(
      'Mon 23 Mar 00:30',
    );
  });

  it('writes freezer temperatures with a real minus sign', () => {
    expect(celsius(-18)).toBe('−18 °C');
    expect(celsius(118)).toBe('118 °C');
  });
});
