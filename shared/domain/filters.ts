/**
 * Low-pass ladder filters (50 Ω, odd orders, capacitor first: C–L–C…) from
 * the normalised prototype g-values, in closed form (Matthaei, Young & Jones,
 * "Microwave Filters, Impedance-Matching Networks, and Coupling Structures",
 * §4.05):
 *   Butterworth  g_k = 2·sin((2k−1)π / 2n)
 *   Chebyshev    β = ln coth(A_r / 17.37), γ = sinh(β / 2n), a_k = sin((2k−1)π / 2n),
 *                b_k = γ² + sin²(kπ / n), g_1 = 2a_1/γ, g_k = 4a_{k−1}a_k / (b_{k−1}g_{k−1})
 * Scaled to cutoff f_c and resistance R: C = g / (2π f_c R), L = g·R / (2π f_c).
 * Toroid turns from the iron-powder inductance index A_L (µH per 100 turns):
 * N = 100·√(L_µH / A_L).
 */
import { refuse, type Result } from './result';

export type FilterKind = 'butterworth' | 'chebyshev-0.1' | 'chebyshev-0.5';
export type FilterOrder = 3 | 5 | 7;
export const FILTER_KINDS: readonly FilterKind[] = ['butterworth', 'chebyshev-0.1', 'chebyshev-0.5'];

const rippleDb = (kind: FilterKind): number => (kind === 'chebyshev-0.1' ? 0.1 : kind === 'chebyshev-0.5' ? 0.5 : 0);

export function prototypeValues(kind: FilterKind, order: number): number[] {
  const a = (k: number): number => Math.sin(((2 * k - 1) * Math.PI) / (2 * order));
  if (kind === 'butterworth') return Array.from({ length: order }, (_, i) => 2 * a(i + 1));
  // 17.37 in the handbook formula is 40·log10(e); the exact value keeps 4-decimal agreement with the tables
  const beta = Math.log(1 / Math.tanh(rippleDb(kind) / (40 / Math.LN10)));
  const gamma = Math.sinh(beta / (2 * order));
  const b = (k: number): number => gamma ** 2 + Math.sin((k * Math.PI) / order) ** 2;
  const g = [(2 * a(1)) / gamma];
  for (let k = 2; k <= order; k++) g.push((4 * a(k - 1) * a(k)) / (b(k - 1) * g[k - 2]));
  return g;
}

/** Insertion loss of the ideal (lossless) prototype at a frequency. */
export function attenuationDb(kind: FilterKind, order: number, cutoffHz: number, frequencyHz: number): number {
  const w = frequencyHz / cutoffHz;
  if (kind === 'butterworth') return 10 * Math.log10(1 + w ** (2 * order));
  const eps2 = 10 ** (rippleDb(kind) / 10) - 1;
  const t = w <= 1 ? Math.cos(order * Math.acos(w)) : Math.cosh(order * Math.acosh(w));
  return 10 * Math.log10(1 + eps2 * t * t);
}

/** Common iron-powder toroids: A_L in µH per 100 turns (Amidon/Micrometals iron-powder data; values recalled, not re-measured). */
export const TOROIDS: Record<string, { alUhPer100Turns: number; source: string }> = {
  'T-37-2': { alUhPer100Turns: 40, source: "iron-powder core maker's A_L table (typical value)" },
  'T-37-6': { alUhPer100Turns: 30, source: "iron-powder core maker's A_L table (typical value)" },
  'T-50-2': { alUhPer100Turns: 49, source: "iron-powder core maker's A_L table (typical value)" },
  'T-50-6': { alUhPer100Turns: 40, source: "iron-powder core maker's A_L table (typical value)" },
  'T-68-2': { alUhPer100Turns: 57, source: "iron-powder core maker's A_L table (typical value)" },
  'T-68-6': { alUhPer100Turns: 47, source: "iron-powder core maker's A_L table (typical value)" },
};

export type Winding = { core: string; turns: number; inductanceH: number; errorPercent: number };

/** Whole turns on a core nearest to an inductance, and the inductance they give. */
export function toroidTurns(inductanceH: number, core: string): Result<{ winding: Winding }> {
  const entry = TOROIDS[core.toUpperCase()];
  if (!entry) return refuse(`Unknown core '${core}': use one of ${Object.keys(TOROIDS).join(', ')}.`);
  const uh = inductanceH * 1e6;
  const turns = Math.max(1, Math.round(100 * Math.sqrt(uh / entry.alUhPer100Turns)));
  const got = entry.alUhPer100Turns * (turns / 100) ** 2 * 1e-6;
  return {
    ok: true,
    winding: { core: core.toUpperCase(), turns, inductanceH: got, errorPercent: ((got - inductanceH) / inductanceH) * 100 },
  };
}

export type FilterElement = { position: number; kind: 'C' | 'L'; g: number; value: number; unit: 'F' | 'H'; winding?: Winding };

export type FilterDesign = {
  kind: FilterKind;
  order: FilterOrder;
  cutoffHz: number;
  impedanceOhm: number;
  elements: FilterElement[];
  /** attenuation of the ideal filter at the given frequencies */
  attenuation: { frequencyHz: number; attenuationDb: number }[];
};

export function designLowPass(input: {
  kind: FilterKind;
  order: number;
  cutoffHz: number;
  impedanceOhm?: number;
  core?: string;
  /** frequencies to report the attenuation at, e.g. the harmonics */
  atFrequenciesHz?: readonly number[];
}): Result<{ design: FilterDesign }> {
  if (!FILTER_KINDS.includes(input.kind)) return refuse(`Filter kind must be one of ${FILTER_KINDS.join(', ')}.`);
  if (input.order !== 3 && input.order !== 5 && input.order !== 7) return refuse('Filter order must be 3, 5 or 7.');
  if (!(input.cutoffHz > 0)) return refuse('The cutoff frequency must be positive.');
  if (input.core !== undefined && !TOROIDS[input.core.toUpperCase()]) {
    return refuse(`Unknown core '${input.core}': use one of ${Object.keys(TOROIDS).join(', ')}.`);
  }
  const r = input.impedanceOhm ?? 50;
  const w = 2 * Math.PI * input.cutoffHz;
  const elements = prototypeValues(input.kind, input.order).map((g, i): FilterElement => {
    if (i % 2 === 0) return { position: i + 1, kind: 'C', g, value: g / (w * r), unit: 'F' };
    const value = (g * r) / w;
    const wound = input.core ? toroidTurns(value, input.core) : undefined;
    return { position: i + 1, kind: 'L', g, value, unit: 'H', ...(wound?.ok ? { winding: wound.winding } : {}) };
  });
  return {
    ok: true,
    design: {
      kind: input.kind,
      order: input.order,
      cutoffHz: input.cutoffHz,
      impedanceOhm: r,
      elements,
      attenuation: (input.atFrequenciesHz ?? []).map((f) => ({
        frequencyHz: f,
        attenuationDb: attenuationDb(input.kind, input.order, input.cutoffHz, f),
      })),
    },
  };
}
