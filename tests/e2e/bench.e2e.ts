import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { BASE_URL, VIEWPORTS, openBrowser, screenshot, signIn, startServer, visibleText, type RunningServer } from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

for (const viewport of VIEWPORTS) {
  describe(`the bench in the browser at ${viewport.width}×${viewport.height}`, () => {
    it('when the operator designs an attenuator, reads the exposure estimate and records a fitted filter, each shows what it should', async () => {
      const browser = await openBrowser(viewport);
      const { page } = browser;
      try {
        await signIn(page, 'operator@faintline.example');
        await visibleText(page, /Ilse Marrow/).waitFor();

        // 1. the pad designer on the unit form: Loft board has a 10 dBm generator and no amplifier
        await page.goto(`${BASE_URL}/units`);
        await visibleText(page, 'Loft board').click();
        await page.waitForURL(/\/units\/\d+$/);
        const unitUrl = page.url();
        await page.getByRole('button', { name: 'Edit Loft board' }).click();
        await page.waitForURL(/\/units\/\d+\/edit$/);
        const designer = visibleText(page, 'Attenuator designer');
        await designer.scrollIntoViewIfNeeded();
        await page.getByLabel('Wanted output', { exact: true }).fill('3');
        // 10 dBm − 0.5 dB filter loss − 3 dBm = 6.5 dB (the power chain's own arithmetic)
        await visibleText(page, /Needed: 6\.5 dB for 3\.0 dBm/).waitFor();
        await visibleText(page, /Pi pad, 6\.50 dB/).scrollIntoViewIfNeeded();
        await visibleText(page, /With E24 parts:/).waitFor();
        await screenshot(page, `e2e-bench-pad-${viewport.name}`);
        await page.getByRole('radio', { name: 'mW' }).click();
        await page.getByLabel('Wanted output', { exact: true }).fill('0.5');
        await visibleText(page, /Needed: 12\.5 dB/).waitFor();
        await page.getByRole('button', { name: /Use a 10 dB attenuator/ }).click();
        assert.equal(await page.getByLabel('Attenuator (dB)', { exact: true }).inputValue(), '10');

        // 2. filter selection on the form: swapped by hand, then the quick "fitted filter" action on the unit page
        await visibleText(page, 'How filters are selected').scrollIntoViewIfNeeded();
        await page.getByRole('radio', { name: 'Swapped by hand' }).click();
        await visibleText(page, /only the band of the filter you record as fitted may be scheduled/).waitFor();
        await page.getByLabel('Attenuator (dB)', { exact: true }).fill('0');
        await page.getByRole('button', { name: 'Save unit' }).click();
        await page.waitForURL(unitUrl);
        const fitted = visibleText(page, 'Fitted filter');
        await fitted.scrollIntoViewIfNeeded();
        const fit = page
          .getByRole('button', { name: /^I fitted the (40|20) m filter$/ })
          .locator('visible=true')
          .first();
        const label = (await fit.textContent()) ?? '';
        const band = /(40|20) m/.exec(label)?.[0];
        assert.ok(band, `a fitted-filter button names a band: ${label}`);
        await fit.click();
        await visibleText(
          page,
          new RegExp(`Fitted now: the ${band} filter \\(recorded \\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2} UTC\\)`),
        ).waitFor();
        await screenshot(page, `e2e-bench-fitted-${viewport.name}`);

        // 3. the exposure estimate on the station
        await page.goto(`${BASE_URL}/stations`);
        await visibleText(page, 'Attic beacon').click();
        await page.waitForURL(/\/stations\/\d+$/);
        const exposure = visibleText(page, 'RF exposure, estimated');
        await exposure.scrollIntoViewIfNeeded();
        await visibleText(page, /EIRP \d+ mW · limit [\d.]+ W\/m² · distance/).waitFor();
        await visibleText(page, /47 CFR § 1\.1310 Table 1/).waitFor();
        await visibleText(page, /Keep people and animals away from the antenna/).scrollIntoViewIfNeeded();
        await screenshot(page, `e2e-bench-exposure-${viewport.name}`);
        await page.getByLabel('Feed-line loss (dB)', { exact: true }).fill('x');
        await visibleText(page, 'Enter a number, such as 0 or 1.5').waitFor();

        assert.deepEqual(browser.errors, []);
      } finally {
        await browser.close();
      }
    });
  });
}
