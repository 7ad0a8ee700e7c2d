/**
 * Divider plans for a fractional-N PLL clock generator of the kind described
 * in Silicon Labs AN619 (25 or 27 MHz reference, VCO 600–900 MHz, PLL
 * feedback a + b/c with c ≤ 1 048 575, output divider, R divider 1…128).
 * Sub-hertz tone steps: the output divider is a fixed even integer and each
 * tone moves the PLL fraction, chosen as the best rational approximation.
 */
import { refuse, type Result } from './result';

export const MAX_DENOMINATOR = 1_048_575;
export const VCO_MIN_HZ = 600e6;
export const VCO_MAX_HZ = 900e6;
/** PLL feedback range a + b/c, both ends included (AN619: "a + b/c … valid range 15 to 90"). */
export const FEEDBACK_MIN = 15;
export const FEEDBACK_MAX = 90;
const R_DIVIDERS = [1, 2, 4, 8, 16, 32, 64, 128];
/** Output divider: 4, 6, or 8 … 2048 (AN619); plans use even integers only. */
const OUTPUT_DIVIDER_MAX = 2048;
/** Highest output: the clock chip's data sheet (Si5351A/B/C-B, revision 1.0 and later) gives 200 MHz. */
export const OUTPUT_MAX_HZ = 200e6;
/** Lowest output these dividers reach: the VCO's floor over the largest output and R dividers (≈ 2289 Hz). */
export const OUTPUT_MIN_HZ = VCO_MIN_HZ / (OUTPUT_DIVIDER_MAX * R_DIVIDERS[R_DIVIDERS.length - 1]);

/** Whether a + b/c lies within AN619's feedback range 15 … 90 (90 + 0/1 included). */
export function feedbackInRange(fraction: Fraction): boolean {
  const ratio = fraction.a + fraction.b / fraction.c;
  return ratio >= FEEDBACK_MIN && ratio <= FEEDBACK_MAX;
}

export type Fraction = { a: number; b: number; c: number };

export type DividerRegisters = {
  p1: number;
  p2: number;
  p3: number;
  /** the eight parameter bytes in register order (AN619 MSNA 26–33, MS0 42–49) */
  bytes: number[];
};

/**
 * AN619 parameters: P1 = 128·a + ⌊128·b/c⌋ − 512, P2 = 128·b − c·⌊128·b/c⌋, P3 = c.
 * For an output divider, `rDivider` (1…128) and divide-by-4 go into the third byte.
 */
export function encodeDivider(fraction: Fraction, options: { rDivider?: number; divideBy4?: boolean } = {}): DividerRegisters {
  const { a, b, c } = fraction;
  let p1: number;
  let p2: number;
  let p3: number;
  if (options.divideBy4) {
    p1 = 0;
    p2 = 0;
    p3 = 1;
  } else {
    const f = Math.floor((128 * b) / c);
    p1 = 128 * a + f - 512;
    p2 = 128 * b - c * f;
    p3 = c;
  }
  const rBits = Math.log2(options.rDivider ?? 1) & 0x7;
  const byte2 = (rBits << 4) | (options.divideBy4 ? 0x0c : 0) | ((p1 >>> 16) & 0x03);
  const bytes = [
    (p3 >>> 8) & 0xff,
    p3 & 0xff,
    byte2,
    (p1 >>> 8) & 0xff,
    p1 & 0xff,
    (((p3 >>> 16) & 0x0f) << 4) | ((p2 >>> 16) & 0x0f),
    (p2 >>> 8) & 0xff,
    p2 & 0xff,
  ];
  return { p1, p2, p3, bytes };
}

/** Best rational approximation num/den of x in [0, 1) with den ≤ maxDen (continued fractions with semiconvergents). */
export function bestRational(x: number, maxDen: number = MAX_DENOMINATOR): { num: number; den: number } {
  let p0 = 0,
    q0 = 1,
    p1 = 1,
    q1 = 0;
  let v = x;
  for (let i = 0; i < 64; i++) {
    const ai = Math.floor(v);
    const p2 = ai * p1 + p0;
    const q2 = ai * q1 + q0;
    if (q2 > maxDen) {
      const k = Math.floor((maxDen - q0) / q1);
      const ps = k * p1 + p0;
      const qs = k * q1 + q0;
      return Math.abs(ps / qs - x) < Math.abs(p1 / q1 - x) ? { num: ps, den: qs } : { num: p1, den: q1 };
    }
    p0 = p1;
    q0 = q1;
    p1 = p2;
    q1 = q2;
    const rest = v - ai;
    if (rest < 1e-18 || Math.abs(p1 / q1 - x) < 1e-17) break;
    v = 1 / rest;
  }
  return { num: p1, den: q1 };
}

/** a + b/c nearest to a real ratio, with b < c ≤ maxDen. */
export function fractionFor(ratio: number, maxDen: number = MAX_DENOMINATOR): Fraction {
  let a = Math.floor(ratio);
  let { num: b, den: c } = bestRational(ratio - a, maxDen);
  if (b >= c) {
    a += 1;
    b = 0;
    c = 1;
  }
  return { a, b, c };
}

export type SynthInput = {
  /** nominal reference, 25e6 or 27e6 */
  referenceHz: number;
  /** known reference error; the plan compensates for it */
  referenceErrorPpm?: number;
  /** frequencies to produce (the four tones) */
  targetsHz: readonly number[];
};

export type TonePlan = {
  targetHz: number;
  feedback: Fraction;
  vcoHz: number;
  producedHz: number;
  errorHz: number;
  registers: DividerRegisters;
};

export type SynthPlan = {
  referenceHz: number;
  /** the reference as it really runs: nominal · (1 + ppm·10⁻⁶) */
  actualReferenceHz: number;
  outputDivider: number;
  rDivider: number;
  outputRegisters: DividerRegisters;
  tones: TonePlan[];
  maxAbsErrorHz: number;
};

function chooseDividers(lowestHz: number, highestHz: number): { d: number; r: number } | null {
  for (const r of R_DIVIDERS) {
    const dMin = Math.ceil(VCO_MIN_HZ / (lowestHz * r));
    const dMax = Math.floor(VCO_MAX_HZ / (highestHz * r));
    for (let d = Math.max(4, dMin + (dMin % 2)); d <= Math.min(dMax, OUTPUT_DIVIDER_MAX); d += 2) {
      if (d === 4 || d === 6 || d >= 8) return { d, r };
    }
  }
  return null;
}

/** One integer output divider for all targets and a PLL fraction per target. */
export function planSynth(input: SynthInput): Result<SynthPlan> {
  if (input.targetsHz.length === 0) return refuse('Give at least one frequency to produce.');
  if (!(input.referenceHz > 0)) return refuse('The reference frequency must be positive.');
  const actualReferenceHz = input.referenceHz * (1 + (input.referenceErrorPpm ?? 0) * 1e-6);
  const lowest = Math.min(...input.targetsHz);
  const highest = Math.max(...input.targetsHz);
  if (!(lowest > 0)) return refuse('Frequencies to produce must be positive.');
  const reach = `this generator reaches ${OUTPUT_MIN_HZ.toFixed(0)} Hz to ${OUTPUT_MAX_HZ / 1e6} MHz`;
  if (highest > OUTPUT_MAX_HZ) return refuse(`${highest.toFixed(0)} Hz is above the clock chip's 200 MHz output limit (${reach}).`);
  const dividers = chooseDividers(lowest, highest);
  if (!dividers) {
    return refuse(`No divider pair keeps the VCO within 600–900 MHz for ${lowest.toFixed(0)}–${highest.toFixed(0)} Hz (${reach}).`);
  }
  const { d, r } = dividers;
  const tones: TonePlan[] = [];
  for (const targetHz of input.targetsHz) {
    const feedback = fractionFor((targetHz * r * d) / actualReferenceHz);
    if (!feedbackInRange(feedback)) {
      const ratio = feedback.a + feedback.b / feedback.c;
      return refuse(
        `PLL feedback ${ratio.toFixed(6)} is ${ratio < FEEDBACK_MIN ? 'below' : 'above'} the allowed ${FEEDBACK_MIN}–${FEEDBACK_MAX} for ${targetHz} Hz: use a reference between 10 and 40 MHz.`,
      );
    }
    const vcoHz = actualReferenceHz * (feedback.a + feedback.b / feedback.c);
    const producedHz = vcoHz / (d * r);
    tones.push({ targetHz, feedback, vcoHz, producedHz, errorHz: producedHz - targetHz, registers: encodeDivider(feedback) });
  }
  return {
    ok: true,
    referenceHz: input.referenceHz,
    actualReferenceHz,
    outputDivider: d,
    rDivider: r,
    outputRegisters: encodeDivider({ a: d, b: 0, c: 1 }, { rDivider: r, divideBy4: d === 4 }),
    tones,
    maxAbsErrorHz: Math.max(...tones.map((t) => Math.abs(t.errorHz))),
  };
}
