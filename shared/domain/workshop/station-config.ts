/**
 * The station configuration document ("faintline.station-config", version 1): everything a
 * beacon needs to transmit, as our own versioned JSON format. Its JSON Schema is
 * shared/formats/station-config.v1.schema.json; the export download and the device API use it.
 */
import type { BandId, LicenceRegion } from '../bands';
import { bytesToHex } from '../wspr/pack';
import { bandOnAir, stationMessages, stationPower, type StationSettings, type UnitHardware } from './on-air';

export const STATION_CONFIG_FORMAT = 'faintline.station-config';
export const STATION_CONFIG_VERSION = 1;

export type ConfigStation = StationSettings & {
  id: number;
  name: string;
  transmitEnabled: boolean;
  suspended?: boolean;
};
export type ConfigUnit = UnitHardware & { id: number; name: string };

const round = (value: number, digits = 3) => Number(value.toFixed(digits));

/** `messages`: the station's messages when already encoded (the device configuration encodes them once). */
export function buildStationConfig(
  station: ConfigStation,
  unit: ConfigUnit | null,
  generatedAt: Date,
  messages: ReturnType<typeof stationMessages> = stationMessages(station, unit),
) {
  const power = unit ? stationPower(unit) : null;
  const bands = unit
    ? station.bands.flatMap((setting) => {
        const air = bandOnAir(station, unit, setting.bandId);
        if ('problem' in air) return [];
        return [
          {
            bandId: setting.bandId as BandId,
            enabled: setting.enabled && air.coverage.covered,
            filterCovered: air.coverage.covered,
            dialHz: air.band.dialHz,
            calibrationOffsetHz: setting.calibrationOffsetHz,
            carrierHz: round(air.command.carrierHz),
            tonesHz: air.command.tonesHz.map((f) => round(f)),
            commandTonesHz: air.command.commandTonesHz.map((f) => round(f)),
            window: {
              lowHz: air.window.windowLowHz,
              highHz: air.window.windowHighHz,
              marginHz: round(air.window.marginHz),
              inside: air.window.inside,
            },
            synth: air.synth && {
              referenceHz: air.synth.referenceHz,
              outputDivider: air.synth.outputDivider,
              rDivider: air.synth.rDivider,
              outputRegisters: bytesToHex(air.synth.outputRegisters.bytes),
              tones: air.synth.tones.map((t) => ({
                targetHz: round(t.targetHz),
                producedHz: round(t.producedHz, 4),
                errorHz: round(t.errorHz, 4),
                feedback: t.feedback,
                p1: t.registers.p1,
                p2: t.registers.p2,
                p3: t.registers.p3,
                registers: bytesToHex(t.registers.bytes),
              })),
            },
          },
        ];
      })
    : [];
  return {
    format: STATION_CONFIG_FORMAT,
    version: STATION_CONFIG_VERSION,
    generatedAt: generatedAt.toISOString(),
    station: {
      id: station.id,
      name: station.name,
      callsign: station.callsign,
      locator: station.locator,
      region: station.region as LicenceRegion,
      audioOffsetHz: station.audioOffsetHz,
      transmitEnabled: station.transmitEnabled && !station.suspended,
      suspended: Boolean(station.suspended),
    },
    unit: unit && {
      id: unit.id,
      name: unit.name,
      generatorKind: unit.generatorKind,
      referenceHz: unit.referenceHz,
      tolerancePpm: unit.tolerancePpm,
    },
    power: power && { outputDbm: round(power.outputDbm, 2), reportedDbm: power.report.reportedDbm },
    messages: messages.ok ? messages.messages : [],
    messageProblem: messages.ok ? null : messages.reason,
    bands,
  };
}

export type StationConfig = ReturnType<typeof buildStationConfig>;
