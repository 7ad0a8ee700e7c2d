import type { AlertRule, StationHealth } from '@/shared/schemas';

/** How long ago, in words a glance can read: `12 s ago`, `4 min ago`, `3 h ago`, `2 d ago`. */
export function ageInWords(ageS: number | null): string {
  if (ageS === null || !Number.isFinite(ageS)) return 'never';
  const s = Math.max(0, Math.round(ageS));
  if (s < 60) return `${s} s ago`;
  if (s < 3600) return `${Math.floor(s / 60)} min ago`;
  if (s < 86_400) {
    const h = Math.floor(s / 3600);
    const min = Math.floor((s % 3600) / 60);
    return min > 0 && h < 6 ? `${h} h ${min} min ago` : `${h} h ago`;
  }
  return `${Math.floor(s / 86_400)} d ago`;
}

const signed = (value: number, digits: number) => `${value > 0 ? '+' : value < 0 ? '−' : '±'}${Math.abs(value).toFixed(digits)}`;

export const formatClockOffset = (ms: number | null) => (ms === null ? '—' : `${signed(Math.round(ms), 0)} ms`);
export const formatTemperature = (c: number | null) => (c === null ? '—' : `${c.toFixed(1)} °C`);
export const formatDrift = (hz: number | null) => (hz === null ? '—' : hz === 0 ? '0 Hz' : `±${hz.toFixed(1)} Hz`);
export const formatSupply = (v: number | null) => (v === null ? '—' : `${v.toFixed(2)} V`);

/** `14:05 UTC` from an ISO time. */
export function utcTime(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return '—';
  return `${String(d.getUTCHours()).padStart(2, '0')}:${String(d.getUTCMinutes()).padStart(2, '0')} UTC`;
}

export const ruleTitles: Record<AlertRule, string> = {
  silent: 'Silent while scheduled',
  'clock-offset': 'Clock off',
  'drift-out-of-window': 'Drift may leave the window',
  'transmitting-while-suspended': 'Transmitting while suspended',
  'unheard-while-transmitting': 'Transmitting but nobody hears it',
  'heard-off-frequency': 'Heard off frequency',
};

export type LinkState = 'online' | 'offline' | 'no-device';

export function linkStateOf(health: Pick<StationHealth, 'hasDevice' | 'online'>): LinkState {
  if (health.online) return 'online';
  return health.hasDevice ? 'offline' : 'no-device';
}

export const linkStateWords: Record<LinkState, string> = { online: 'Online', offline: 'Offline', 'no-device': 'No device' };

/** `Heard 12 s ago`, `Never heard`, or the nudge to provision a device. */
export function heardWords(health: Pick<StationHealth, 'hasDevice' | 'heartbeatAgeS'>): string {
  if (health.heartbeatAgeS === null) return health.hasDevice ? 'Never heard from' : 'No device yet';
  return `Heard ${ageInWords(health.heartbeatAgeS)}`;
}

export const openAlerts = (health: Pick<StationHealth, 'alerts'>) => health.alerts.filter((a) => a.resolvedAt === null);

/** `4 as planned, 1 unplanned` over the recent transmissions, or `none in 24 h`. */
export function recentWords(recent: StationHealth['recent']): string {
  if (recent.length === 0) return 'None in 24 h';
  const unplanned = recent.filter((t) => !t.planned).length;
  const planned = recent.length - unplanned;
  return unplanned === 0 ? `${planned} as planned` : `${planned} as planned, ${unplanned} unplanned`;
}

/** One line for the whole fleet: `3 stations · 2 online · 1 open alert`. */
export function fleetSummary(fleet: StationHealth[]): string {
  const online = fleet.filter((s) => s.online).length;
  const alerts = fleet.reduce((n, s) => n + openAlerts(s).length, 0);
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  return `${plural(fleet.length, 'station')} · ${online} online · ${plural(alerts, 'open alert')}`;
}
