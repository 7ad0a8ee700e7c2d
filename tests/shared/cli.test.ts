import { execFile } from 'node:child_process';
import path from 'node:path';
import { vincentyInverse } from './fixtures/vincenty';
import { workedExample } from './fixtures/wspr-vectors';

const BIN = path.join(__dirname, '..', '..', 'server', 'cli', 'bin.js');

type Run = { code: number; stdout: string; stderr: string };

function run(...args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { timeout: 60_000 }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : 1) : 0;
      resolve({ code, stdout: String(stdout), stderr: String(stderr) });
    });
  });
}

const lines = (r: Run): unknown[] =>
  r.stdout
    .trim()
    .split('\n')
    .map((l) => JSON.parse(l));

describe('faintline command', () => {
  it('when asked for help, lists the commands and exits 0', async () => {
    const r = await run('--help');
    expect(r.code).toBe(0);
    for (const command of ['encode', 'messages', 'locator', 'path', 'tones', 'synth', 'power', 'filter', 'pad', 'supply', 'exposure']) {
      expect(r.stdout).toContain(command);
    }
  });

  it('when encoding the protocol description’s worked example, prints its published symbols', async () => {
    const r = await run('encode', 'K1ABC FN42 37', 'PJ4/K1ABC 37', '<PJ4/K1ABC> FK52UD 37');
    expect(r.code).toBe(0);
    const [first, second, third] = lines(r) as { message: string; type: number; symbols: number[] }[];
    expect(first).toMatchObject({ message: 'K1ABC FN42 37', type: 1, symbols: workedExample.symbols });
    expect([second.type, third.type]).toEqual([2, 3]);
    expect(third.symbols).toHaveLength(162);
  });

  it('when planning messages for a compound callsign, prints the Type 2 and Type 3 texts', async () => {
    const r = await run('messages', '--callsign', 'PJ4/K1ABC', '--locator', 'FK52UD', '--power', '37');
    expect(r.code).toBe(0);
    expect(lines(r)[0]).toMatchObject({ messages: ['PJ4/K1ABC 37', '<PJ4/K1ABC> FK52UD 37'], types: [2, 3] });
  });

  it('when converting between locator and position, prints both ways', async () => {
    // E. T. Tyson, QST January 1989: Munich 48.14666 N, 11.60833 E is JN58td
    const [to, from] = await Promise.all([run('locator', '--lat=48.14666', '--lon=11.60833', '--precision=6'), run('locator', 'JN58td')]);
    expect(lines(to)[0]).toEqual({ locator: 'JN58td' });
    expect(lines(from)[0]).toMatchObject({ locator: 'JN58td', lat: expect.closeTo(48.1458, 3), lon: expect.closeTo(11.625, 3) });
  });

  it('when measuring a path, prints distance and bearing', async () => {
    const r = await run('path', 'FN31pr', 'JN58td');
    expect(r.code).toBe(0);
    // centres 41°43.75′N 72°42.5′W and 48°8.75′N 11°37.5′E (Maidenhead definition); distance and bearing from an
    // independent Vincenty (1975) inverse on WGS84, tests/shared/fixtures/vincenty.ts
    const check = vincentyInverse(41 + 43.75 / 60, -(72 + 42.5 / 60), 48 + 8.75 / 60, 11 + 37.5 / 60);
    expect(lines(r)[0]).toEqual({ distanceKm: expect.closeTo(check.distanceKm, 5), bearingDeg: expect.closeTo(check.bearingDeg, 6) });
  });

  it.each([
    // a position just west of the prime meridian is in field I, square 9 (Maidenhead definition, Tyson, QST January 1989)
    [['locator', '--lat', '10', '--lon=-1e-8', '--precision', '4'], 'IK90'],
    [['locator', '--lat', '0', '--lon=-1e-10', '--precision', '6'], 'IJ90xa'],
  ])('when the position %j sits just below a boundary, prints %s', async (args, locator) => {
    const r = await run(...args);
    expect(r.code).toBe(0);
    expect(lines(r)[0]).toEqual({ locator });
  });

  it('when planning with a power that is not a WSPR level, says which level the messages report', async () => {
    const r = await run(
      'plan',
      '--callsign',
      'Q1IMW',
      '--locator',
      'IO91',
      '--power',
      '22',
      '--band',
      '20m',
      '--from',
      '2026-12-02T00:00Z',
      '--hours',
      '1',
      '--every',
      '5',
    );
    expect(r.code).toBe(0);
    // WSPR protocol description: power levels end in 0, 3 or 7; 22 dBm rounds to 23
    expect(r.stderr).toMatch(/22 dBm is not a WSPR level; the messages report 23 dBm/);
    expect((lines(r)[0] as { messageText: string }).messageText).toBe('Q1IMW IO91 23');
  });

  it.each(['61', '-30'])('when planning with --power %s, refuses with a non-zero exit instead of clamping', async (power) => {
    const r = await run(
      'plan',
      '--callsign',
      'Q1IMW',
      '--locator',
      'IO91',
      `--power=${power}`,
      '--band',
      '20m',
      '--from',
      '2026-12-02T00:00Z',
    );
    expect(r.code).not.toBe(0);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/0 to 60 dBm/);
  });

  it('when designing a filter, judges it by the region’s rule at the real carrier', async () => {
    const [us, itu] = await Promise.all([
      run('filter', '--band', '40m', '--region', 'itu2', '--power', '23'),
      run('filter', '--band', '40m', '--region', 'itu1', '--power', '23'),
    ]);
    const a = lines(us)[0] as { carrierHz: number; limit: { limitDb: number; source: string } };
    const b = lines(itu)[0] as { carrierHz: number; limit: { limitDb: number; source: string } };
    // 47 CFR 97.307(e): 43 dB below the mean power of the fundamental under 30 MHz
    expect(a.limit).toMatchObject({ limitDb: 43, source: expect.stringContaining('97.307') });
    // ITU RR Appendix 3 (from memory): 43 + 10·log10(0.2 W) = 36.0 dB, below the 50 dBc cap
    expect(b.limit.limitDb).toBeCloseTo(43 + 10 * Math.log10(10 ** 2.3 / 1000), 6);
    // carrier = dial + audio offset 1500 Hz; 40 m dial 7.0386 MHz is the conventional WSPR dial (from memory; TRADE.md)
    expect(b.carrierHz).toBe(7_038_600 + 1500);
  });

  it('when asked for tones, synth, power, calibrate and filter, prints JSON for each', async () => {
    const results = await Promise.all([
      run('tones', '--band', '20m', '--offset', '1500', '--ppm', '2.5'),
      run('synth', '--band', '40m', '--reference', '27000000'),
      run('power', '--generator', '10', '--attenuator', '3', '--gain', '20', '--filter-loss', '0.5'),
      run('calibrate', '--commanded', '7040100', '--observed', '7040170'),
      run('filter', '--band', '40m', '--kind', 'chebyshev-0.5', '--order', '5', '--core', 'T-50-2'),
    ]);
    results.forEach((r) => expect(r.code).toBe(0));
    const [tones, synth, power, calibrate, filter] = results.map((r) => lines(r)[0] as Record<string, unknown>);
    expect(tones).toMatchObject({ band: '20m', window: { inside: true } });
    // AN619: VCO 600–900 MHz, even integer output divider. 40 m tone 0 is 7 040 100 Hz: the smallest even divider
    // putting the VCO above 600 MHz is 86 (600e6 / 7 040 100 = 85.2), VCO 605 448 600 Hz, feedback 605 448 600 / 27e6 = 22.42402…
    expect(synth).toMatchObject({ outputDivider: 86, rDivider: 1 });
    const tone0 = (synth.tones as { targetHz: number; vcoHz: number; feedback: { a: number; b: number; c: number } }[])[0];
    expect(tone0.targetHz).toBe(7_040_100);
    expect(tone0.vcoHz).toBeCloseTo(605_448_600, 3);
    expect(tone0.feedback.a + tone0.feedback.b / tone0.feedback.c).toBeCloseTo(605_448_600 / 27e6, 9);
    expect(power).toMatchObject({ outputDbm: 26.5, report: { reportedDbm: 27 } });
    expect(calibrate).toMatchObject({ referenceErrorPpm: expect.closeTo(9.943, 2) });
    expect(filter).toMatchObject({ meetsLimit: true });
  });

  it('when designing a 10 dB pad, prints the exact pi and T resistors and the nearest E24 parts with what they give', async () => {
    const r = await run('pad', '--attenuation-db', '10', '--impedance-ohm', '50');
    expect(r.code).toBe(0);
    const pad = lines(r)[0] as {
      pi: { shuntOhm: number; seriesOhm: number };
      t: { seriesOhm: number; shuntOhm: number };
      e24: { pi: { shuntOhm: number; seriesOhm: number; attenuationDb: number; returnLossDb: number } };
    };
    // standard 50 Ω attenuator table (ARRL Handbook, from memory): 10 dB pi 96.2/71.2 Ω, T 26.0/35.1 Ω
    expect(pad.pi).toEqual({ shuntOhm: expect.closeTo(96.25, 1), seriesOhm: expect.closeTo(71.15, 1) });
    expect(pad.t).toEqual({ seriesOhm: expect.closeTo(25.97, 1), shuntOhm: expect.closeTo(35.14, 1) });
    // E24 (IEC 60063): 100 Ω and 68 Ω; 100 ∥ (68 + 100 ∥ 50) = 50.33 Ω in, 9.63 dB through (worked by hand)
    expect(pad.e24.pi).toMatchObject({ shuntOhm: 100, seriesOhm: 68, attenuationDb: expect.closeTo(9.629, 2) });
  });

  it('when estimating exposure for 0.2 W into a dipole on 20 m, prints EIRP, the limit, the distance and the source', async () => {
    const r = await run(
      'exposure',
      '--power-w',
      '0.2',
      '--gain-dbi',
      '2.15',
      '--frequency-hz',
      '14097100',
      '--duty',
      '0.2',
      '--loss-db',
      '0',
    );
    expect(r.code).toBe(0);
    // EIRP = 0.2 · 10^0.215 W; 47 CFR 1.1310 Table 1: 180/f² mW/cm² at 14.0971 MHz = 9.0576 W/m²
    expect(lines(r)[0]).toMatchObject({
      eirpW: expect.closeTo(0.32812, 4),
      limitWPerM2: expect.closeTo(9.0576, 3),
      distanceM: expect.closeTo(Math.sqrt((0.2 * 0.32812) / (4 * Math.PI * 9.0576)), 4),
      source: expect.stringContaining('1.1310'),
    });
    expect(r.stderr).toMatch(/Keep people/);
  });

  it.each([
    [['encode', 'KABC FN42 37'], /no digit/],
    [['encode', 'K1ABC ZZ99 37'], /locator/],
    [['locator', 'ZZ99'], /A–R/],
    [['messages', '--callsign', 'K1ABC', '--locator', 'FN42', '--power', '61'], /0 to 60/],
    [['messages', '--callsign', 'PJ4/K1ABC/P', '--locator', 'FN42AB', '--power', '37'], /only one/],
    [['tones', '--band', '4m', '--region', 'itu2'], /no amateur allocation/],
    [['power', '--generator', 'ten'], /must be a number/],
    [['pad', '--attenuation-db', '0'], /more than 0/],
    [['exposure', '--power-w', '1', '--gain-dbi', '0', '--frequency-hz', '137500'], /outside the table/],
  ])('when given %j, exits non-zero and says what to fix on stderr', async (args, reason) => {
    const r = await run(...args);
    expect(r.code).not.toBe(0);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(reason);
  });
});
