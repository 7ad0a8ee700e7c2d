import { validateLocator } from '@/shared/domain/locator';

const pad = (value: number) => String(value).padStart(2, '0');

/** `2026-12-02 14:05 UTC` from an ISO timestamp. */
export function formatUtcDateTime(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  return `${date.getUTCFullYear()}-${pad(date.getUTCMonth() + 1)}-${pad(date.getUTCDate())} ${pad(
    date.getUTCHours(),
  )}:${pad(date.getUTCMinutes())} UTC`;
}

/** `14:05:09 UTC`. */
export function formatUtcClock(nowMs: number): string {
  const date = new Date(nowMs);
  return `${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())}:${pad(date.getUTCSeconds())} UTC`;
}

/** A locator in its usual writing: field and square upper case, subsquare lower case (IO91wm). */
export function formatLocator(locator: string): string {
  const checked = validateLocator(locator);
  return checked.ok ? checked.locator : locator;
}
