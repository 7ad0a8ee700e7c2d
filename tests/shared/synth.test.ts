import { bestRational, encodeDivider, feedbackInRange, fractionFor, MAX_DENOMINATOR, planSynth } from '@/shared/domain/synth';
import { toneFrequenciesHz } from '@/shared/domain/tones';

describe('encodeDivider', () => {
  // Silicon Labs AN619 ("Manually Generating an Si5351 Register Map"), section 3.2: P1 = 128a + ⌊128b/c⌋ − 512,
  // P2 = 128b − c⌊128b/c⌋, P3 = c, and its register layout (MSNA registers 26–33). Worked by hand from those
  // formulas: 25 + 493/2500 → P1 = 3200 + 25 − 512 = 2713, P2 = 63104 − 62500 = 604, P3 = 2500,
  // bytes P3[15:8] P3[7:0] P1[17:16] P1[15:8] P1[7:0] P3[19:16]|P2[19:16] P2[15:8] P2[7:0] = 09 C4 00 0A 99 00 02 5C
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

  // Si5351A/B/C-B data sheet, revision 1.0 and later: outputs up to 200 MHz (earlier revisions said more).
  it('when asked for more than 200 MHz, refuses and names the 200 MHz limit', () => {
    expect(planSynth({ referenceHz: 25e6, targetsHz: [200e6] }).ok).toBe(true);
    const r = planSynth({ referenceHz: 25e6, targetsHz: [210e6] });
    expect(r).toMatchObject({ ok: false, reason: expect.stringMatching(/200 MHz/) });
  });

  // AN619: VCO 600 MHz minimum, output divider up to 2048, R divider up to 128, so the floor is
  // 600e6 / (2048 · 128) ≈ 2288.8 Hz (arithmetic from AN619's ranges).
  it('when asked for 2.3 kHz, plans it, and below the floor the refusal gives the true 2289 Hz', () => {
    const r = planSynth({ referenceHz: 25e6, targetsHz: [2300] });
    expect(r).toMatchObject({ ok: true, rDivider: 128 });
    const low = planSynth({ referenceHz: 25e6, targetsHz: [2000] });
    expect(low.ok).toBe(false);
    if (!low.ok) {
      expect(low.reason).toContain('2289 Hz');
      expect(low.reason).not.toContain('4.6 kHz');
    }
  });

  // AN619: "a + b/c … valid range 15 to 90"; 8 MHz × 90 = 720 MHz (inside the VCO range) ÷ 4 = 180 MHz
  it('when the feedback ratio is exactly 90, accepts it; just above 90 is refused', () => {
    const r = planSynth({ referenceHz: 8e6, targetsHz: [180e6] });
    expect(r).toMatchObject({ ok: true, outputDivider: 4 });
    if (r.ok) expect(r.tones[0].feedback).toEqual({ a: 90, b: 0, c: 1 });
    expect(feedbackInRange({ a: 90, b: 0, c: 1 })).toBe(true);
    expect(feedbackInRange({ a: 90, b: 1, c: 1000 })).toBe(false);
    expect(feedbackInRange({ a: 15, b: 0, c: 1 })).toBe(true);
    expect(feedbackInRange({ a: 14, b: 999, c: 1000 })).toBe(false);
  });
});
