import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { after, before, describe, it } from 'node:test';
import Ajv from 'ajv';
import { BASE_URL, VIEWPORTS, openBrowser, screenshot, signIn, startServer, visibleText, type RunningServer } from './harness';

// a 2×2 teal PNG made for this test
const PNG_2PX = 'iVBORw0KGgoAAAANSUhEUgAAAAIAAAACCAIAAAD91JpzAAAAEElEQVR4nGPgT08AIgYIBQAWMgNZ0nuvbwAAAABJRU5ErkJggg==';

const schema = JSON.parse(readFileSync(path.resolve(__dirname, '../../shared/formats/station-config.v1.schema.json'), 'utf8'));

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

for (const viewport of VIEWPORTS) {
  describe(`workshop in the browser at ${viewport.width}×${viewport.height}`, () => {
    it('when the operator registers a unit, builds a station on it, calibrates 40 m and downloads the configuration, every step shows what it should', async () => {
      const browser = await openBrowser(viewport);
      const { page } = browser;
      const unitName = `Balcony board ${viewport.name}`;
      const stationName = `Balcony beacon ${viewport.name}`;
      try {
        await signIn(page, 'operator@faintline.example');
        await visibleText(page, /Ilse Marrow/).waitFor();

        // 1. register a unit: 25 MHz crystal, filters for 40 m and 20 m
        await page.goto(`${BASE_URL}/units`);
        await visibleText(page, 'Loft board').waitFor();
        await screenshot(page, `e2e-units-list-${viewport.name}`);
        await page.getByRole('button', { name: 'Register unit' }).click();
        await page.getByLabel('Unit name', { exact: true }).fill(unitName);
        await page.getByLabel('Serial or label', { exact: true }).fill('BB-1');
        await page.getByLabel('Reference (MHz)', { exact: true }).fill('25');
        await page.getByLabel('Tolerance (± ppm)', { exact: true }).fill('10');
        await page.getByLabel('Temperature coefficient (ppm/°C)', { exact: true }).fill('0.5');
        await page.getByLabel('Generator output (dBm)', { exact: true }).fill('10');
        await page.getByRole('button', { name: 'Add a filter' }).click();
        await page.getByRole('checkbox', { name: 'Filter 1: 40 m' }).click();
        await page.getByLabel('Filter 1 cut-off (MHz)', { exact: true }).fill('7.8');
        // a cut-off typed wrong first: the message says what to fix
        await page.getByRole('button', { name: 'Add a filter' }).click();
        await page.getByRole('checkbox', { name: 'Filter 2: 20 m' }).click();
        await page.getByRole('button', { name: 'Save unit' }).click();
        await visibleText(page, 'Fill this in (a number)').waitFor();
        await page.getByLabel('Filter 2 cut-off (MHz)', { exact: true }).fill('15.6');
        await screenshot(page, `e2e-unit-form-${viewport.name}`);
        await page.getByRole('button', { name: 'Save unit' }).click();
        await page.waitForURL(/\/units\/\d+$/);
        await visibleText(page, /Fractional-N PLL · 25 MHz/).waitFor();
        await visibleText(page, 'Reported power in the message').waitFor();

        // photos: a file of the wrong kind is refused in words, a PNG uploads, and deleting asks first
        const choose = async (file: { name: string; mimeType: string; buffer: Buffer }) => {
          const [chooser] = await Promise.all([
            page.waitForEvent('filechooser'),
            page.getByRole('button', { name: 'Add a photo' }).click(),
          ]);
          await chooser.setFiles(file);
        };
        await choose({ name: 'notes.txt', mimeType: 'text/plain', buffer: Buffer.from('not a photo') });
        await visibleText(page, '“notes.txt” is not a JPEG, PNG or WebP photo. Choose one of those.').waitFor();
        await choose({ name: 'board.png', mimeType: 'image/png', buffer: Buffer.from(PNG_2PX, 'base64') });
        await page.getByRole('button', { name: 'Delete photo 1' }).waitFor();
        await screenshot(page, `e2e-unit-detail-${viewport.name}`);
        await page.getByRole('button', { name: 'Delete photo 1' }).click();
        await visibleText(page, 'Delete this photo?').waitFor();
        await page.getByRole('button', { name: 'Delete photo', exact: true }).click();
        await page.getByRole('button', { name: 'Delete photo 1' }).waitFor({ state: 'detached' });
        await visibleText(page, /No photos yet/).waitFor();

        // 2. a station on that unit
        await page.goto(`${BASE_URL}/stations/new`);
        await page.getByLabel('Name', { exact: true }).fill(stationName);
        await page.getByLabel('Callsign', { exact: true }).fill('q1imw');
        await page.getByLabel('Latitude (°)', { exact: true }).fill('51.52');
        await page.getByLabel('Longitude (°)', { exact: true }).fill('-0.58');
        await page.getByRole('button', { name: 'Fill the locator' }).click();
        assert.equal(await page.getByLabel('Locator', { exact: true }).inputValue(), 'IO91rm');
        await page.getByRole('radio', { name: `Unit ${unitName}` }).click();
        await page.getByRole('button', { name: 'Save station' }).click();
        await page.waitForURL(/\/stations\/\d+$/);
        const stationId = Number(new URL(page.url()).pathname.split('/').pop());
        await visibleText(page, 'Message plan').waitFor();
        await visibleText(page, 'Q1IMW IO91 10').waitFor();
        await screenshot(page, `e2e-station-workshop-${viewport.name}`);

        // 3. bands: 10 m cannot be enabled, and the screen says why
        await page.getByRole('button', { name: 'Bands and calibration' }).click();
        await page.waitForURL(/\/bands$/);
        const tenMetres = page.getByRole('switch', { name: 'Enable 10 m' }).locator('visible=true');
        assert.equal(await tenMetres.isDisabled(), true);
        await visibleText(page, 'No low-pass filter for 10 m is installed on this unit. Fit one before enabling 10 m.').waitFor();
        const refused = await page.evaluate(async (id) => {
          const res = await fetch(`/api/stations/${id}/bands/10m`, {
            method: 'PUT',
            headers: { 'Content-Type': 'application/json' },
            body: JSON.stringify({ enabled: true }),
          });
          return { status: res.status, body: await res.json() };
        }, stationId);
        assert.equal(refused.status, 400);
        assert.match(refused.body.error.fields.enabled, /No low-pass filter for 10 m/);

        for (const band of ['40 m', '20 m']) {
          const toggle = page.getByRole('switch', { name: `Enable ${band}` }).locator('visible=true');
          await toggle.click();
          await visibleText(page, `${band} is enabled`).waitFor();
        }

        // 4. guided measurement on 40 m, accept the proposed offsets
        await page.getByRole('button', { name: 'Calibrate' }).locator('visible=true').click();
        await page.waitForURL(/\/calibrate$/);
        await page.getByRole('radio', { name: 'Measured on 40 m' }).click();
        assert.equal(await page.getByLabel('Commanded frequency (Hz)', { exact: true }).inputValue(), '7040100');
        await page.getByRole('button', { name: 'Work out the offsets' }).click();
        await visibleText(page, 'Give the frequency your receiver heard, in Hz').waitFor();
        await page.getByLabel('Heard frequency (Hz)', { exact: true }).fill('7040129.6');
        await page.getByRole('button', { name: 'Work out the offsets' }).click();
        await visibleText(page, 'Proposed offsets').waitFor();
        assert.equal(await page.getByLabel('Offset for 40 m (Hz)', { exact: true }).inputValue(), '29.60');
        assert.equal(await page.getByLabel('Offset for 20 m (Hz)', { exact: true }).inputValue(), '59.27');
        await screenshot(page, `e2e-calibrate-${viewport.name}`);
        await page.getByRole('button', { name: 'Accept offsets' }).click();
        await page.waitForURL(/\/bands$/);

        // 5. every enabled band's gauge shows the tones inside the window
        await visibleText(page, /Calibration: \+29\.60 Hz \(measured\)/).waitFor();
        await visibleText(page, /All four tones are inside the 40 m window/).waitFor();
        await visibleText(page, /All four tones are inside the 20 m window/).waitFor();
        assert.equal(
          await page
            .getByText(/^Warning:/)
            .locator('visible=true')
            .count(),
          0,
        );
        await screenshot(page, `e2e-bands-${viewport.name}`);

        // 6. on-air detail for 40 m
        await page.getByRole('link', { name: 'On-air detail for 40 m' }).locator('visible=true').click();
        await page.waitForURL(/\/on-air\?band=40m$/);
        await visibleText(page, 'Synthesizer settings').waitFor();
        await visibleText(page, /^Passes on 40 m$/).waitFor();
        await visibleText(page, '<Q1IMW> IO91RM 10').waitFor();
        await visibleText(page, /Rules differ by country/).waitFor();
        await screenshot(page, `e2e-on-air-${viewport.name}`);

        // 7. the configuration download matches its JSON Schema
        await page.goto(`${BASE_URL}/stations/${stationId}`);
        const downloadLink = page.getByRole('link', { name: 'Download configuration' }).locator('visible=true');
        const [download] = await Promise.all([page.waitForEvent('download'), downloadLink.click()]);
        assert.match(download.suggestedFilename(), /^faintline-Q1IMW-station-\d+\.json$/);
        const config = JSON.parse(readFileSync(await download.path(), 'utf8'));
        const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);
        assert.equal(validate(config), true, JSON.stringify(validate.errors));
        assert.equal(config.station.id, stationId);
        assert.deepEqual(
          config.bands
            .filter((b: { enabled: boolean }) => b.enabled)
            .map((b: { bandId: string }) => b.bandId)
            .sort(),
          ['20m', '40m'],
        );
        assert.equal(config.bands.find((b: { bandId: string }) => b.bandId === '40m').calibrationOffsetHz, 29.6);
        assert.deepEqual(browser.errors, []);
      } catch (error) {
        await page.screenshot({ path: path.resolve(__dirname, `../../screenshots/e2e-workshop-failure-${viewport.name}.png`) });
        throw error;
      } finally {
        await browser.close();
      }
    });
  });
}
