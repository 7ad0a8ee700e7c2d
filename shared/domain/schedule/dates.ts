/** UTC days as whole numbers (days since 1970-01-01) and YYYY-MM-DD texts. */
export const DAY_MS = 86_400_000;
export const SLOTS_PER_DAY = 720;
export const SLOTS_PER_HOUR = 30;

const DATE_PATTERN = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Day number of a YYYY-MM-DD text, or null when it is not a real calendar date. */
export function dayNumber(date: string): number | null {
  const m = DATE_PATTERN.exec(date);
  if (!m) return null;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const ms = Date.UTC(y, mo - 1, d);
  const back = new Date(ms);
  if (back.getUTCFullYear() !== y || back.getUTCMonth() !== mo - 1 || back.getUTCDate() !== d) return null;
  return ms / DAY_MS;
}

export function dateOfDay(day: number): string {
  return new Date(day * DAY_MS).toISOString().slice(0, 10);
}

export const dayOfMs = (ms: number): number => Math.floor(ms / DAY_MS);
