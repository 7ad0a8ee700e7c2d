import { designPad, nearestE24, neededAttenuation, piPad, tPad } from '@/shared/domain/bench';

// Matched 50 Ω pads: the standard resistive-attenuator table for 50 Ω (as printed in the ARRL Handbook's
// "resistive attenuators" table; values from memory, to 0.1 Ω).
describe('piPad and tPad', () => {
  it.each([
    [3, 292.4, 17.6, 8.5, 141.9],
    [6, 150.5, 37.4, 16.6, 66.9],
    [10, 96.2, 71.2, 26.0, 35.1],
    [20, 61.1, 247.5, 40.9, 10.1],
  ])('when the attenuation is %i dB at 50 Ω, gives the table’s pi %p/%p Ω and T %p/%p Ω', (db, piShunt, piSeries, tSeries, tShunt) => {
    const pi = piPad(db);
    const t = tPad(db);
    expect(Math.abs(pi.shuntOhm - piShunt)).toBeLessThan(0.06);
    expect(Math.abs(pi.seriesOhm - piSeries)).toBeLessThan(0.06);
    expect(Math.abs(t.seriesOhm - tSeries)).toBeLessThan(0.06);
    expect(Math.abs(t.shuntOhm - tShunt)).toBeLessThan(0.06);
  });

  it('when the impedance is 75 Ω, scales every resistor by 75/50 (the formulas are linear in Z0)', () => {
    expect(piPad(10, 75).shuntOhm).toBeCloseTo((96.2475 * 75) / 50, 3);
    expect(tPad(10, 75).seriesOhm).toBeCloseTo((25.9747 * 75) / 50, 3);
  });
});

describe('nearestE24', () => {
  // IEC 60063 E24 series: … 91, 100 …; 68, 75 …; 240, 270 …
  it.each([
    [96.25, 100],
    [71.15, 68],
    [25.97, 27],
    [35.14, 36],
    [247.5, 240],
    [9.6, 10],
    [0.96, 1],
  ])('when the exact value is %p Ω, picks %p Ω', (ohm, e24) => {
    expect(nearestE24(ohm)).toBe(e24);
  });
});

/** Insertion loss and input impedance by the ABCD-matrix method (Pozar, Microwave Engineering, Table 4.2: S21 = 2/(A + B/Z0 + C·Z0 + D)). */
function abcdCheck(elements: { series?: number; shunt?: number }[], z0: number) {
  let [a, b, c, d] = [1, 0, 0, 1];
  for (const e of elements) {
    const [ea, eb, ec, ed] = e.series !== undefined ? [1, e.series, 0, 1] : [1, 0, 1 / e.shunt!, 1];
    [a, b, c, d] = [a * ea + b * ec, a * eb + b * ed, c * ea + d * ec, c * eb + d * ed];
  }
  return { lossDb: 20 * Math.log10(Math.abs(a + b / z0 + c * z0 + d) / 2), inputOhm: (a * z0 + b) / (c * z0 + d) };
}

describe('designPad', () => {
  it('when 10 dB is built from E24 parts, reports what those parts really give (checked by the ABCD-matrix method)', () => {
    const r = designPad({ attenuationDb: 10 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.e24.pi).toMatchObject({ shuntOhm: 100, seriesOhm: 68 });
    const pi = abcdCheck([{ shunt: 100 }, { series: 68 }, { shunt: 100 }], 50);
    expect(r.e24.pi.attenuationDb).toBeCloseTo(pi.lossDb, 6);
    expect(r.e24.pi.inputOhm).toBeCloseTo(pi.inputOhm, 6);
    const t = abcdCheck([{ series: 27 }, { shunt: 36 }, { series: 27 }], 50);
    expect(r.e24.t.attenuationDb).toBeCloseTo(t.lossDb, 6);
    expect(r.e24.t.inputOhm).toBeCloseTo(t.inputOhm, 6);
    // return loss from the reflection coefficient Γ = (Zin − Z0)/(Zin + Z0)
    expect(r.e24.pi.returnLossDb).toBeCloseTo(-20 * Math.log10(Math.abs((pi.inputOhm - 50) / (pi.inputOhm + 50))), 6);
  });

  it('when 1 W goes into an exact 10 dB pi pad, the resistors share the 0.9 W not delivered and the input shunt runs hot', () => {
    // matched input: Vin = √(1 W · 50 Ω); input shunt Vin²/96.25 = 0.519 W; load gets 0.1 W, so 0.9 W is heat (energy conservation)
    const r = designPad({ attenuationDb: 10, inputW: 1 });
    if (!r.ok) throw new Error(r.reason);
    const heat = r.exact.pi.resistors.map((x) => x.dissipatedW);
    expect(heat[0]).toBeCloseTo(50 / 96.2475, 4);
    expect(heat[2]).toBeCloseTo(5 / 96.2475, 4);
    expect(heat.reduce((s, w) => s + w, 0)).toBeCloseTo(0.9, 6);
    expect(r.e24.pi.resistors[0].overRating).toBe(true);
    expect(r.cautions.join(' ')).toMatch(/above the 0.25 W rating/);
  });

  it('when 10 mW goes in, nothing is above a quarter-watt rating and no caution is given', () => {
    const r = designPad({ attenuationDb: 6, inputW: 0.01 });
    expect(r.ok && r.cautions).toEqual([]);
  });

  it.each([0, -3, 61])('when the attenuation is %p dB, refuses', (db) => {
    expect(designPad({ attenuationDb: db }).ok).toBe(false);
  });
});

describe('neededAttenuation', () => {
  // output = min(generator − A + gain, saturation) − filter loss (TRADE.md power chain); 10 + 20 − 0.5 − 23 = 6.5 dB
  it('when a 10 dBm generator drives a 20 dB amplifier for a 23 dBm WSPR level, needs 6.5 dB and offers 6 and 10 dB parts', () => {
    const r = neededAttenuation({
      generatorDbm: 10,
      amplifierGainDb: 20,
      amplifierSaturationDbm: 33,
      filterLossDb: 0.5,
      wanted: { wsprLevelDbm: 23 },
    });
    expect(r).toMatchObject({ ok: true, neededDb: 6.5, withoutDbm: 29.5 });
    if (r.ok)
      expect(r.fixed.map((f) => [f.attenuationDb, f.outputDbm])).toEqual([
        [6, 23.5],
        [10, 19.5],
      ]);
  });

  it('when the output is given in mW, converts it with dBm = 10·log10(mW): 200 mW is 23.01 dBm', () => {
    const r = neededAttenuation({ generatorDbm: 10, amplifierGainDb: 20, wanted: { mw: 200 } });
    expect(r.ok && r.neededDb).toBeCloseTo(30 - 10 * Math.log10(200), 9);
  });

  it('when the wanted output is above saturation, refuses; when the drive is too low, says so', () => {
    expect(neededAttenuation({ generatorDbm: 10, amplifierGainDb: 20, amplifierSaturationDbm: 27, wanted: { dbm: 30 } }).ok).toBe(false);
    const low = neededAttenuation({ generatorDbm: 0, wanted: { dbm: 10 } });
    expect(low.ok && low.notes.join()).toMatch(/short of the wanted/);
    expect(neededAttenuation({ generatorDbm: 10, wanted: { wsprLevelDbm: 22 } }).ok).toBe(false);
  });
});
