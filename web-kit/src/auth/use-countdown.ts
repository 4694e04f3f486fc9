import { useCallback, useEffect, useState } from 'react';

interface Countdown {
  until: number;
  now: number;
}

/** A wait the server asked for (a 429's Retry-After), counted down once a second. */
export function useCountdown() {
  const [state, setState] = useState<Countdown | null>(null);

  useEffect(() => {
    if (state === null || state.now >= state.until) return;
    const id = window.setTimeout(
      () => setState((s) => (s === null ? s : { ...s, now: Date.now() })),
      1000,
    );
    return () => window.clearTimeout(id);
  }, [state]);

  const start = useCallback((seconds: number) => {
    const now = Date.now();
    setState({ until: now + seconds * 1000, now });
  }, []);

  const secondsLeft = state === null ? 0 : Math.max(0, Math.ceil((state.until - state.now) / 1000));
  return { secondsLeft, start };
}

/** "45 seconds", "1 minute 30 seconds", "15 minutes". */
export function formatWait(seconds: number): string {
  const minutes = Math.floor(seconds / 60);
  const rest = seconds % 60;
  const parts: string[] = [];
  if (minutes > 0) parts.push(`${minutes} ${minutes === 1 ? 'minute' : 'minutes'}`);
  if (rest > 0 || minutes === 0) parts.push(`${rest} ${rest === 1 ? 'second' : 'seconds'}`);
  return parts.join(' ');
}
