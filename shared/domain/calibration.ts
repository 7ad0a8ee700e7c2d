/**
 * Frequency correction for a cheap reference crystal.
 * Model: a generator told to make f makes f · (1 + ppm·10⁻⁶) + bandOffsetHz,
 * where ppm is the reference error (positive = reference runs fast) and the
 * per-band offset covers what ppm does not (a divider quirk, a signal path).
 */
import { refuse, type Result } from './result';
import { checkTonesInWindow, toneFrequenciesHz, type WindowCheck } from './tones';

export type Calibration = {
  /** reference error in parts per million (positive = runs fast) */
  referenceErrorPpm: number;
  /** extra offset in Hz measured on one band, beyond what ppm explains */
  bandOffsetHz?: number;
};

/** What the generator actually produces when told `commandedHz`. */
export function producedFrequencyHz(commandedHz: number, calibration: Calibration): number {
  return commandedHz * (1 + calibration.referenceErrorPpm * 1e-6) + (calibration.bandOffsetHz ?? 0);
}

/** What to tell the generator so that it produces `wantedHz`. */
export function commandFrequencyHz(wantedHz: number, calibration: Calibration): number {
  return (wantedHz - (calibration.bandOffsetHz ?? 0)) / (1 + calibration.referenceErrorPpm * 1e-6);
}

export type BandCommand = {
  dialHz: number;
  audioOffsetHz: number;
  /** the carrier (tone 0) the receivers should see: dial + audio offset */
  carrierHz: number;
  /** what to command for tone 0 after correction */
  commandHz: number;
  /** the four tones to command, corrected */
  commandTonesHz: number[];
  /** the four tones the station should radiate */
  tonesHz: number[];
  /** the correction applied, commandHz − carrierHz */
  correctionHz: number;
  window: WindowCheck;
};

/** The corrected frequencies to command on a band for a given audio offset. */
export function commandForBand(dialHz: number, audioOffsetHz: number, calibration: Calibration): BandCommand {
  const carrierHz = dialHz + audioOffsetHz;
  const tonesHz = toneFrequenciesHz(carrierHz);
  const commandTonesHz = tonesHz.map((f) => commandFrequencyHz(f, calibration));
  return {
    dialHz,
    audioOffsetHz,
    carrierHz,
    commandHz: commandTonesHz[0],
    commandTonesHz,
    tonesHz,
    correctionHz: commandTonesHz[0] - carrierHz,
    window: checkTonesInWindow(dialHz, tonesHz),
  };
}

/** Where the tones land when the generator is told the uncorrected carrier (what a fresh unit does). */
export function uncorrectedTonesCheck(dialHz: number, audioOffsetHz: number, calibration: Calibration): WindowCheck {
  const tones = toneFrequenciesHz(dialHz + audioOffsetHz).map((f) => producedFrequencyHz(f, calibration));
  return checkTonesInWindow(dialHz, tones);
}

export type Measurement = { commandedHz: number; observedHz: number };

/** Reference error in ppm from one measurement: (observed / commanded − 1) · 10⁶. */
export function ppmFromMeasurement(measurement: Measurement): Result<{ referenceErrorPpm: number; errorHz: number }> {
  if (!(measurement.commandedHz > 0) || !(measurement.observedHz > 0)) {
    return refuse('A measurement needs a positive commanded and observed frequency in Hz.');
  }
  return {
    ok: true,
    referenceErrorPpm: (measurement.observedHz / measurement.commandedHz - 1) * 1e6,
    errorHz: measurement.observedHz - measurement.commandedHz,
  };
}

/** The offset in Hz the same reference error gives at another frequency (uncorrected). */
export function predictedOffsetHz(frequencyHz: number, referenceErrorPpm: number): number {
  return frequencyHz * referenceErrorPpm * 1e-6;
}

/** From one measurement, the predicted offset on each of several frequencies. */
export function predictOffsets(
  measurement: Measurement,
  targets: readonly { id: string; frequencyHz: number }[],
): Result<{ referenceErrorPpm: number; offsets: { id: string; frequencyHz: number; offsetHz: number }[] }> {
  const ppm = ppmFromMeasurement(measurement);
  if (!ppm.ok) return ppm;
  return {
    ok: true,
    referenceErrorPpm: ppm.referenceErrorPpm,
    offsets: targets.map((t) => ({ ...t, offsetHz: predictedOffsetHz(t.frequencyHz, ppm.referenceErrorPpm) })),
  };
}

/** Frequency drift in Hz for a temperature change, given the crystal's coefficient in ppm/°C. */
export function thermalDriftHz(frequencyHz: number, ppmPerDegC: number, deltaDegC: number): number {
  return frequencyHz * ppmPerDegC * deltaDegC * 1e-6;
}
