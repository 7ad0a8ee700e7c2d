import { useEffect, useState } from 'react';

/**
 * The current time in ms, refreshed just after each whole period (a second for a live clock, a
 * minute for timelines), so a display never lags the wall clock. Tests pass their own `now`.
 */
export function useTickingClock(periodMs: number, now: () => number = Date.now): number {
  const [nowMs, setNowMs] = useState(now);
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout>;
    const tick = () => {
      const current = now();
      setNowMs(current);
      timer = setTimeout(tick, periodMs - (current % periodMs) + 5);
    };
    tick();
    return () => clearTimeout(timer);
  }, [now, periodMs]);
  return nowMs;
}
