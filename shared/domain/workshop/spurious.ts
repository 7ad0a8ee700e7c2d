/**
 * The spurious-emission limit a station's harmonics are judged against, by licence region.
 * Rules differ by country: these are the defaults Faintline uses, each with its source named,
 * and the screen tells the operator to check the local rule.
 */
import type { LicenceRegion } from '../bands';
import { defaultSpuriousLimitDb, requiredFilterAttenuation, type FilterRequirement } from '../harmonics';

export type SpuriousLimit = { limitDb: number; rule: string; source: string };

export function spuriousLimitFor(region: LicenceRegion, fundamentalHz: number, powerW: number): SpuriousLimit {
  if (region === 'itu2') {
    return {
      limitDb: defaultSpuriousLimitDb(fundamentalHz),
      rule: fundamentalHz < 30e6 ? 'at least 43 dB below the carrier (below 30 MHz)' : 'at least 60 dB below the carrier (30–225 MHz)',
      source: 'US 47 CFR 97.307(d)/(e)',
    };
  }
  // ITU Radio Regulations Appendix 3, amateur services: 43 + 10·log10(P/W) dB, or 50 dBc below 30 MHz
  // (60 dBc above), whichever is less stringent (from memory).
  const cap = fundamentalHz < 30e6 ? 50 : 60;
  const formula = 43 + 10 * Math.log10(Math.max(powerW, 1e-6));
  const limitDb = Math.max(0, Math.min(formula, cap));
  return {
    limitDb,
    rule: `${limitDb.toFixed(1)} dB below the carrier (43 + 10·log10 P, at most ${cap} dB)`,
    source: 'ITU Radio Regulations, Appendix 3 (amateur services)',
  };
}

export type SpuriousRequirement = {
  /** the fundamental the harmonics are counted from: the real carrier (dial + audio offset) */
  carrierHz: number;
  limit: SpuriousLimit;
  harmonics: FilterRequirement[];
};

/**
 * The one spurious check: the square-wave drive's harmonics of the real carrier, the region's limit
 * for that carrier and power, and the attenuation a filter must add at each harmonic. The CLI's
 * `filter` and the station's compliance verdict both call it. `limitDb` overrides the region's rule.
 */
export function spuriousRequirement(input: {
  region: LicenceRegion;
  carrierHz: number;
  powerW: number;
  dutyCycle?: number;
  upTo?: number;
  limitDb?: number;
}): SpuriousRequirement {
  const regional = spuriousLimitFor(input.region, input.carrierHz, input.powerW);
  const limit =
    input.limitDb === undefined
      ? regional
      : { limitDb: input.limitDb, rule: `${input.limitDb} dB below the carrier (given)`, source: 'given by the operator' };
  const harmonics = requiredFilterAttenuation(input.carrierHz, {
    dutyCycle: input.dutyCycle,
    upTo: input.upTo ?? 9,
    limitDb: limit.limitDb,
  });
  return { carrierHz: input.carrierHz, limit, harmonics };
}
