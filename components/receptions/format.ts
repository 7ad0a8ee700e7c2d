import type { BandId } from '@/shared/domain/bands';

const grouped = new Intl.NumberFormat('en-GB');

export const formatCount = (value: number) => grouped.format(value);

/** `4 812 km`, `—` when unknown. */
export function formatKm(km: number | null | undefined): string {
  return km == null ? '—' : `${grouped.format(Math.round(km))} km`;
}

/** `−17 dB`, `+3 dB` with a real minus sign. */
export function formatDb(db: number | null | undefined): string {
  if (db == null) return '—';
  const rounded = Math.round(db);
  return `${rounded > 0 ? '+' : rounded < 0 ? '−' : ''}${Math.abs(rounded)} dB`;
}

/** `+2 Hz`, `−1 Hz`, `0 Hz`. */
export function formatHz(hz: number | null | undefined): string {
  if (hz == null) return '—';
  const rounded = Math.round(hz);
  return `${rounded > 0 ? '+' : rounded < 0 ? '−' : ''}${Math.abs(rounded)} Hz`;
}

export function formatShare(share: number | null | undefined): string {
  return share == null ? '—' : `${Math.round(share * 100)} %`;
}

export function formatBearing(deg: number | null | undefined): string {
  return deg == null ? '—' : `${Math.round(deg)}°`;
}

/** `20 m` from `20m`. */
export function bandName(bandId: BandId): string {
  return bandId.replace(/m$/, ' m');
}
