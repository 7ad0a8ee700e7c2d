/**
 * A club admin's verdict on one station, in plain words: each finding says what is wrong
 * and what to change. An empty list means nothing was found, not that the station is legal:
 * the licensee still answers for it.
 */
import { bandFor, type BandId } from '../bands';
import type { ScheduleRules } from '../schedule/model';
import { validateCallsign } from '../wspr/callsign';
import { planMessages } from '../wspr/message-plan';
import { rotationFilterProblem, selectFilter } from './filter-selection';
import { bandOnAir, stationPower, type StationSettings, type UnitHardware } from './on-air';

export type ComplianceCode =
  | 'no-unit'
  | 'unfiltered-band'
  | 'filter-selection'
  | 'power-over-limit'
  | 'not-encodable'
  | 'tones-outside-window'
  | 'not-calibrated'
  | 'harmonics-fail';

export type ComplianceFinding = { code: ComplianceCode; bandId?: BandId; message: string };

export function complianceFindings(input: {
  station: StationSettings;
  unit: UnitHardware | null;
  schedule: Pick<ScheduleRules, 'steps'> | null;
  maxPowerDbm: number;
}): ComplianceFinding[] {
  const { station, unit, schedule, maxPowerDbm } = input;
  const findings: ComplianceFinding[] = [];
  const call = validateCallsign(station.callsign);
  const plan = planMessages({ callsign: station.callsign, locator: station.locator, powerDbm: 0 });
  if (!call.ok || !plan.ok) {
    findings.push({
      code: 'not-encodable',
      message: `The callsign or locator cannot be sent in WSPR: ${(!call.ok ? call : plan.ok ? null : plan)?.reason}`,
    });
  }
  if (!unit) {
    findings.push({ code: 'no-unit', message: 'No beacon hardware is assigned, so filters, power and harmonics cannot be checked.' });
    return findings;
  }
  const power = stationPower(unit);
  if (power.outputDbm > maxPowerDbm) {
    findings.push({
      code: 'power-over-limit',
      message: `Output is ${power.outputDbm.toFixed(1)} dBm, above the club's limit of ${maxPowerDbm} dBm: add attenuation or lower the drive.`,
    });
  }
  const scheduled = new Set(schedule?.steps.map((s) => s.bandId) ?? []);
  const rotation = rotationFilterProblem(unit, [...scheduled], station.region);
  if (rotation) findings.push({ code: 'filter-selection', message: rotation });
  const enabled = station.bands.filter((b) => b.enabled).map((b) => b.bandId);
  for (const bandId of new Set([...enabled, ...scheduled])) {
    const found = bandFor(bandId, station.region);
    if (!found.ok) continue;
    const coverage = selectFilter(unit, found.band);
    if (!coverage.covered) {
      const where = scheduled.has(bandId) ? 'scheduled' : 'enabled';
      findings.push({ code: 'unfiltered-band', bandId, message: `${found.band.name} is ${where}, but ${lowerFirst(coverage.reason)}` });
      continue;
    }
    const air = bandOnAir(station, unit, bandId);
    if ('problem' in air) continue;
    if (!air.calibrated) {
      findings.push({
        code: 'not-calibrated',
        bandId,
        message: `${found.band.name} is enabled with no calibration: measure it so the tones land in the window.`,
      });
    }
    if (!air.window.inside) {
      findings.push({
        code: 'tones-outside-window',
        bandId,
        message: `On ${found.band.name} a tone falls ${Math.abs(air.window.marginHz).toFixed(1)} Hz outside the receive window: move the audio offset or recalibrate.`,
      });
    }
    if (air.harmonics.pass === false) {
      findings.push({
        code: 'harmonics-fail',
        bandId,
        message: `${found.band.name}: ${air.harmonics.summary} (${air.harmonics.limit.source})`,
      });
    }
  }
  return findings;
}

/** A sentence spliced into another one starts in lower case. */
const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);
