import type { StationHealth } from '@/shared/schemas';

export function healthFixture(overrides: Partial<StationHealth> = {}): StationHealth {
  return {
    stationId: 11,
    stationName: 'Attic beacon',
    callsign: 'Q1IMW',
    hasDevice: true,
    online: true,
    lastHeartbeatAt: '2026-12-02T10:00:00.000Z',
    heartbeatAgeS: 12,
    clockOffsetMs: 42.4,
    temperatureC: 23.46,
    supplyV: 5.02,
    firmwareVersion: 'sim-1.0',
    driftHz: 1.7,
    series: [
      { at: '2026-12-02T09:00:00.000Z', clockOffsetMs: 30, temperatureC: 22.8 },
      { at: '2026-12-02T09:30:00.000Z', clockOffsetMs: 38, temperatureC: 23.1 },
      { at: '2026-12-02T10:00:00.000Z', clockOffsetMs: 42.4, temperatureC: 23.46 },
    ],
    recent: [
      { startUtc: '2026-12-02T09:52:01.000Z', bandId: '20m', planned: true },
      { startUtc: '2026-12-02T09:42:01.000Z', bandId: '20m', planned: false },
    ],
    alerts: [],
    settings: { silentMinutes: 30, clockOffsetMs: 1000 },
    ...overrides,
  };
}

export const silentAlert = {
  id: 5,
  stationId: 12,
  rule: 'silent' as const,
  message: 'No word from the device for over 30 minutes while it is scheduled to transmit.',
  openedAt: '2026-12-02T09:20:00.000Z',
  lastSeenAt: '2026-12-02T09:59:00.000Z',
  resolvedAt: null,
};
