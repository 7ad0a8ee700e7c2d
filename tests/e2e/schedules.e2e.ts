import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Page } from 'playwright-core';

import {
  BASE_URL,
  VIEWPORTS,
  failureScreenshot,
  openBrowser,
  screenshot,
  signIn,
  startServer,
  visibleText,
  type RunningServer,
} from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

/** Through the API, as the signed-in operator: a unit with 20, 40 and 80 m filters and a station with those bands enabled and calibrated. */
async function threeBandStation(page: Page, stationName: string): Promise<number> {
  // the browser context's request client shares the session cookie; state changes need our Origin
  const send = async (method: 'POST' | 'PUT', path: string, body: unknown) => {
    const res = await page.request.fetch(`${BASE_URL}/api${path}`, { method, data: body, headers: { Origin: BASE_URL } });
    if (!res.ok()) throw new Error(`${method} ${path} → ${res.status()} ${await res.text()}`);
    return res.json();
  };
  const filter = (band: string, cutoffHz: number) => ({ bands: [band], type: 'chebyshev-0.5', order: 5, cutoffHz });
  const unit = await send('POST', '/units', {
    name: `${stationName} board`,
    timeSource: 'network',
    generatorKind: 'pll',
    referenceHz: 25e6,
    tolerancePpm: 10,
    generatorLevelDbm: 10,
    filters: [filter('20m', 15.6e6), filter('40m', 7.8e6), filter('80m', 4.2e6)],
  });
  const station = await send('POST', '/stations', {
    name: stationName,
    callsign: 'Q1IMW',
    locator: 'IO91WM',
    unitId: unit.id,
    audioOffsetHz: 1500,
  });
  for (const band of ['20m', '40m', '80m'])
    await send('PUT', `/stations/${station.id}/bands/${band}`, { enabled: true, calibrationOffsetHz: 0 });
  return station.id as number;
}

for (const viewport of VIEWPORTS) {
  describe(`schedules in the browser at ${viewport.width}×${viewport.height}`, () => {
    it('when the operator builds a three-band rotation with night-only 80 m, sees the timeline and why 10 m is out, saves, pauses and resumes', async () => {
      const browser = await openBrowser(viewport);
      const { page } = browser;
      page.setDefaultTimeout(60_000); // a busy machine can take a while to serve the first screen
      try {
        await signIn(page, 'operator@faintline.example');
        await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
        await visibleText(page, /Hello, Ilse Marrow/).waitFor({ timeout: 60_000 });
        const stationId = await threeBandStation(page, `Bench mast ${viewport.name}`);

        // from the station's own screen to its (empty) schedule
        await page.goto(`${BASE_URL}/stations/${stationId}`);
        await page.getByRole('link', { name: 'Schedule' }).locator('visible=true').first().click();
        await page.waitForURL(/\/schedule$/);
        await visibleText(page, 'No schedule yet').waitFor();
        await visibleText(page, 'Three-band tour').waitFor();
        await screenshot(page, `e2e-schedule-empty-${viewport.name}`);
        await page.getByRole('button', { name: 'Build a rotation' }).click();
        await page.waitForURL(/\/schedule\/edit/);

        // the rotation: 20 m, 40 m, then 80 m only at night
        await page.getByRole('radio', { name: 'Step 1: 20 m', exact: true }).click();
        await page.getByRole('button', { name: 'Add a step' }).click();
        await page.getByRole('radio', { name: 'Step 2: 40 m', exact: true }).click();
        await page.getByRole('button', { name: 'Add a step' }).click();
        await page.getByRole('radio', { name: 'Step 3: 80 m', exact: true }).click();
        await page.getByRole('radio', { name: 'Step 3 runs only at certain hours' }).click();
        await page.getByLabel('From hour (UTC)', { exact: true }).fill('20');
        await page.getByLabel('To hour (UTC)', { exact: true }).fill('6');
        await page.getByLabel('Schedule name', { exact: true }).fill(`Three bands ${viewport.name}`);
        assert.equal(await page.getByLabel('From hour (UTC)', { exact: true }).inputValue(), '20');
        assert.equal(await page.getByLabel('To hour (UTC)', { exact: true }).inputValue(), '6');
        await visibleText(page, '· 20:00–06:00 UTC').waitFor();

        // the live timeline (lazy-loaded victory chart): one lane per band, the axis in UTC
        const timeline = page.getByRole('img', { name: /^Timeline of \d+ transmissions/ });
        await timeline.waitFor();
        await timeline.locator('svg text', { hasText: 'UTC' }).first().waitFor();
        for (const lane of ['20 m', '40 m', '80 m']) await timeline.locator('svg text', { hasText: lane }).first().waitFor();
        await screenshot(page, `e2e-schedule-editor-${viewport.name}`);

        // a band without an enabled band and filter: pressing it says why, and the step keeps its band
        await page.getByRole('radio', { name: 'Step 3: 10 m (not available)' }).click();
        await visibleText(page, /10 m cannot be used: 10 m is not enabled on this station/).waitFor();
        await visibleText(page, /10 m cannot be used/).scrollIntoViewIfNeeded();
        await screenshot(page, `e2e-schedule-why-not-${viewport.name}`);
        assert.equal(await page.getByRole('radio', { name: 'Step 3: 80 m', exact: true }).getAttribute('aria-checked'), 'true');

        await page.getByRole('button', { name: 'Save schedule' }).click();
        await page.waitForURL(/\/schedule$/);
        await visibleText(page, `Three bands ${viewport.name}`).waitFor();
        await page.getByLabel('Schedule status: Running').locator('visible=true').waitFor();
        await visibleText(page, 'Next transmission in').waitFor();
        await page
          .getByRole('img', { name: /^Timeline of \d+ transmissions/ })
          .locator('svg text', { hasText: 'UTC' })
          .first()
          .waitFor();
        await screenshot(page, `e2e-schedule-saved-${viewport.name}`);

        // the server stored the rotation as built
        const saved = await (await page.request.get(`${BASE_URL}/api/stations/${stationId}/schedule`)).json();
        assert.deepEqual(
          saved.steps.map((s: { bandId: string; activeHoursUtc: unknown }) => [s.bandId, s.activeHoursUtc]),
          [
            ['20m', null],
            ['40m', null],
            ['80m', { fromHour: 20, toHour: 6 }],
          ],
        );

        await page.getByRole('button', { name: 'Pause schedule' }).click();
        await page.getByLabel('Schedule status: Paused').locator('visible=true').waitFor();
        await visibleText(page, /The schedule is paused: resume it to transmit/).waitFor();
        await screenshot(page, `e2e-schedule-paused-${viewport.name}`);
        await page.getByRole('button', { name: 'Resume schedule' }).click();
        await page.getByLabel('Schedule status: Running').locator('visible=true').waitFor();
        await visibleText(page, 'Next transmission in').waitFor();

        // delete asks first
        await page.getByRole('button', { name: 'Delete schedule' }).click();
        const dialog = page.getByRole('alertdialog');
        await dialog.waitFor();
        await screenshot(page, `e2e-schedule-delete-${viewport.name}`);
        await dialog.getByRole('button', { name: 'Delete schedule' }).click();
        await visibleText(page, 'No schedule yet').waitFor();

        // the seeded station's schedule as the operator sees it
        const stations = await (await page.request.get(`${BASE_URL}/api/stations`)).json();
        const attic = stations.find((s: { name: string }) => s.name === 'Attic beacon');
        await page.goto(`${BASE_URL}/stations/${attic.id}/schedule`);
        await visibleText(page, 'Day and night').waitFor();
        await page
          .getByRole('img', { name: /^Timeline of \d+ transmissions/ })
          .locator('svg text', { hasText: 'UTC' })
          .first()
          .waitFor();
        await screenshot(page, `e2e-schedule-seeded-${viewport.name}`);
        assert.deepEqual(browser.errors, []);
      } catch (error) {
        await failureScreenshot(page, `e2e-schedule-failure-${viewport.name}`);
        throw error;
      } finally {
        await browser.close();
      }
    });
  });
}
