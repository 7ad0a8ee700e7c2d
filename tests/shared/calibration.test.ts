import {
  commandForBand,
  ppmFromMeasurement,
  predictOffsets,
  producedFrequencyHz,
  thermalDriftHz,
  uncorrectedTonesCheck,
} from '@/shared/domain/calibration';

// Arithmetic from the definition of ppm (parts per million); the 7 and 28 MHz figures are the team's
// TRADE.md examples (10 ppm is 70 Hz at 7 MHz, 280 Hz at 28 MHz) — common practice, no source.
describe('predictOffsets', () => {
  it('when a unit measured 10 ppm fast at 7 MHz, predicts 280 Hz at 28 MHz', () => {
    const r = predictOffsets({ commandedHz: 7_000_000, observedHz: 7_000_070 }, [
      { id: '40m', frequencyHz: 7_000_000 },
      { id: '10m', frequencyHz: 28_000_000 },
    ]);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.referenceErrorPpm).toBeCloseTo(10, 9);
    expect(r.offsets.map((o) => o.offsetHz)).toEqual([expect.closeTo(70, 6), expect.closeTo(280, 6)]);
  });
});

describe('ppmFromMeasurement', () => {
  it.each([
    [10_000_000, 9_999_900, -10],
    [14_097_100, 14_097_100, 0],
  ])('when commanded %i Hz came out at %i Hz, the reference error is %i ppm', (commandedHz, observedHz, ppm) => {
    expect(ppmFromMeasurement({ commandedHz, observedHz })).toMatchObject({ ok: true, referenceErrorPpm: expect.closeTo(ppm, 9) });
  });

  it('when the measurement is not positive, refuses', () => {
    expect(ppmFromMeasurement({ commandedHz: 0, observedHz: 1 }).ok).toBe(false);
  });
});

describe('commandForBand', () => {
  it('when the reference runs 10 ppm fast, commands frequencies the error brings back onto the tones', () => {
    const calibration = { referenceErrorPpm: 10, bandOffsetHz: 2 };
    const cmd = commandForBand(28_124_600, 1500, calibration);
    cmd.commandTonesHz.forEach((f, k) => expect(producedFrequencyHz(f, calibration)).toBeCloseTo(cmd.tonesHz[k], 6));
    expect(cmd.correctionHz).toBeCloseTo(-283.26, 1);
    expect(cmd.window.inside).toBe(true);
  });

  it('when the same unit is left uncorrected on 10 m, its tones miss the window', () => {
    expect(uncorrectedTonesCheck(28_124_600, 1500, { referenceErrorPpm: 10 }).inside).toBe(false);
  });
});

describe('thermalDriftHz', () => {
  it('when a 1 ppm/°C crystal warms by 5 °C at 14 MHz, drifts 70 Hz', () => {
    expect(thermalDriftHz(14_000_000, 1, 5)).toBeCloseTo(70, 9);
  });
});
