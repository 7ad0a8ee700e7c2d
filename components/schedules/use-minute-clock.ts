import { useEffect, useState } from 'react';

/** The current time, refreshed at each whole UTC minute (enough for the timeline and the day ranges). */
export function useMinuteClock(now: () => number = Date.now): number {
  const [nowMs, setNowMs] = useState(now);
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout>;
    const tick = () => {
      const current = now();
      setNowMs(current);
      timer = setTimeout(tick, 60_000 - (current % 60_000) + 50);
    };
    timer = setTimeout(tick, 60_000 - (now() % 60_000) + 50);
    return () => clearTimeout(timer);
  }, [now]);
  return nowMs;
}
