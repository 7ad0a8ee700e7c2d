/**
 * Resistive attenuators for a beacon's power chain: the attenuation a chain needs, the nearest
 * common fixed values, and matched pi and T pads with exact and nearest-E24 resistors, what the
 * E24 resistors really give (attenuation, input impedance, return loss) and what each dissipates.
 *
 * Matched pad formulas, with K = 10^(A/20) and the line impedance Z0:
 *   pi: shunt = Z0·(K + 1)/(K − 1), series = Z0·(K² − 1)/(2K)
 *   T:  series = Z0·(K − 1)/(K + 1), shunt = Z0·2K/(K² − 1)
 */
import { refuse, type Result } from '../result';
import { dbmToMw, mwToDbm } from '../power';
import { isWsprPowerLevel } from '../wspr/power-levels';

/** The E24 preferred-number series (IEC 60063), one decade. */
export const E24 = [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1];

/** Fixed attenuators commonly sold as SMA/BNC inline parts (common practice, no source). */
export const COMMON_FIXED_DB = [1, 2, 3, 4, 5, 6, 10, 15, 20, 30, 40];

/** A quarter-watt resistor is the usual part on a beacon board (common practice, no source). */
export const DEFAULT_RESISTOR_RATING_W = 0.25;

/** The E24 value nearest to a resistance (nearest on a log scale, as the series is spaced). */
export function nearestE24(ohm: number): number {
  if (!(ohm > 0) || !Number.isFinite(ohm)) return ohm;
  const decade = 10 ** Math.floor(Math.log10(ohm));
  let best = E24[0] * decade;
  for (const d of [decade / 10, decade, decade * 10]) {
    for (const v of E24) {
      const candidate = Number((v * d).toPrecision(2));
      if (Math.abs(Math.log(candidate / ohm)) < Math.abs(Math.log(best / ohm))) best = candidate;
    }
  }
  return best;
}

export type PiPad = { shuntOhm: number; seriesOhm: number };
export type TPad = { seriesOhm: number; shuntOhm: number };

export function piPad(attenuationDb: number, impedanceOhm = 50): PiPad {
  const k = 10 ** (attenuationDb / 20);
  return { shuntOhm: (impedanceOhm * (k + 1)) / (k - 1), seriesOhm: (impedanceOhm * (k * k - 1)) / (2 * k) };
}

export function tPad(attenuationDb: number, impedanceOhm = 50): TPad {
  const k = 10 ** (attenuationDb / 20);
  return { seriesOhm: (impedanceOhm * (k - 1)) / (k + 1), shuntOhm: (impedanceOhm * 2 * k) / (k * k - 1) };
}

const parallel = (a: number, b: number) => (a * b) / (a + b);

export type ResistorLoad = { role: string; ohm: number; dissipatedW: number; ratingW: number; overRating: boolean };

export type PadBehaviour = {
  /** insertion loss between a Z0 source and a Z0 load */
  attenuationDb: number;
  /** impedance seen at the input with the output terminated in Z0 */
  inputOhm: number;
  /** −20·log10|Γ|; null when the match is exact (Γ below 10⁻⁶, return loss beyond 120 dB) */
  returnLossDb: number | null;
  /** power into the pad, and what each resistor turns into heat */
  inputW: number;
  resistors: ResistorLoad[];
};

function behaviour(kind: 'pi' | 't', series: number, shunt: number, impedanceOhm: number, inputW: number, ratingW: number): PadBehaviour {
  const z0 = impedanceOhm;
  // a Z0 source whose available power is inputW: open-circuit voltage 2·√(P·Z0)
  const vs = 2 * Math.sqrt(inputW * z0);
  const load = (role: string, ohm: number, w: number): ResistorLoad => ({ role, ohm, dissipatedW: w, ratingW, overRating: w > ratingW });
  let inputOhm: number;
  let vLoad: number;
  let resistors: ResistorLoad[];
  if (kind === 'pi') {
    const rp = parallel(shunt, z0);
    inputOhm = parallel(shunt, series + rp);
    const vIn = (vs * inputOhm) / (inputOhm + z0);
    const i2 = vIn / (series + rp);
    vLoad = i2 * rp;
    resistors = [
      load('input shunt', shunt, (vIn * vIn) / shunt),
      load('series', series, i2 * i2 * series),
      load('output shunt', shunt, (vLoad * vLoad) / shunt),
    ];
  } else {
    const rRest = parallel(shunt, series + z0);
    inputOhm = series + rRest;
    const vIn = (vs * inputOhm) / (inputOhm + z0);
    const iIn = vIn / inputOhm;
    const vMid = vIn - iIn * series;
    const i3 = vMid / (series + z0);
    vLoad = i3 * z0;
    resistors = [
      load('input series', series, iIn * iIn * series),
      load('shunt', shunt, (vMid * vMid) / shunt),
      load('output series', series, i3 * i3 * series),
    ];
  }
  const gamma = Math.abs((inputOhm - z0) / (inputOhm + z0));
  return {
    attenuationDb: 20 * Math.log10(vs / 2 / vLoad),
    inputOhm,
    returnLossDb: gamma < 1e-6 ? null : -20 * Math.log10(gamma),
    inputW,
    resistors,
  };
}

export type PadDesign = {
  attenuationDb: number;
  impedanceOhm: number;
  pi: PiPad;
  t: TPad;
  e24: {
    pi: PiPad & PadBehaviour;
    t: TPad & PadBehaviour;
  };
  /** exact resistors at the given input power */
  exact: { pi: PadBehaviour; t: PadBehaviour };
  cautions: string[];
};

export function designPad(input: { attenuationDb: number; impedanceOhm?: number; inputW?: number; ratingW?: number }): Result<PadDesign> {
  const z0 = input.impedanceOhm ?? 50;
  const a = input.attenuationDb;
  const inputW = input.inputW ?? 0.01;
  const ratingW = input.ratingW ?? DEFAULT_RESISTOR_RATING_W;
  if (!(a > 0 && a <= 60)) return refuse(`The attenuation must be more than 0 and at most 60 dB; got ${a}.`);
  if (!(z0 >= 1 && z0 <= 1000)) return refuse(`The impedance must be between 1 and 1000 Ω; got ${z0}.`);
  if (!(inputW > 0 && inputW <= 100)) return refuse(`The power into the pad must be more than 0 and at most 100 W; got ${inputW}.`);
  if (!(ratingW > 0)) return refuse('The resistor rating must be above 0 W.');
  const pi = piPad(a, z0);
  const t = tPad(a, z0);
  const piE24 = { shuntOhm: nearestE24(pi.shuntOhm), seriesOhm: nearestE24(pi.seriesOhm) };
  const tE24 = { seriesOhm: nearestE24(t.seriesOhm), shuntOhm: nearestE24(t.shuntOhm) };
  const e24 = {
    pi: { ...piE24, ...behaviour('pi', piE24.seriesOhm, piE24.shuntOhm, z0, inputW, ratingW) },
    t: { ...tE24, ...behaviour('t', tE24.seriesOhm, tE24.shuntOhm, z0, inputW, ratingW) },
  };
  const exact = {
    pi: behaviour('pi', pi.seriesOhm, pi.shuntOhm, z0, inputW, ratingW),
    t: behaviour('t', t.seriesOhm, t.shuntOhm, z0, inputW, ratingW),
  };
  const cautions: string[] = [];
  for (const [name, pad] of [
    ['pi', e24.pi],
    ['T', e24.t],
  ] as const) {
    const hot = pad.resistors.filter((r) => r.overRating);
    if (hot.length) {
      cautions.push(
        `In the ${name} pad the ${hot.map((r) => `${r.role} resistor (${r.dissipatedW.toFixed(2)} W)`).join(' and ')} would run above the ${ratingW} W rating: use a higher-rated or several parallel resistors, or a ready-made attenuator rated for the power.`,
      );
    }
  }
  return { ok: true, attenuationDb: a, impedanceOhm: z0, pi, t, e24, exact, cautions };
}

export type WantedOutput = { dbm: number } | { mw: number } | { wsprLevelDbm: number };

export type NeededAttenuation = {
  wantedDbm: number;
  /** exact attenuation for the wanted output; ≤ 0 means none is needed */
  neededDb: number;
  /** output with no attenuator */
  withoutDbm: number;
  fixed: { attenuationDb: number; outputDbm: number; outputMw: number }[];
  notes: string[];
};

/**
 * Attenuation between generator and amplifier for a wanted output:
 * output = min(generator − A + gain, saturation) − filter loss, so A = generator + gain − filter loss − wanted.
 */
export function neededAttenuation(input: {
  generatorDbm: number;
  amplifierGainDb?: number;
  amplifierSaturationDbm?: number;
  filterLossDb?: number;
  wanted: WantedOutput;
}): Result<NeededAttenuation> {
  const gain = input.amplifierGainDb ?? 0;
  const loss = input.filterLossDb ?? 0;
  let wantedDbm: number;
  if ('mw' in input.wanted) {
    if (!(input.wanted.mw > 0)) return refuse('The wanted output in mW must be above 0.');
    wantedDbm = mwToDbm(input.wanted.mw);
  } else if ('wsprLevelDbm' in input.wanted) {
    if (!isWsprPowerLevel(input.wanted.wsprLevelDbm))
      return refuse(`${input.wanted.wsprLevelDbm} dBm is not a WSPR level: use 0, 3, 7, 10, 13 … 60 dBm.`);
    wantedDbm = input.wanted.wsprLevelDbm;
  } else wantedDbm = input.wanted.dbm;
  if (!Number.isFinite(wantedDbm)) return refuse('Give the wanted output as a number.');
  const sat = input.amplifierSaturationDbm;
  const notes: string[] = [];
  if (sat !== undefined && wantedDbm + loss > sat) {
    return refuse(
      `The amplifier saturates at ${sat} dBm, so after ${loss} dB of filter loss the output cannot exceed ${(sat - loss).toFixed(1)} dBm; ${wantedDbm.toFixed(1)} dBm needs a bigger amplifier.`,
    );
  }
  const out = (a: number) => Math.min(input.generatorDbm - a + gain, sat ?? Infinity) - loss;
  const withoutDbm = out(0);
  const neededDb = input.generatorDbm + gain - loss - wantedDbm;
  if (neededDb < 0) {
    notes.push(
      `Without any attenuator the output is ${withoutDbm.toFixed(1)} dBm, ${(-neededDb).toFixed(1)} dB short of the wanted ${wantedDbm.toFixed(1)} dBm: raise the drive or the gain instead.`,
    );
  } else if (sat !== undefined && input.generatorDbm + gain > sat) {
    notes.push(
      `Without an attenuator the amplifier would be driven ${(input.generatorDbm + gain - sat).toFixed(1)} dB into saturation, which raises its harmonics: keep the attenuator.`,
    );
  }
  if (sat !== undefined && neededDb >= 0 && sat - (wantedDbm + loss) < 1) {
    notes.push('The wanted output is within 1 dB of saturation: the amplifier runs compressed and its harmonics rise; check them.');
  }
  const candidates = [0, ...COMMON_FIXED_DB];
  const below = [...candidates].reverse().find((a) => a <= neededDb + 1e-9);
  const above = candidates.find((a) => a >= neededDb - 1e-9);
  const fixed = [...new Set([below, above].filter((a): a is number => a !== undefined))].map((a) => ({
    attenuationDb: a,
    outputDbm: out(a),
    outputMw: dbmToMw(out(a)),
  }));
  return { ok: true, wantedDbm, neededDb, withoutDbm, fixed, notes };
}
