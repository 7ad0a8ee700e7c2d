/**
 * RF exposure, estimated: the EIRP and the distance beyond which the time-averaged power density
 * falls within the general-population limit.
 *
 * Limits: US 47 CFR § 1.1310, Table 1, part (ii) "Limits for general population/uncontrolled exposure"
 * (plane-wave equivalent power density, averaged over 30 minutes):
 *   0.3–1.34 MHz 100 mW/cm²; 1.34–30 MHz 180/f² mW/cm²; 30–300 MHz 0.2 mW/cm²;
 *   300–1500 MHz f/1500 mW/cm²; 1500–100 000 MHz 1.0 mW/cm² (f in MHz). 1 mW/cm² = 10 W/m².
 * Far-field estimate: S = EIRP · duty / (4π r²), so r = √(EIRP · duty / (4π S_limit)).
 * Assumptions: free space, far field, the antenna's main lobe pointing at the person, no ground
 * reflection (FCC OET Bulletin 65 multiplies by 2.56 for a ground reflection; that figure is given too).
 */
import { refuse, type Result } from '../result';

export const EXPOSURE_SOURCE = '47 CFR § 1.1310 Table 1 (ii), general population/uncontrolled exposure, 30-minute average';
export const FORMULA = 'S = EIRP · duty / (4π r²): free space, far field, main lobe towards the person, no ground reflection';
/** FCC OET Bulletin 65: (1.6)² = 2.56 for a reflection off the ground adding in phase (from memory). */
export const GROUND_REFLECTION_FACTOR = 2.56;
const SPEED_OF_LIGHT = 299_792_458;

/** General-population power density limit in W/m² for a frequency, or null outside the table (below 0.3 MHz). */
export function generalPublicLimitWPerM2(frequencyHz: number): number | null {
  const f = frequencyHz / 1e6;
  let mwPerCm2: number;
  if (f < 0.3 || f > 100_000) return null;
  if (f < 1.34) mwPerCm2 = 100;
  else if (f < 30) mwPerCm2 = 180 / (f * f);
  else if (f < 300) mwPerCm2 = 0.2;
  else if (f < 1500) mwPerCm2 = f / 1500;
  else mwPerCm2 = 1;
  return mwPerCm2 * 10;
}

export type ExposureEstimate = {
  powerW: number;
  lossDb: number;
  gainDbi: number;
  duty: number;
  frequencyHz: number;
  eirpW: number;
  averageEirpW: number;
  limitWPerM2: number;
  distanceM: number;
  distanceWithGroundReflectionM: number;
  /** λ/2π: closer than this the far-field formula does not hold */
  nearFieldM: number;
  inNearField: boolean;
  source: string;
  formula: string;
  cautions: string[];
};

export function estimateExposure(input: {
  powerW: number;
  gainDbi: number;
  frequencyHz: number;
  lossDb?: number;
  duty?: number;
}): Result<ExposureEstimate> {
  const { powerW, gainDbi, frequencyHz } = input;
  const lossDb = input.lossDb ?? 0;
  const duty = input.duty ?? 1;
  if (!(powerW > 0 && powerW <= 1500)) return refuse(`The power must be more than 0 and at most 1500 W; got ${powerW}.`);
  if (!(gainDbi >= -30 && gainDbi <= 30)) return refuse(`The antenna gain must be between −30 and 30 dBi; got ${gainDbi}.`);
  if (!(lossDb >= 0 && lossDb <= 30)) return refuse(`The feed-line loss must be between 0 and 30 dB; got ${lossDb}.`);
  if (!(duty > 0 && duty <= 1)) return refuse(`The share of time on air must be more than 0 and at most 1; got ${duty}.`);
  const limitWPerM2 = generalPublicLimitWPerM2(frequencyHz);
  if (limitWPerM2 === null) {
    return refuse(
      `${(frequencyHz / 1e6).toFixed(4)} MHz is outside the table of limits (0.3 MHz – 100 GHz) in ${EXPOSURE_SOURCE}: follow your administration's rule for this band.`,
    );
  }
  const eirpW = powerW * 10 ** ((gainDbi - lossDb) / 10);
  const averageEirpW = eirpW * duty;
  const distanceM = Math.sqrt(averageEirpW / (4 * Math.PI * limitWPerM2));
  const distanceWithGroundReflectionM = Math.sqrt((GROUND_REFLECTION_FACTOR * averageEirpW) / (4 * Math.PI * limitWPerM2));
  const nearFieldM = SPEED_OF_LIGHT / frequencyHz / (2 * Math.PI);
  const inNearField = distanceWithGroundReflectionM < nearFieldM;
  const cautions = [
    'Keep people and animals away from the antenna while it transmits; mount it out of reach.',
    'This is an estimate, not a compliance assessment: local rules and licence conditions decide, and they may set other limits.',
  ];
  if (inNearField)
    cautions.unshift(
      `The distance is inside the antenna's near field (closer than λ/2π ≈ ${nearFieldM.toFixed(1)} m), where the far-field formula does not hold: treat the figure as indicative and keep at least ${nearFieldM.toFixed(1)} m.`,
    );
  return {
    ok: true,
    powerW,
    lossDb,
    gainDbi,
    duty,
    frequencyHz,
    eirpW,
    averageEirpW,
    limitWPerM2,
    distanceM,
    distanceWithGroundReflectionM,
    nearFieldM,
    inNearField,
    source: EXPOSURE_SOURCE,
    formula: FORMULA,
    cautions,
  };
}
