import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { BASE_URL, VIEWPORTS, openBrowser, screenshot, startServer, visibleText, type RunningServer } from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

for (const viewport of VIEWPORTS) {
  describe(`a new account's first run at ${viewport.width}×${viewport.height}`, () => {
    it('the overview leads through the steps; a station started without a unit survives registering one; help explains the words', async () => {
      const browser = await openBrowser(viewport);
      const { page } = browser;
      const v = viewport.name;
      try {
        await page.goto(`${BASE_URL}/sign-in`);
        await visibleText(page, 'Open the local test inbox').waitFor();
        const registered = await page.evaluate(
          async (body) =>
            (await fetch('/api/auth/register', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body })).status,
          JSON.stringify({
            email: `e2e-first-${v}@test.faintline.example`,
            password: 'first-run-password-1',
            displayName: 'Wren Newcomer',
          }),
        );
        assert.equal(registered, 201);

        // the checklist: nothing done yet, each step a link
        await page.goto(`${BASE_URL}/`);
        await visibleText(page, 'Getting your beacon on the air').waitFor();
        await visibleText(page, '0 of 6 steps done. Each step ticks itself off when it is done.').waitFor();
        await screenshot(page, `e2e-first-run-overview-${v}`);
        await page.getByRole('link', { name: /^Step 2: Add a station/ }).click();
        await page.waitForURL(/\/stations\/new$/);

        // a station typed before any unit exists: register one first, then come back to what was typed
        await page.getByLabel('Name', { exact: true }).fill('Garden beacon');
        await page.getByLabel('Callsign', { exact: true }).fill('Q7NEW');
        await page.getByLabel('Locator', { exact: true }).fill('JO32KF');
        await page.getByRole('button', { name: 'Register a unit first' }).click();
        await page.waitForURL(/\/units\/new\?then=new-station$/);
        await page.getByLabel('Unit name', { exact: true }).fill('Garden board');
        await page.getByLabel('Reference (MHz)', { exact: true }).fill('25');
        await page.getByLabel('Tolerance (± ppm)', { exact: true }).fill('10');
        await page.getByLabel('Generator output (dBm)', { exact: true }).fill('10');
        await page.getByRole('button', { name: 'Add a filter' }).click();
        await page.getByRole('checkbox', { name: 'Filter 1: 20 m' }).click();
        // a cut-off below the band is named with its reason while typing
        await page.getByLabel('Filter 1 cut-off (MHz)', { exact: true }).fill('8');
        await visibleText(page, /Check filter 1: 8\.000 MHz is below the 20 m window/).waitFor();
        await screenshot(page, `e2e-first-run-filter-warning-${v}`);
        await page.getByLabel('Filter 1 cut-off (MHz)', { exact: true }).fill('15.6');
        await visibleText(page, /Check filter 1/).waitFor({ state: 'detached' });
        await page.getByRole('button', { name: 'Save unit' }).click();
        await page.waitForURL(/\/stations\/new\?unitId=\d+$/);
        assert.equal(await page.getByLabel('Name', { exact: true }).inputValue(), 'Garden beacon');
        assert.equal(await page.getByLabel('Callsign', { exact: true }).inputValue(), 'Q7NEW');
        assert.equal(await page.getByLabel('Locator', { exact: true }).inputValue(), 'JO32KF');
        assert.equal(await page.getByRole('radio', { name: 'Unit Garden board' }).getAttribute('aria-checked'), 'true');
        await screenshot(page, `e2e-first-run-station-back-${v}`);
        await page.getByRole('button', { name: 'Save station' }).click();
        await page.waitForURL(/\/stations\/\d+$/);

        // two steps ticked off
        await page.goto(`${BASE_URL}/`);
        await visibleText(page, '2 of 6 steps done. Each step ticks itself off when it is done.').waitFor();
        await page.getByRole('link', { name: /^Step 1: Register a unit, done/ }).waitFor();
        await page.getByRole('link', { name: /^Step 3: Enable and calibrate a band, next/ }).waitFor();

        // help: from the overview, and a glossary mark opens its entry
        await page.getByRole('button', { name: 'Help and glossary' }).click();
        await page.waitForURL(/\/help$/);
        await visibleText(page, 'A beacon’s life in Faintline').waitFor();
        await screenshot(page, `e2e-help-${v}`);
        await page.goto(`${BASE_URL}/stations/new`);
        await page.getByRole('link', { name: 'What is “Audio offset”?' }).click();
        await page.waitForURL(/\/help\?term=audio-offset$/);
        await visibleText(page, /How far above the dial frequency your signal sits/).waitFor();
        assert.deepEqual(browser.errors, []);
      } finally {
        await browser.close();
      }
    });
  });
}
