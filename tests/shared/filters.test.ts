import { attenuationDb, designLowPass, prototypeValues, toroidTurns } from '@/shared/domain/filters';

// Low-pass prototype element values, 4 decimals: Matthaei, Young & Jones, "Microwave Filters,
// Impedance-Matching Networks, and Coupling Structures", Tables 4.05-1 and 4.05-2 (as reprinted in
// Pozar, "Microwave Engineering", Tables 8.3/8.4). Values from memory, cross-checked against the same
// tables reproduced in public filter-design code. The 0.1 dB n = 5 middle value is printed as 1.9750
// (some reprints 1.9755); reprints differ by up to 2·10⁻⁴ in the last place (the tables were computed
// with limited precision), so the check allows 5·10⁻⁴.
describe('prototypeValues', () => {
  it.each([
    ['butterworth', 3, [1, 2, 1]],
    ['butterworth', 5, [0.618, 1.618, 2, 1.618, 0.618]],
    ['butterworth', 7, [0.445, 1.247, 1.8019, 2, 1.8019, 1.247, 0.445]],
    ['chebyshev-0.1', 3, [1.0316, 1.1474, 1.0316]],
    ['chebyshev-0.1', 5, [1.1468, 1.3712, 1.975, 1.3712, 1.1468]],
    ['chebyshev-0.1', 7, [1.1812, 1.4228, 2.0967, 1.5734, 2.0967, 1.4228, 1.1812]],
    ['chebyshev-0.5', 3, [1.5963, 1.0967, 1.5963]],
    ['chebyshev-0.5', 5, [1.7058, 1.2296, 2.5408, 1.2296, 1.7058]],
    ['chebyshev-0.5', 7, [1.7372, 1.2583, 2.6381, 1.3444, 2.6381, 1.2583, 1.7372]],
  ] as const)('when the filter is %s of order %i, matches the published g-values', (kind, order, table) => {
    prototypeValues(kind, order).forEach((g, i) => expect(Math.abs(g - table[i])).toBeLessThan(5e-4));
  });
});

describe('attenuationDb', () => {
  it.each([
    // Butterworth: 3.01 dB at cutoff, 10·log10(1 + 2^10) = 30.10 dB an octave up for n = 5
    ['butterworth', 5, 1, 3.0103],
    ['butterworth', 5, 2, 30.1072],
    // Chebyshev: the ripple value at cutoff (equal-ripple definition)
    ['chebyshev-0.5', 5, 1, 0.5],
  ] as const)('when a %s filter of order %i is at %p × cutoff, attenuates %p dB', (kind, order, ratio, db) => {
    expect(attenuationDb(kind, order, 10e6, ratio * 10e6)).toBeCloseTo(db, 3);
  });
});

describe('designLowPass', () => {
  // Chebyshev 0.5 dB, 30 MHz, 50 Ω pi-network values published in alanmimms/nexrig hw/NOTES.md
  it.each([
    [3, [169.4e-12, 290.9e-9, 169.4e-12]],
    [5, [181.0e-12, 326.2e-9, 269.6e-12, 326.2e-9, 181.0e-12]],
  ])('when designing order %i at 30 MHz, gives the published element values', (order, values) => {
    const r = designLowPass({ kind: 'chebyshev-0.5', order, cutoffHz: 30e6 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    r.design.elements.forEach((e, i) => expect(e.value / values[i]).toBeCloseTo(1, 3));
    expect(r.design.elements.map((e) => e.kind)).toEqual(values.map((_, i) => (i % 2 === 0 ? 'C' : 'L')));
  });

  it('when a core is given, winds each inductor on it', () => {
    const r = designLowPass({ kind: 'chebyshev-0.5', order: 5, cutoffHz: 8e6, core: 'T-50-2', atFrequenciesHz: [21.1e6] });
    expect(r.ok && r.design.elements.filter((e) => e.kind === 'L').every((e) => e.winding && e.winding.turns > 0)).toBe(true);
    expect(r.ok && r.design.attenuation[0].attenuationDb).toBeGreaterThan(33.46);
  });

  it.each([
    [{ kind: 'butterworth', order: 4, cutoffHz: 8e6 }, /3, 5 or 7/],
    [{ kind: 'elliptic', order: 5, cutoffHz: 8e6 }, /kind/],
    [{ kind: 'butterworth', order: 5, cutoffHz: 8e6, core: 'T-99-9' }, /Unknown core/],
  ] as const)('when given %j, refuses', (input, reason) => {
    const r = designLowPass(input as never);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });
});

describe('toroidTurns', () => {
  // N = 100·√(L_µH / A_L), A_L in µH per 100 turns; A_L values from Amidon iron-powder data (from memory),
  // T-50-6 = 40 cross-checked in a public component library
  it.each([
    [1e-6, 'T-50-2', 14],
    [1e-6, 'T-37-2', 16],
    [2.2e-6, 'T-50-6', 23],
    [0.33e-6, 'T-68-2', 8],
  ])('when winding %p H on %s, needs %i turns', (l, core, turns) => {
    expect(toroidTurns(l, core)).toMatchObject({ ok: true, winding: { turns } });
  });
});
