/**
 * Harmonics of a clock generator's square-wave drive, and the attenuation a
 * filter must add to meet a spurious-emission limit.
 * A rectangular wave of duty cycle D has harmonic amplitudes ∝ |sin(π·n·D)| / n
 * (Fourier series of a pulse train), so relative to the fundamental
 * level_n = 20·log10(|sin(π·n·D)| / (n·|sin(π·D)|)) dBc; at D = 0.5 the even
 * harmonics vanish and the 3rd is 20·log10(1/3) ≈ −9.54 dBc.
 */

export type HarmonicLevel = {
  harmonic: number;
  frequencyHz: number;
  /** level relative to the fundamental; null when the ideal wave has none */
  levelDbc: number | null;
};

const NULL_BELOW = 1e-9;

export function squareWaveHarmonics(fundamentalHz: number, options: { dutyCycle?: number; upTo?: number } = {}): HarmonicLevel[] {
  const duty = options.dutyCycle ?? 0.5;
  const upTo = options.upTo ?? 9;
  const fundamental = Math.abs(Math.sin(Math.PI * duty));
  const out: HarmonicLevel[] = [];
  for (let n = 2; n <= upTo; n++) {
    const amplitude = Math.abs(Math.sin(Math.PI * n * duty)) / n;
    out.push({
      harmonic: n,
      frequencyHz: n * fundamentalHz,
      levelDbc: amplitude < NULL_BELOW ? null : 20 * Math.log10(amplitude / fundamental),
    });
  }
  return out;
}

/**
 * Spurious limit in dB below the fundamental, after US 47 CFR 97.307(d)/(e):
 * at least 43 dB for a transmitter below 30 MHz, 60 dB for 30–225 MHz.
 * Other administrations differ: callers may pass their own limit.
 */
export function defaultSpuriousLimitDb(fundamentalHz: number): number {
  return fundamentalHz < 30e6 ? 43 : 60;
}

export type FilterRequirement = HarmonicLevel & {
  limitDb: number;
  /** attenuation the filter must add at this harmonic (0 when the raw level already meets the limit) */
  requiredAttenuationDb: number;
};

export function requiredFilterAttenuation(
  fundamentalHz: number,
  options: { dutyCycle?: number; upTo?: number; limitDb?: number } = {},
): FilterRequirement[] {
  const limitDb = options.limitDb ?? defaultSpuriousLimitDb(fundamentalHz);
  return squareWaveHarmonics(fundamentalHz, options).map((h) => ({
    ...h,
    limitDb,
    requiredAttenuationDb: h.levelDbc === null ? 0 : Math.max(0, limitDb + h.levelDbc),
  }));
}
