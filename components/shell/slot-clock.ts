import { nextSlotStartMs } from '@/shared/domain/timing';

import { formatUtcClock } from '../ui/format';

export type SlotClockReading = {
  /** `14:05:09 UTC` */
  utc: string;
  /** Whole seconds until the next even-minute slot start, 1…120. */
  secondsToNextSlot: number;
  /** `0:47` */
  countdown: string;
  /** `14:06 UTC`, the next slot start. */
  nextSlotUtc: string;
};

/** What the live clock shows at an instant; seconds are whole, so the clock and countdown agree. */
export function readSlotClock(nowMs: number): SlotClockReading {
  const second = Math.floor(nowMs / 1000) * 1000;
  const next = nextSlotStartMs(second);
  const secondsToNextSlot = Math.round((next - second) / 1000);
  const minutes = Math.floor(secondsToNextSlot / 60);
  const seconds = secondsToNextSlot % 60;
  return {
    utc: formatUtcClock(second),
    secondsToNextSlot,
    countdown: `${minutes}:${String(seconds).padStart(2, '0')}`,
    nextSlotUtc: formatUtcClock(next).replace(/:00 UTC$/, ' UTC'),
  };
}
