import type { ScheduleValues, Station, Unit } from '@/shared/schemas';

import { stationFixture } from '../../utils/fixtures';

export const NOW_MS = Date.parse('2026-12-02T14:02:48.000Z');

/** Fictional operator's station: 40 m, 20 m and 10 m enabled, calibrated; the unit has filters for 40 m and 20 m only. */
export const station: Station = stationFixture({
  ownerId: 7,
  unitId: 3,
  transmitEnabled: true,
  bands: [
    { bandId: '40m', enabled: true, calibrationOffsetHz: 0, calibrationSource: 'typed', calibratedAt: '2026-12-01T10:00:00.000Z' },
    { bandId: '20m', enabled: true, calibrationOffsetHz: 0, calibrationSource: 'typed', calibratedAt: '2026-12-01T10:00:00.000Z' },
    { bandId: '10m', enabled: true, calibrationOffsetHz: 0, calibrationSource: 'typed', calibratedAt: '2026-12-01T10:00:00.000Z' },
  ],
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
});

export const unit: Unit = {
  id: 3,
  ownerId: 7,
  ownerName: 'Ilse Marrow',
  name: 'Loft board',
  serialLabel: 'IM-2',
  controller: 'Wi-Fi microcontroller board',
  timeSource: 'network',
  generatorKind: 'pll',
  referenceHz: 25e6,
  tolerancePpm: 10,
  tempCoPpmPerC: null,
  disciplined: false,
  generatorLevelDbm: 10,
  attenuatorDb: 0,
  amplifier: null,
  filters: [
    { bands: ['40m'], type: 'chebyshev-0.5', order: 5, cutoffHz: 7.8e6, controlCode: '' },
    { bands: ['20m'], type: 'chebyshev-0.5', order: 5, cutoffHz: 15.6e6, controlCode: '' },
  ],
  filterSelection: 'switched',
  fittedFilter: null,
  antenna: { kind: 'dipole', bands: [], gainDbi: 2.15 },
  dutyCycle: 0.5,
  notes: '',
  photos: [],
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
} as Unit;

export function draft(steps: ScheduleValues['steps']): ScheduleValues {
  return {
    name: 'Test rotation',
    steps,
    cadence: { kind: 'duty', dutyPercent: 20 },
    stagger: { stepHz: 0, spanHz: 0 },
    startDate: '2026-12-01',
    endDate: null,
    paused: false,
  };
}
