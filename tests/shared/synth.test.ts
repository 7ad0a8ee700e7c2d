import { bestRational, encodeDivider, fractionFor, MAX_DENOMINATOR, planSynth } from '@/shared/domain/synth';
import { toneFrequenciesHz } from '@/shared/domain/tones';

describe('encodeDivider', () => {
  // Silicon Labs AN619 formulas P1 = 128a + ⌊128b/c⌋ − 512, P2 = 128b − c⌊128b/c⌋, P3 = c, and its
  // register layout; check values given in the issue: 25 + 493/2500 → 2713/604/2500, bytes 09 C4 00 0A 99 00 02 5C
  it('when the feedback is 25 + 493/2500, gives P1 2713, P2 604, P3 2500 and the published bytes', () => {
    const r = encodeDivider({ a: 25, b: 493, c: 2500 });
    expect([r.p1, r.p2, r.p3]).toEqual([2713, 604, 2500]);
    expect(r.bytes).toEqual([0x09, 0xc4, 0x00, 0x0a, 0x99, 0x00, 0x02, 0x5c]);
  });

  it('when the divider is the integer 36, gives P1 4096, P2 0, P3 1', () => {
    expect(encodeDivider({ a: 36, b: 0, c: 1 })).toMatchObject({ p1: 4096, p2: 0, p3: 1 });
  });

  it('when an output divider uses R = 8, puts log2(R) in bits 6:4 of the third byte', () => {
    expect(encodeDivider({ a: 100, b: 0, c: 1 }, { rDivider: 8 }).bytes[2]).toBe(0x30);
  });
});

describe('bestRational', () => {
  // π's continued-fraction convergents 355/113, 103993/33102 and 104348/33215 (standard results of number theory)
  it.each([
    [Math.PI - 3, 200, 16, 113],
    [Math.PI - 3, 33200, 4687, 33102],
    [Math.PI - 3, 40000, 4703, 33215],
    [493 / 2500, MAX_DENOMINATOR, 493, 2500],
    [0, MAX_DENOMINATOR, 0, 1],
  ])('when approximating %p with denominators up to %i, gives %i/%i', (x, maxDen, num, den) => {
    expect(bestRational(x, maxDen)).toEqual({ num, den });
  });

  it('when the fraction rounds up to one, carries into the integer part', () => {
    expect(fractionFor(35.9999999999999)).toEqual({ a: 36, b: 0, c: 1 });
  });
});

describe('planSynth', () => {
  it.each([
    [25e6, 0, 14_095_600 + 1500],
    [27e6, 0, 7_038_600 + 1500],
    [25e6, 17.5, 28_124_600 + 1500],
    [27e6, -8, 136_000 + 1500],
    [25e6, 3, 144_489_000 + 1500],
  ])(
    'when the reference is %i Hz off by %p ppm and the carrier is %i Hz, plans all four tones within 1 mHz',
    (referenceHz, ppm, carrierHz) => {
      const r = planSynth({ referenceHz, referenceErrorPpm: ppm, targetsHz: toneFrequenciesHz(carrierHz) });
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      expect(r.maxAbsErrorHz).toBeLessThan(1e-3);
      expect(r.outputDivider % 2).toBe(0);
      for (const tone of r.tones) {
        expect(tone.vcoHz).toBeGreaterThanOrEqual(600e6);
        expect(tone.vcoHz).toBeLessThanOrEqual(900e6);
        expect(tone.feedback.c).toBeLessThanOrEqual(MAX_DENOMINATOR);
        expect(tone.registers.bytes).toHaveLength(8);
      }
    },
  );

  it('when the frequency is beyond what the generator reaches, refuses', () => {
    expect(planSynth({ referenceHz: 25e6, targetsHz: [1000] }).ok).toBe(false);
  });
});
