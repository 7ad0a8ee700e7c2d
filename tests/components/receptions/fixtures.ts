import type { Reach, ReceptionPage, ReceptionReport } from '@/shared/api/receptions';

/** Fictional receivers (Q-prefixed callsigns) in real locator squares. */
export const reachFixture = (overrides: Partial<Reach> = {}): Reach => ({
  stationId: 12,
  from: '2026-11-25T15:00:00.000Z',
  to: '2026-12-02T15:00:00.000Z',
  bandId: null,
  station: { callsign: 'Q1IMW', locator: 'IO91WM', lat: 51.52, lon: -0.79 },
  reports: 1284,
  receivers: 37,
  furthestKm: 8123.4,
  medianKm: 1204.6,
  heardShare: 0.42,
  plannedTransmissions: 500,
  heardTransmissions: 210,
  bestSnrDb: -3,
  bestSnrPerWattDb: 4,
  kmPerWatt: 40617,
  mapReceivers: [
    {
      callsign: 'Q2ROB',
      locator: 'JO62QM',
      lat: 52.52,
      lon: 13.37,
      distanceKm: 976,
      bearingDeg: 79,
      reports: 120,
      bestSnrDb: -8,
      bands: ['40m', '20m'],
      lastHeardUtc: '2026-12-02T14:04:00Z',
    },
    {
      callsign: 'Q5KIW',
      locator: 'FN31PR',
      lat: 41.73,
      lon: -72.71,
      distanceKm: 5460,
      bearingDeg: 288,
      reports: 14,
      bestSnrDb: -26,
      bands: ['20m'],
      lastHeardUtc: '2026-12-01T22:10:00Z',
    },
  ],
  hourBand: [
    { hour: 14, bandId: '20m', reports: 300 },
    { hour: 15, bandId: '20m', reports: 200 },
    { hour: 3, bandId: '40m', reports: 80 },
  ],
  snrByDistance: [
    { distanceKm: 976, snrDb: -8, bandId: '40m' },
    { distanceKm: 5460, snrDb: -26, bandId: '20m' },
  ],
  ...overrides,
});

export const reportFixture = (overrides: Partial<ReceptionReport> = {}): ReceptionReport => ({
  id: 1,
  slotUtc: '2026-12-02T14:04:00Z',
  bandId: '20m',
  txCallsign: 'Q1IMW',
  txLocator: 'IO91',
  txPowerDbm: 23,
  rxCallsign: 'Q2ROB',
  rxLocator: 'JO62QM',
  snrDb: -8,
  frequencyHz: 14_097_102,
  driftHz: 0,
  distanceKm: 976,
  bearingDeg: 79,
  frequencyErrorHz: 2,
  stationId: 12,
  ambiguous: false,
  source: { kind: 'listening-post', id: 3, name: 'Garden receiver' },
  ...overrides,
});

export const pageFixture = (reports: ReceptionReport[] = [reportFixture()], total = reports.length): ReceptionPage => ({
  reports,
  total,
  page: 1,
  pageSize: 25,
});
