/** Number formats for the workshop screens: frequencies, levels and offsets with their units. */

const MINUS = '\u2212';

/** Groups the integer part in threes with thin spaces: 7 040 100.000. */
export function groupDigits(value: number, digits: number): string {
  const fixed = Math.abs(value).toFixed(digits);
  const [whole, fraction] = fixed.split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009');
  return `${value < 0 && Number(fixed) !== 0 ? MINUS : ''}${grouped}${fraction ? `.${fraction}` : ''}`;
}

/** `7 040 100.00 Hz` */
export function formatHz(hz: number, digits = 2): string {
  return `${groupDigits(hz, digits)} Hz`;
}

/** `7.040100 MHz` */
export function formatMHz(hz: number, digits = 6): string {
  return `${(hz / 1e6).toFixed(digits)} MHz`;
}

/** A signed change: `+2.45 Hz`, `−0.30 Hz`. */
export function formatSigned(value: number, digits: number, unit: string): string {
  const fixed = Math.abs(value).toFixed(digits);
  const sign = Number(fixed) === 0 ? '±' : value < 0 ? MINUS : '+';
  return `${sign}${fixed}${unit ? ` ${unit}` : ''}`;
}

/** A plain value with a unit, minus sign as typeset: `−3.0 dBm`. */
export function formatValue(value: number, digits: number, unit: string): string {
  const fixed = Math.abs(value).toFixed(digits);
  return `${value < 0 && Number(fixed) !== 0 ? MINUS : ''}${fixed}${unit ? ` ${unit}` : ''}`;
}

/** mW with sensible precision: `7.9 mW`, `0.25 mW`, `1.26 W`. */
export function formatPowerMw(mw: number): string {
  if (mw >= 1000) return `${(mw / 1000).toFixed(2)} W`;
  if (mw >= 10) return `${mw.toFixed(0)} mW`;
  if (mw >= 1) return `${mw.toFixed(1)} mW`;
  return `${mw.toFixed(2)} mW`;
}

/** Text typed into a number field: decimal comma and typographic minus accepted; '' = nothing given. */
export function parseNumberText(text: string): number | undefined {
  const cleaned = text.trim().replace(/\s+/g, '').replace(',', '.').replace(MINUS, '-');
  if (cleaned === '') return undefined;
  return Number(cleaned);
}

/** For zodResolver's parse options: a number field left empty or with letters in it says so in words. */
export function numberFieldErrors(issue: { code: string; expected?: unknown; input?: unknown }) {
  if (issue.code === 'invalid_type' && issue.expected === 'number') {
    return issue.input === undefined ? 'Fill this in (a number)' : 'Enter a number, such as 12 or 7.5';
  }
  return undefined;
}
