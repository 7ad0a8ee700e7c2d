import { createHash } from 'node:crypto';
import { commandForBand } from '@/shared/domain/calibration';
import { planSynth } from '@/shared/domain/synth';
import { bandFor } from '@/shared/domain/bands';
import { buildStationConfig, selectFilter } from '@/shared/domain/workshop';
import { bytesToHex } from '@/shared/domain/wspr/pack';
import type { Schedule, Station, Unit } from '@/shared/schemas';
import { planFor } from '../schedules/plan';

export const PLAN_HOURS = 6;
const HOUR_MS = 3_600_000;

/** The plan window starts at the current UTC hour, so a device's view changes at most once an hour. */
export const planWindowStart = (nowMs: number) => Math.floor(nowMs / HOUR_MS) * HOUR_MS;

export function etagFor(version: string, nowMs: number) {
  return `"${createHash('sha1')
    .update(`${version}|${planWindowStart(nowMs)}`)
    .digest('base64url')}"`;
}

/** What a beacon fetches: its configuration document plus every transmission of the next hours, ready to key. */
export function deviceConfig(station: Station, unit: Unit | null, schedule: Schedule | null, nowMs: number) {
  const base = buildStationConfig({ ...station, suspended: station.suspension !== null }, unit, new Date(nowMs));
  const fromMs = planWindowStart(nowMs);
  const toMs = fromMs + PLAN_HOURS * HOUR_MS;
  const result = schedule ? planFor(station, unit, schedule, fromMs, toMs) : null;
  const messages = base.messages;
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
      carrierHz: Number(tx.carrierHz.toFixed(3)),
      commandHz: Number(tx.commandHz.toFixed(3)),
      messageText: tx.messageText,
      messageType: tx.messageType,
      // the 162 channel symbols as a string of digits 0–3, in transmission order
      symbols: (messages[tx.messageIndex]?.symbols ?? []).join(''),
      tonesHz: command.tonesHz.map((f) => Number(f.toFixed(3))),
      commandTonesHz: command.commandTonesHz.map((f) => Number(f.toFixed(3))),
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
    status: station.suspension ? 'suspended' : station.transmitEnabled ? 'transmit' : 'off',
    suspension: station.suspension && { reason: station.suspension.reason, sinceUtc: station.suspension.at },
    plan: {
      fromUtc: new Date(fromMs).toISOString(),
      toUtc: new Date(toMs).toISOString(),
      quiet: result?.quiet ?? [{ code: 'no-schedule', message: 'The station has no schedule yet.' }],
      // Nothing to send while switched off or suspended.
      transmissions: station.transmitEnabled && !station.suspension ? transmissions : [],
    },
  };
}
