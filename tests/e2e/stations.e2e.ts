import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { BASE_URL, VIEWPORTS, openBrowser, screenshot, signIn, startServer, visibleText, type RunningServer } from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

for (const viewport of VIEWPORTS) {
  describe(`stations in the browser at ${viewport.width}×${viewport.height}`, () => {
    it('when the operator adds a station with a bad locator, sees the error, fixes it, edits the station and signs out', async () => {
      const browser = await openBrowser(viewport);
      const { page } = browser;
      try {
        await signIn(page, 'operator@faintline.example');
        await visibleText(page, /Ilse Marrow/).waitFor();
        await page.goto(`${BASE_URL}/stations/new`);
        const name = `Balcony test ${viewport.name}`;
        await page.getByLabel('Name', { exact: true }).fill(name);
        await page.getByLabel('Callsign', { exact: true }).fill('q1imw');
        await page.getByLabel('Locator', { exact: true }).fill('ZZ99');
        await page.getByRole('button', { name: 'Save station' }).click();
        await visibleText(page, /4- or 6-character Maidenhead locator/).waitFor();
        await screenshot(page, `e2e-station-error-${viewport.name}`);

        await page.getByLabel('Locator', { exact: true }).fill('IO91wm');
        await page.getByRole('button', { name: 'Save station' }).click();
        await page.waitForURL(/\/stations\/\d+$/);
        await visibleText(page, /IO91wm/i).waitFor();

        await page.goto(`${BASE_URL}/stations`);
        await visibleText(page, name).click();
        await page.waitForURL(/\/stations\/\d+$/);
        await page.getByRole('button', { name: 'Edit' }).click();
        await page.getByLabel('Name', { exact: true }).fill(`${name} (edited)`);
        await page.getByRole('button', { name: 'Save station' }).click();
        await visibleText(page, `${name} (edited)`).waitFor();

        await page.goto(`${BASE_URL}/settings`);
        const callsign = page.getByLabel('Your callsign (optional)');
        assert.equal(await callsign.inputValue(), 'Q1IMW');
        await callsign.fill('q1imx/p');
        await page.getByRole('button', { name: 'Save account' }).click();
        await visibleText(page, 'Saved.').waitFor();
        assert.equal(await callsign.inputValue(), 'Q1IMX/P');
        await screenshot(page, `e2e-settings-${viewport.name}`);
        await callsign.fill('Q1IMW'); // the demo operator as the other tests expect her
        await page.getByRole('button', { name: 'Save account' }).click();
        await visibleText(page, 'Saved.').waitFor();
        await page.getByRole('button', { name: 'Sign out', exact: true }).click();
        await page.getByRole('button', { name: 'Sign in' }).waitFor();
        const me = await page.evaluate(async () => (await fetch('/api/auth/me')).status);
        assert.equal(me, 401);
        assert.deepEqual(browser.errors, []);
      } finally {
        await browser.close();
      }
    });
  });
}
