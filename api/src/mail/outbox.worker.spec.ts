import { describe, expect, it } from 'vitest';
import { outboxBackoffMs, OUTBOX_MAX_ATTEMPTS } from './outbox.worker.js';
import { headerSafe } from './mail-text.js';

describe('outbox backoff', () => {
  it('waits 30 s, then doubles, never more than an hour', () => {
    expect([1, 2, 3, 4, 5, 6, 7, 8, 12].map(outboxBackoffMs)).toEqual([
      30_000, 60_000, 120_000, 240_000, 480_000, 960_000, 1_920_000, 3_600_000, 3_600_000,
    ]);
  });

  it('keeps trying for more than half a day before giving up', () => {
    let total = 0;
    for (let attempt = 1; attempt < OUTBOX_MAX_ATTEMPTS; attempt += 1)
      total += outboxBackoffMs(attempt);
    expect(total).toBeGreaterThan(12 * 3_600_000);
  });
});

describe('headerSafe', () => {
  it('puts a header value on one line (RFC 5322 §2.2: CR and LF end a header field)', () => {
    expect(headerSafe('Booking\r\nBcc: someone@example.test')).toBe(
      'Booking Bcc: someone@example.test',
    );
    expect(headerSafe('A\u2028B\tC')).toBe('A B C');
    expect(headerSafe('x'.repeat(300), 250)).toHaveLength(250);
  });
});
