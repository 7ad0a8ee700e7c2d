import { validateLocator } from '@/shared/domain/locator';

/**
 * The one place where numbers, frequencies, power and UTC times become text, so that a value reads the same on every screen.
 * Digit groups are joined by a narrow no-break space and the minus sign is the typographic one (U+2212), so a number never
 * breaks across lines; the unit follows after an ordinary space.
 */

const MINUS = '\u2212';
/** Narrow no-break space: groups digits without letting the line break inside the number. */
const GROUP = '\u202f';

const pad = (value: number) => String(value).padStart(2, '0');
const sign = (value: number, fixed: string) => (value < 0 && Number(fixed) !== 0 ? MINUS : '');
const withUnit = (text: string, unit: string) => (unit ? `${text} ${unit}` : text);

// ── numbers ─────────────────────────────────────────────────────────────────────────────────────────────

/** Groups the integer part in threes: `7 040 100.000`. */
export function groupDigits(value: number, digits: number): string {
  const fixed = Math.abs(value).toFixed(digits);
  const [whole, fraction] = fixed.split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, GROUP);
  return `${sign(value, fixed)}${grouped}${fraction ? `.${fraction}` : ''}`;
}

/** A plain value with a unit, minus sign as typeset: `−3.0 dBm`. */
export function formatValue(value: number, digits: number, unit: string): string {
  const fixed = Math.abs(value).toFixed(digits);
  return withUnit(`${sign(value, fixed)}${fixed}`, unit);
}

/** A signed change: `+2.45 Hz`, `−0.30 Hz`, `±0.00 Hz`. */
export function formatSigned(value: number, digits: number, unit: string): string {
  const fixed = Math.abs(value).toFixed(digits);
  const mark = Number(fixed) === 0 ? '±' : value < 0 ? MINUS : '+';
  return withUnit(`${mark}${fixed}`, unit);
}

// ── frequencies ────────────────────────────────────────────────────────────────────────────────────────

/** A radio frequency in Hz, grouped: `7 040 100.00 Hz`. */
export function formatHz(hz: number, digits = 2): string {
  return withUnit(groupDigits(hz, digits), 'Hz');
}

/** A radio frequency in MHz, the fraction grouped in threes: `7.040 100 MHz` (to the Hz with the default six digits). */
export function formatMHz(hz: number, digits = 6): string {
  const fixed = (hz / 1e6).toFixed(digits);
  const [whole, fraction = ''] = fixed.split('.');
  const grouped = fraction.replace(/(\d{3})(?=\d)/g, `$1${GROUP}`);
  return withUnit(fraction ? `${whole}.${grouped}` : whole, 'MHz');
}

/** An audio offset or a small step in Hz, as typed: `1500 Hz`, `1537.5 Hz`. */
export function formatOffsetHz(hz: number): string {
  return withUnit(Number.isInteger(hz) ? String(hz) : hz.toFixed(1), 'Hz');
}

// ── power ──────────────────────────────────────────────────────────────────────────────────────────────

/** mW with sensible precision: `7.9 mW`, `0.25 mW`, `1.26 W`. */
export function formatPowerMw(mw: number): string {
  if (mw >= 1000) return `${(mw / 1000).toFixed(2)} W`;
  if (mw >= 10) return `${mw.toFixed(0)} mW`;
  if (mw >= 1) return `${mw.toFixed(1)} mW`;
  return `${mw.toFixed(2)} mW`;
}

// ── UTC times ──────────────────────────────────────────────────────────────────────────────────────────

/** `2026-12-02 14:05 UTC` from an ISO timestamp. */
export function formatUtcDateTime(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  return `${utcDate(date.getTime())} ${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())} UTC`;
}

/** `14:06 UTC` */
export function formatUtcTime(ms: number): string {
  const date = new Date(ms);
  return `${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())} UTC`;
}

/** `14:05:09 UTC`. */
export function formatUtcClock(nowMs: number): string {
  const date = new Date(nowMs);
  return `${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())}:${pad(date.getUTCSeconds())} UTC`;
}

/** `2026-12-02`: the UTC calendar day. */
export function utcDate(ms: number): string {
  return new Date(ms).toISOString().slice(0, 10);
}

/** Time left as `mm:ss`, or `h:mm:ss` from an hour up; never negative. */
export function formatCountdown(ms: number): string {
  const total = Math.max(0, Math.ceil(ms / 1000));
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  return h > 0 ? `${h}:${pad(m)}:${pad(s)}` : `${pad(m)}:${pad(s)}`;
}

// ── places ─────────────────────────────────────────────────────────────────────────────────────────────

/** A locator in its usual writing: field and square upper case, subsquare lower case (IO91wm). */
export function formatLocator(locator: string): string {
  const checked = validateLocator(locator);
  return checked.ok ? checked.locator : locator;
}
