/**
 * The device configuration document: the station configuration (station-config.ts) plus the
 * device's identity, its status and every transmission of the next hours, ready to key. The
 * server's device API sends it and the simulator reads it; both use this one builder and type.
 */
import { commandForBand } from '../calibration';
import { expandPlan } from '../schedule/expand';
import type { ScheduleRules } from '../schedule/model';
import { planSynth } from '../synth';
import { bandFor } from '../bands';
import { bytesToHex } from '../wspr/pack';
import { selectFilter } from './filter-selection';
import { stationMessages } from './on-air';
import { buildStationConfig, type ConfigStation, type ConfigUnit } from './station-config';

/** How far ahead the plan in a device configuration reaches. */
export const DEVICE_PLAN_HOURS = 6;
const HOUR_MS = 3_600_000;

/** The plan window starts at the current UTC hour, so a device's view changes at most once an hour. */
export const planWindowStart = (nowMs: number) => Math.floor(nowMs / HOUR_MS) * HOUR_MS;

export type DeviceConfigStation = Omit<ConfigStation, 'suspended'> & {
  /** set when a club admin suspended the station */
  suspension: { reason: string; at: string } | null;
};

const round3 = (value: number) => Number(value.toFixed(3));

export function buildDeviceConfig(station: DeviceConfigStation, unit: ConfigUnit | null, schedule: ScheduleRules | null, nowMs: number) {
  const suspended = station.suspension !== null;
  // Encoded once: the configuration lists the messages and the plan's transmissions point into them.
  const encoded = stationMessages(station, unit);
  const base = buildStationConfig({ ...station, suspended }, unit, new Date(nowMs), encoded);
  const messages = encoded.ok ? encoded.messages : undefined;
  const fromMs = planWindowStart(nowMs);
  const toMs = fromMs + DEVICE_PLAN_HOURS * HOUR_MS;
  const result = schedule ? expandPlan({ schedule, station, unit, suspended, messages, fromMs, toMs }) : null;
  const transmissions = (result?.transmissions ?? []).map((tx) => {
    const band = station.bands.find((b) => b.bandId === tx.bandId);
    const command = commandForBand(tx.dialHz, tx.audioOffsetHz, { referenceErrorPpm: 0, bandOffsetHz: band?.calibrationOffsetHz ?? 0 });
    const synth = unit?.generatorKind === 'pll' ? planSynth({ referenceHz: unit.referenceHz, targetsHz: command.commandTonesHz }) : null;
    // the shared filter rule: which filter to put in circuit before keying (the plan only holds bands it allows)
    const found = bandFor(tx.bandId, station.region);
    const choice = unit && found.ok ? selectFilter(unit, found.band) : null;
    return {
      startUtc: tx.startUtc,
      bandId: tx.bandId,
      filter: choice?.covered ? choice.select : null,
      carrierHz: round3(tx.carrierHz),
      commandHz: round3(tx.commandHz),
      messageText: tx.messageText,
      messageType: tx.messageType,
      // the 162 channel symbols as a string of digits 0–3, in transmission order
      symbols: (base.messages[tx.messageIndex]?.symbols ?? []).join(''),
      tonesHz: command.tonesHz.map(round3),
      commandTonesHz: command.commandTonesHz.map(round3),
      registers:
        synth && synth.ok
          ? {
              outputDivider: synth.outputDivider,
              rDivider: synth.rDivider,
              output: bytesToHex(synth.outputRegisters.bytes),
              tones: synth.tones.map((t) => bytesToHex(t.registers.bytes)),
            }
          : null,
    };
  });
  return {
    ...base,
    filters: unit && {
      selection: unit.filterSelection,
      fitted: unit.filterSelection === 'hand' ? unit.fittedFilter : null,
      list: unit.filters.map((f, index) => ({ index, bands: f.bands, cutoffHz: f.cutoffHz, controlCode: f.controlCode || null })),
    },
    identity: { stationId: station.id, callsign: station.callsign, locator: station.locator },
    status: suspended ? ('suspended' as const) : station.transmitEnabled ? ('transmit' as const) : ('off' as const),
    suspension: station.suspension && { reason: station.suspension.reason, sinceUtc: station.suspension.at },
    plan: {
      fromUtc: new Date(fromMs).toISOString(),
      toUtc: new Date(toMs).toISOString(),
      quiet: result?.quiet ?? [{ code: 'no-schedule' as const, message: 'The station has no schedule yet.' }],
      // Nothing to send while switched off or suspended.
      transmissions: station.transmitEnabled && !suspended ? transmissions : [],
    },
  };
}

export type DeviceConfig = ReturnType<typeof buildDeviceConfig>;
export type DeviceConfigTransmission = DeviceConfig['plan']['transmissions'][number];
