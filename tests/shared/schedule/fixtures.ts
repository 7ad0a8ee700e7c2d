/** Test stations and units for the schedule tests (fictional Q-prefixed callsigns). */
import { bandFor, BAND_IDS, type BandId } from '../../../shared/domain/bands';
import type { ScheduleRules } from '../../../shared/domain/schedule';
import type { StationSettings, UnitHardware } from '../../../shared/domain/workshop';

/** A filter that covers the band: cut-off 10 % above the window top, below the second harmonic. */
export function coveringFilter(bandId: BandId) {
  const r = bandFor(bandId, 'itu1');
  if (!r.ok) throw new Error(r.reason);
  return { bands: [bandId], type: 'butterworth', order: 5, cutoffHz: r.band.windowHighHz * 1.1 };
}

export function unitWithFilters(bands: readonly BandId[], extra: Partial<UnitHardware> = {}): UnitHardware {
  return {
    generatorKind: 'pll',
    referenceHz: 25e6,
    tolerancePpm: 10,
    tempCoPpmPerC: null,
    disciplined: false,
    generatorLevelDbm: 23.5,
    attenuatorDb: 0,
    amplifier: null,
    filters: bands.map(coveringFilter),
    dutyCycle: 0.5,
    ...extra,
  };
}

export function stationOn(
  bands: readonly BandId[],
  extra: Partial<StationSettings> = {},
  calibration: (bandId: BandId) => number | null = () => 0,
): StationSettings {
  return {
    callsign: 'Q1IMW',
    locator: 'IO91',
    region: 'itu1',
    audioOffsetHz: 1500,
    bands: bands.map((bandId) => ({ bandId, enabled: true, calibrationOffsetHz: calibration(bandId) })),
    ...extra,
  };
}

export function rules(extra: Partial<ScheduleRules> = {}): ScheduleRules {
  return {
    stationId: 1,
    steps: [{ bandId: '20m', slots: 1, activeHoursUtc: null }],
    cadence: { kind: 'duty', dutyPercent: 20 },
    stagger: { stepHz: 0, spanHz: 0 },
    startDate: '2026-12-01',
    endDate: null,
    paused: false,
    ...extra,
  };
}

/** Bands with a Region 1 WSPR frequency (4 m and the rest; all of BAND_IDS in Region 1). */
export const REGION1_BANDS: readonly BandId[] = BAND_IDS.filter((id) => bandFor(id, 'itu1').ok);

export const DEC_2_2026 = Date.UTC(2026, 11, 2);
export const HOUR_MS = 3_600_000;
export const DAY_MS = 86_400_000;
