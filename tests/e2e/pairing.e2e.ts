import assert from 'node:assert/strict';
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { after, before, describe, it } from 'node:test';
import type { Page } from 'playwright-core';

import { DEMO_DEVICES } from '@/server/db/seed/demo-devices';

import { BASE_URL, VIEWPORTS, openBrowser, screenshot, signIn, startServer, visibleText, type RunningServer } from './harness';

const ROOT = path.resolve(__dirname, '../..');
const ATTIC_TOKEN = DEMO_DEVICES.find((d) => d.stationName === 'Attic beacon')!.token;

let server: RunningServer;
before(async () => {
  server = await startServer({ DEVICE_CACHE_MS: '0' });
});
after(() => server.stop());

/** `npm run simulate -- --pair` as a person runs it, with its console read line by line. */
function startPairingSimulator() {
  const child: ChildProcess = spawn(
    process.execPath,
    [
      '--import',
      'tsx',
      'server/simulator/simulate.ts',
      '--pair',
      '--url',
      BASE_URL,
      '--speed',
      '60',
      '--silence',
      '0',
      '--model',
      'QB-2 bench beacon',
      '--firmware',
      '0.9.1',
    ],
    { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] },
  );
  let output = '';
  child.stdout?.on('data', (d) => (output += d));
  child.stderr?.on('data', (d) => (output += d));
  return {
    output: () => output,
    async waitFor(pattern: RegExp, timeoutMs = 30_000) {
      const deadline = Date.now() + timeoutMs;
      while (Date.now() < deadline) {
        const match = pattern.exec(output);
        if (match) return match;
        if (child.exitCode !== null) break;
        await new Promise((r) => setTimeout(r, 100));
      }
      throw new Error(`the simulator did not print ${pattern} in time:\n${output}`);
    },
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

async function stationsOf(page: Page) {
  return page.evaluate(async () => {
    const res = await fetch('/api/stations', { credentials: 'include' });
    return (await res.json()) as { id: number; name: string; callsign: string }[];
  });
}

for (const viewport of VIEWPORTS) {
  describe(`pairing a device by code at ${viewport.width}×${viewport.height}`, () => {
    it('the simulator shows a code, the operator types it in lower case with a dash, picks the station and approves; the device gets its token and configuration', async () => {
      const browser = await openBrowser(viewport);
      const { page } = browser;
      const sim = startPairingSimulator();
      try {
        const [, code] = (await sim.waitFor(/Pairing code: ([A-Z]{4}-[A-Z]{4})/)) as RegExpExecArray;
        await sim.waitFor(new RegExp(`${BASE_URL}/pair\\?code=${code}`)); // the link a QR code would carry
        const typed = code.toLowerCase(); // as a person might type it: lower case, with the dash

        // the phone arrives signed out (as from the device's link) and signs in on the pairing page itself;
        // the wide screen goes there from the station's device screen
        const phone = viewport.name === 'phone';
        const stationName = phone ? 'Attic beacon' : 'Garden mast';
        if (phone) {
          await page.goto(`${BASE_URL}/pair`);
          await visibleText(page, 'Pair a device').waitFor();
          await screenshot(page, `e2e-pair-signed-out-${viewport.name}`);
          await page.getByLabel('E-mail', { exact: true }).fill('operator@faintline.example');
          await page.getByLabel('Password', { exact: true }).fill('faintline-demo');
          await page.getByRole('button', { name: 'Sign in' }).click();
          await page.getByLabel('Pairing code', { exact: true }).waitFor();
          assert.match(page.url(), /\/pair$/);
        } else {
          await signIn(page, 'operator@faintline.example');
          await visibleText(page, /Ilse Marrow/).waitFor();
        }
        const stations = await stationsOf(page);
        const station = stations.find((s) => s.name === stationName)!;
        assert.ok(station, `the demo data has ${stationName}`);
        if (!phone) {
          await page.goto(`${BASE_URL}/stations/${station.id}/device`);
          await visibleText(page, 'Pair a device by code').waitFor();
          await page.getByRole('button', { name: 'Show an example QR code' }).click();
          await page.getByRole('img', { name: /QR code of/ }).waitFor();
          await screenshot(page, `e2e-pair-device-screen-${viewport.name}`);
          await page.getByRole('button', { name: 'Pair a device' }).click();
          await page.waitForURL(/\/pair$/);
        }

        const field = page.getByLabel('Pairing code', { exact: true });
        await field.fill('bcdf-ghjk'); // a code no device is waiting with
        await page.getByRole('button', { name: 'Find the device' }).click();
        await visibleText(page, /No device is waiting with this code/).waitFor();
        await field.fill(typed);
        await screenshot(page, `e2e-pair-code-${viewport.name}`);
        await page.getByRole('button', { name: 'Find the device' }).click();
        await visibleText(page, 'A device is asking to be paired').waitFor();
        await visibleText(page, 'QB-2 bench beacon').waitFor();
        await visibleText(page, '0.9.1').waitFor();
        await visibleText(page, code).waitFor();
        await page.getByRole('radio', { name: new RegExp(`^${stationName}`) }).click();
        await screenshot(page, `e2e-pair-review-${viewport.name}`);
        await page.getByRole('button', { name: 'Approve the device' }).click();
        if (phone) {
          // the Attic beacon has a device already: asked first, its old token stops
          await visibleText(page, 'Replace the device of Attic beacon?').waitFor();
          await screenshot(page, `e2e-pair-confirm-${viewport.name}`);
          await page.getByRole('button', { name: 'Approve and replace' }).click();
        }
        await visibleText(page, `Paired with ${stationName}`).waitFor();
        await screenshot(page, `e2e-pair-done-${viewport.name}`);

        await sim.waitFor(/Paired: received a device token/, 20_000);
        const [, stationId, callsign] = (await sim.waitFor(
          /First configuration: station (\d+) \((\S+)\), status (\w+)/,
        )) as RegExpExecArray;
        assert.equal(Number(stationId), station.id);
        assert.equal(callsign, station.callsign);
        // …and carries on as a device: its heartbeat shows on the station's health
        await page.goto(`${BASE_URL}/health/${station.id}`);
        await visibleText(page, /Heard \d+ s ago/).waitFor({ timeout: 20_000 });
        if (phone) {
          const old = await fetch(`${BASE_URL}/api/device/v1/config`, { headers: { Authorization: `Bearer ${ATTIC_TOKEN}` } });
          assert.equal(old.status, 401, 'the station’s previous token stopped');
        }
        assert.deepEqual(browser.errors, []);
      } finally {
        await sim.stop();
        await browser.close();
      }
    });
  });
}
