import { firstSteps } from '@/components/overview/first-steps-list';
import type { StationAtAGlance } from '@/shared/api/receptions';
import type { Station, StationHealth, Unit } from '@/shared/schemas';

const station = (bands: Station['bands']) => ({ id: 7, bands }) as unknown as Station;
const glance = (over: Partial<StationAtAGlance>): StationAtAGlance => ({
  stationId: 7,
  transmitting: false,
  nextTransmission: null,
  lastHeard: null,
  last24h: { reports: 0, receivers: 0, furthestKm: null },
  ...over,
});

describe('firstSteps', () => {
  it('a brand-new account has nothing ticked and every step links somewhere to start', () => {
    const steps = firstSteps({ units: [], stations: [], health: [], glances: [] });
    expect(steps.map((s) => s.title)).toEqual([
      'Register a unit',
      'Add a station',
      'Enable and calibrate a band',
      'Make a schedule',
      'Create a device token',
      'See it heard',
    ]);
    expect(steps.every((s) => !s.done)).toBe(true);
    expect(steps[0].href).toBe('/units/new');
    expect(steps[3].href).toBe('/stations/new');
  });

  it('ticks each step off from what the account has, and links later steps to the first station', () => {
    const enabledOnly = station([{ bandId: '20m', enabled: true, calibrationOffsetHz: null, calibrationSource: null, calibratedAt: null }]);
    let steps = firstSteps({ units: [{ id: 1 } as Unit], stations: [enabledOnly], health: [], glances: [glance({})] });
    expect(steps.map((s) => s.done)).toEqual([true, true, false, false, false, false]);
    expect(steps[2].href).toEqual({ pathname: '/stations/[id]/bands', params: { id: '7' } });

    const calibrated = station([
      { bandId: '20m', enabled: true, calibrationOffsetHz: 12.5, calibrationSource: 'measured', calibratedAt: null },
    ]);
    steps = firstSteps({
      units: [{ id: 1 } as Unit],
      stations: [calibrated],
      health: [{ stationId: 7, hasDevice: true } as StationHealth],
      glances: [
        glance({
          nextTransmission: { startUtc: '2026-12-03T10:00:00Z', bandId: '20m' },
          lastHeard: { slotUtc: '2026-12-03T09:58:00Z', rxCallsign: 'Q1ABC', distanceKm: 420 },
        }),
      ],
    });
    expect(steps.every((s) => s.done)).toBe(true);
  });
});
