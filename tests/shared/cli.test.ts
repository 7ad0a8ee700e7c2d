import { execFile } from 'node:child_process';
import path from 'node:path';
import { workedExample } from './fixtures/wspr-vectors';

const BIN = path.join(__dirname, '..', '..', 'server', 'cli', 'bin.js');

type Run = { code: number; stdout: string; stderr: string };

function run(...args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, ...args], { timeout: 20_000 }, (error, stdout, stderr) => {
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
    for (const command of ['encode', 'messages', 'locator', 'path', 'tones', 'synth', 'power', 'filter']) {
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
    expect(lines(r)[0]).toEqual({ distanceKm: expect.any(Number), bearingDeg: expect.any(Number) });
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
    expect(synth).toMatchObject({ tones: expect.any(Array), outputDivider: expect.any(Number) });
    expect(power).toMatchObject({ outputDbm: 26.5, report: { reportedDbm: 27 } });
    expect(calibrate).toMatchObject({ referenceErrorPpm: expect.closeTo(9.943, 2) });
    expect(filter).toMatchObject({ meetsLimit: true });
  });

  it.each([
    [['encode', 'KABC FN42 37'], /no digit/],
    [['encode', 'K1ABC ZZ99 37'], /locator/],
    [['locator', 'ZZ99'], /A–R/],
    [['messages', '--callsign', 'K1ABC', '--locator', 'FN42', '--power', '61'], /0 to 60/],
    [['messages', '--callsign', 'PJ4/K1ABC/P', '--locator', 'FN42AB', '--power', '37'], /only one/],
    [['tones', '--band', '4m', '--region', 'itu2'], /no amateur allocation/],
    [['power', '--generator', 'ten'], /must be a number/],
  ])('when given %j, exits non-zero and says what to fix on stderr', async (args, reason) => {
    const r = await run(...args);
    expect(r.code).not.toBe(0);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(reason);
  });
});
