import { describe, expect, it } from 'vitest';
import { describeExpiry } from './invitations-list';

// Europe/Paris is UTC+1 in December (CET; IANA tz database), so 10:00 UTC reads 11:00 there.
describe('describeExpiry', () => {
  const now = new Date('2026-12-02T09:00:00Z');

  it('counts whole days once two or more are left, with the date in the studio’s zone', () => {
    // 2 Dec 09:00 → 7 Dec 10:00 UTC is 121 hours: 5 whole days.
    expect(describeExpiry('2026-12-07T10:00:00Z', now, 'Europe/Paris')).toBe(
      'expires in 5 days (7 Dec 2026, 11:00)',
    );
  });

  it('counts hours within the last two days, and says when less than an hour is left', () => {
    expect(describeExpiry('2026-12-03T15:00:00Z', now, 'UTC')).toBe(
      'expires in 30 hours (3 Dec 2026, 15:00)',
    );
    expect(describeExpiry('2026-12-02T10:00:00Z', now, 'UTC')).toBe(
      'expires in 1 hour (2 Dec 2026, 10:00)',
    );
    expect(describeExpiry('2026-12-02T09:30:00Z', now, 'UTC')).toBe(
      'expires in less than an hour (2 Dec 2026, 09:30)',
    );
  });

  it('says when the link has expired', () => {
    expect(describeExpiry('2026-12-01T09:00:00Z', now, 'UTC')).toBe('expired (1 Dec 2026, 09:00)');
  });
});
