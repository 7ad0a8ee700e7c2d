import { bandFor, BAND_IDS, type BandId } from '@/shared/domain';
import type { ActiveHoursUtc, Cadence } from '@/shared/domain/schedule';

const pad = (value: number) => String(value).padStart(2, '0');

/** `14:06 UTC` */
export function formatUtcTime(ms: number): string {
  const d = new Date(ms);
  return `${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())} UTC`;
}

/** `2026-12-02` */
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

/** `7.040 100 MHz` style: a frequency in MHz with grouped digits, for JetBrains Mono. */
export function formatMHz(hz: number): string {
  const mhz = (Math.round(hz) / 1e6).toFixed(6);
  const [whole, frac] = mhz.split('.');
  return `${whole}.${frac.slice(0, 3)} ${frac.slice(3)} MHz`;
}

export function bandName(bandId: BandId): string {
  const found = bandFor(bandId);
  return found.ok ? found.band.name : bandId;
}

/** Bands lowest frequency first. */
export function byFrequency(bands: Iterable<BandId>): BandId[] {
  const set = new Set(bands);
  return BAND_IDS.filter((id) => set.has(id));
}

export function hoursLabel(hours: ActiveHoursUtc | null): string {
  if (!hours) return 'all day';
  return `${pad(hours.fromHour)}:00–${pad(hours.toHour)}:00 UTC`;
}

export function cadenceLabel(cadence: Cadence): string {
  if (cadence.kind === 'every-slot') return 'every slot';
  if (cadence.kind === 'every-nth') return `every ${ordinal(cadence.nth)} slot`;
  return `${cadence.dutyPercent} % of the slots`;
}

function ordinal(n: number): string {
  const tens = n % 100;
  if (tens >= 11 && tens <= 13) return `${n}th`;
  return `${n}${{ 1: 'st', 2: 'nd', 3: 'rd' }[n % 10] ?? 'th'}`;
}

/** `12.5 %` from a 0–1 share. */
export function formatPercent(share: number): string {
  const p = share * 100;
  return `${p >= 10 ? p.toFixed(0) : p.toFixed(1)} %`;
}

/** `4.4 min` */
export function formatMinutes(minutes: number): string {
  return `${minutes >= 100 ? minutes.toFixed(0) : minutes.toFixed(1)} min`;
}
