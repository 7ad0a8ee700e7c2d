/**
 * Whether a rotation step can go on the air for a station and its unit: the band
 * has a WSPR frequency in the station's region, is enabled on the station, and an
 * low-pass filter in circuit covers it (shared filter-selection rule). Used by the expansion and by the editor checks.
 */
import { bandFor, type Band } from '../bands';
import { selectFilter, type FilterToSelect } from '../workshop/filter-selection';
import type { StationSettings, UnitHardware } from '../workshop/on-air';
import type { RotationStep } from './model';
import { allowedOffsetRange, type OffsetRange } from './offsets';

export type StepBand = {
  band: Band;
  /** the generator's error on this band, Hz (0 when not calibrated) */
  calibrationOffsetHz: number;
  calibrated: boolean;
  range: OffsetRange;
  /** the filter to put in circuit for this band */
  filter: FilterToSelect;
};

export type StepCheck = { ok: true; stepBand: StepBand } | { ok: false; reason: string };

export function checkStep(step: RotationStep, station: StationSettings, unit: UnitHardware | null): StepCheck {
  const found = bandFor(step.bandId, station.region);
  if (!found.ok) return { ok: false, reason: found.reason };
  const { band } = found;
  const setting = station.bands.find((b) => b.bandId === band.id);
  if (!setting?.enabled) {
    return { ok: false, reason: `${band.name} is not enabled on this station: enable it in the station's bands, or remove this step.` };
  }
  if (!unit) return { ok: false, reason: `The station has no unit, so no filter is known for ${band.name}: assign a unit first.` };
  const coverage = selectFilter(unit, band);
  if (!coverage.covered) return { ok: false, reason: coverage.reason };
  const calibrated = setting.calibrationOffsetHz !== null && setting.calibrationOffsetHz !== undefined;
  return {
    ok: true,
    stepBand: {
      band,
      calibrationOffsetHz: setting.calibrationOffsetHz ?? 0,
      calibrated,
      range: allowedOffsetRange(),
      filter: coverage.select,
    },
  };
}
