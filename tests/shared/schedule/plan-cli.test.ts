import { execFile } from 'node:child_process';
import path from 'node:path';

const BIN = path.join(__dirname, '..', '..', '..', 'server', 'cli', 'bin.js');

type Run = { code: number; stdout: string; stderr: string };

function run(...args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, [BIN, 'plan', ...args], { timeout: 20_000 }, (error, stdout, stderr) => {
      resolve({ code: error ? (typeof error.code === 'number' ? error.code : 1) : 0, stdout: String(stdout), stderr: String(stderr) });
    });
  });
}
const lines = (r: Run) =>
  r.stdout
    .trim()
    .split('\n')
    .map((l) => JSON.parse(l));
const station = ['--callsign', 'Q1IMW', '--locator', 'IO91wm', '--power', '23'];

describe('faintline plan', () => {
  it('when asked for help, documents the rotation options', async () => {
    const r = await run('--help');
    expect(r.code).toBe(0);
    for (const flag of [
      '--band',
      '--slots',
      '--duty',
      '--every',
      '--from',
      '--hours',
      '--offset',
      '--stagger-step',
      '--stagger-span',
      '--cal',
    ]) {
      expect(r.stdout).toContain(flag);
    }
  });

  it('when planning two bands for a day at one slot in five, prints 144 transmissions as Type 1/3 pairs on one band', async () => {
    const r = await run(
      ...station,
      '--band',
      '20m',
      '--band',
      '40m',
      '--slots',
      '2',
      '--duty',
      '20',
      '--from',
      '2026-12-02T00:00Z',
      '--hours',
      '24',
      '--stagger-step',
      '3',
    );
    expect(r.code).toBe(0);
    const txs = lines(r);
    expect(txs).toHaveLength(144);
    for (let i = 0; i < txs.length; i += 2) {
      expect([txs[i].messageType, txs[i + 1].messageType]).toEqual([1, 3]);
      expect(txs[i + 1].bandId).toBe(txs[i].bandId);
      expect(txs[i + 1].startMs - txs[i].startMs).toBe(120_000);
    }
    // WSPR protocol description: transmissions begin one second after an even UTC minute
    expect(txs.every((t: { startUtc: string }) => /T\d\d:\d[02468]:01\.000Z$/.test(t.startUtc))).toBe(true);
  });

  it.each([
    ['a share above 50 %', ['--band', '20m', '--duty', '60'], 'hogs the band'],
    ['an unknown band', ['--band', '11m'], "Unknown band '11m'"],
    ['hours that never occur', ['--band', '40m@5-5'], '--band 40m@5-5: The starting and ending hours are the same'],
    ['both --duty and --every', ['--band', '20m', '--duty', '20', '--every', '5'], 'Give --duty or --every, not both'],
    ['a bad start time', ['--band', '20m', '--from', 'yesterday'], '--from must be an ISO 8601 time'],
  ])('when given %s, explains on stderr and exits 1', async (_label, args, message) => {
    const r = await run(...station, ...args);
    expect(r.code).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain(message);
  });
});
