/** The results screen's period: a rolling window ending now, or a custom from/to, always in UTC. */
export type PeriodChoice = '24h' | '7d' | '30d' | 'custom';

export const PERIOD_OPTIONS: { value: PeriodChoice; label: string }[] = [
  { value: '24h', label: 'Last 24 h' },
  { value: '7d', label: '7 days' },
  { value: '30d', label: '30 days' },
  { value: 'custom', label: 'Custom' },
];

const HOUR_MS = 3_600_000;
const SPAN_MS: Record<Exclude<PeriodChoice, 'custom'>, number> = { '24h': 24 * HOUR_MS, '7d': 7 * 24 * HOUR_MS, '30d': 30 * 24 * HOUR_MS };

/** Rolling windows end at the next whole minute, so the same choice asks the same question for a minute. */
export function rollingRange(choice: Exclude<PeriodChoice, 'custom'>, nowMs: number): { from: string; to: string } {
  const toMs = Math.ceil(nowMs / 60_000) * 60_000;
  return { from: new Date(toMs - SPAN_MS[choice]).toISOString(), to: new Date(toMs).toISOString() };
}

const UTC_INPUT = /^(\d{4})-(\d{2})-(\d{2})(?:[ T](\d{2}):(\d{2}))?$/;

/** Reads `2026-11-30 18:00` (or a bare date, midnight) as UTC; null when it is not such a time. */
export function parseUtcInput(text: string): number | null {
  const match = UTC_INPUT.exec(text.trim());
  if (!match) return null;
  const [, y, mo, d, h = '00', mi = '00'] = match;
  const ms = Date.UTC(Number(y), Number(mo) - 1, Number(d), Number(h), Number(mi));
  const check = new Date(ms);
  // reject 2026-02-31 and 25:00, which Date.UTC would roll over
  if (check.getUTCDate() !== Number(d) || check.getUTCHours() !== Number(h) || check.getUTCMinutes() !== Number(mi)) return null;
  return ms;
}

/** `2026-11-30 18:00` for a custom field's starting text. */
export function utcInputText(ms: number): string {
  return new Date(ms).toISOString().slice(0, 16).replace('T', ' ');
}

export type CustomRangeCheck = { ok: true; from: string; to: string } | { ok: false; message: string };

export function checkCustomRange(fromText: string, toText: string): CustomRangeCheck {
  const fromMs = parseUtcInput(fromText);
  const toMs = parseUtcInput(toText);
  if (fromMs === null || toMs === null) return { ok: false, message: 'Write both times as YYYY-MM-DD HH:MM, in UTC.' };
  if (toMs <= fromMs) return { ok: false, message: 'The end must come after the start.' };
  if (toMs - fromMs > 366 * 24 * HOUR_MS) return { ok: false, message: 'Choose at most one year at a time.' };
  return { ok: true, from: new Date(fromMs).toISOString(), to: new Date(toMs).toISOString() };
}
