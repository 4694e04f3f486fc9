import { Logger } from '@nestjs/common';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { DataSource } from 'typeorm';
import type { Clock } from '../common/clock.js';
import type { Env } from '../config/env.js';
import {
  describeReport,
  GuestDataRetentionJob,
  type RetentionReport,
} from './guest-data-retention.job.js';

const report = (patch: Partial<RetentionReport> = {}): RetentionReport => ({
  today: '2026-07-21',
  retentionDays: 30,
  eventsUpTo: '2026-06-20',
  ordersPurged: 0,
  guestsRemoved: 0,
  substitutionsRemoved: 0,
  auditLinesRedacted: 0,
  orders: [],
  ...patch,
});

function job(enabled: boolean, intervalMs = 60_000) {
  const env = {
    GUEST_DATA_PURGE_ENABLED: enabled,
    GUEST_DATA_PURGE_INTERVAL_MS: intervalMs,
  } as Env;
  const j = new GuestDataRetentionJob({} as DataSource, {} as Clock, env);
  const run = vi.spyOn(j, 'purgeExpired').mockResolvedValue(report());
  return { j, run };
}

afterEach(() => vi.useRealTimers());

describe('the retention purge on a timer (QUALITY.md: shutdown hooks stop background work)', () => {
  it('runs at start and then every interval, and stops on shutdown', async () => {
    vi.useFakeTimers();
    const { j, run } = job(true);
    j.onApplicationBootstrap();
    await vi.advanceTimersByTimeAsync(0);
    expect(run).toHaveBeenCalledTimes(1);
    await vi.advanceTimersByTimeAsync(60_000);
    expect(run).toHaveBeenCalledTimes(2);
    await vi.advanceTimersByTimeAsync(120_000);
    expect(run).toHaveBeenCalledTimes(4);
    await j.onApplicationShutdown();
    await vi.advanceTimersByTimeAsync(600_000);
    expect(run).toHaveBeenCalledTimes(4);
  });

  it('does not run when switched off (the tests drive it by hand)', async () => {
    vi.useFakeTimers();
    const { j, run } = job(false);
    j.onApplicationBootstrap();
    await vi.advanceTimersByTimeAsync(600_000);
    expect(run).not.toHaveBeenCalled();
  });

  it('a failed run is logged and the next one still happens', async () => {
    vi.useFakeTimers();
    const logged = vi.spyOn(Logger.prototype, 'error').mockImplementation(() => undefined);
    const { j, run } = job(true);
    run.mockRejectedValueOnce(new Error('database is locked'));
    j.onApplicationBootstrap();
    await vi.advanceTimersByTimeAsync(60_000);
    expect(run).toHaveBeenCalledTimes(2);
    expect(logged).toHaveBeenCalledWith('Guest data retention run failed: database is locked');
    await j.onApplicationShutdown();
    logged.mockRestore();
  });
});

describe('the log line of a run', () => {
  it('gives counts and order ids, and says 0 when there was nothing to remove', () => {
    expect(describeReport(report())).toBe(
      'Guest data retention (30 days; events up to 2026-06-20): removed 0 guest entries from 0 orders.',
    );
    expect(
      describeReport(
        report({
          ordersPurged: 1,
          guestsRemoved: 1,
          substitutionsRemoved: 2,
          auditLinesRedacted: 1,
          orders: [
            {
              orderId: 'a1b2',
              reference: 'N-2026-0007',
              guestsRemoved: 1,
              substitutionsRemoved: 2,
              auditLinesRedacted: 1,
            },
          ],
        }),
      ),
    ).toBe(
      'Guest data retention (30 days; events up to 2026-06-20): removed 1 guest entry and 2 substitutions, redacted 1 audit line, from 1 order: a1b2 (N-2026-0007).',
    );
  });
});
