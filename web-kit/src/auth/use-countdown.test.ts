import { act, renderHook } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { formatWait, useCountdown } from './use-countdown.js';

describe('formatWait', () => {
  // Unicode CLDR plural rules for English: category "one" for exactly 1, "other" for every other
  // whole number, 0 included ("0 seconds"). 1 minute = 60 seconds (SI accepted unit).
  it.each([
    [0, '0 seconds'],
    [1, '1 second'],
    [45, '45 seconds'],
    [60, '1 minute'],
    [61, '1 minute 1 second'],
    [90, '1 minute 30 seconds'],
    [120, '2 minutes'],
    [900, '15 minutes'],
    [3599, '59 minutes 59 seconds'],
  ])('%i s reads "%s"', (seconds, words) => {
    expect(formatWait(seconds)).toBe(words);
  });
});

describe('useCountdown', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('counts a Retry-After wait down once a second, to zero', () => {
    const { result } = renderHook(() => useCountdown());
    expect(result.current.secondsLeft).toBe(0);
    act(() => result.current.start(3));
    expect(result.current.secondsLeft).toBe(3);
    act(() => void vi.advanceTimersByTime(1000));
    expect(result.current.secondsLeft).toBe(2);
    act(() => void vi.advanceTimersByTime(2000));
    expect(result.current.secondsLeft).toBe(0);
    // Nothing is left running once the wait is over.
    expect(vi.getTimerCount()).toBe(0);
  });

  it('starts over when the server asks for another wait', () => {
    const { result } = renderHook(() => useCountdown());
    act(() => result.current.start(10));
    act(() => void vi.advanceTimersByTime(4000));
    expect(result.current.secondsLeft).toBe(6);
    act(() => result.current.start(60));
    expect(result.current.secondsLeft).toBe(60);
  });

  it('stops its timer when the form goes away', () => {
    const { result, unmount } = renderHook(() => useCountdown());
    act(() => result.current.start(30));
    unmount();
    expect(vi.getTimerCount()).toBe(0);
  });
});
