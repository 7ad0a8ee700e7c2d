import { bandFor, BAND_IDS, type BandId } from '@/shared/domain';
import type { ActiveHoursUtc, Cadence } from '@/shared/domain/schedule';

/** Words for schedules: band names, cadences, hours, shares; numbers and times come from ui/format. */
const pad = (value: number) => String(value).padStart(2, '0');

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
