import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Page } from 'playwright-core';
import { BASE_URL, VIEWPORTS, axeFindings, openBrowser, screenshot, signIn, startServer, visibleText, type RunningServer } from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

async function getJson(page: Page, apiPath: string) {
  return page.evaluate(async (p) => (await fetch(`/api${p}`, { credentials: 'include' })).json(), apiPath);
}

type BandResult = { bandId: string; enough: boolean; proposedOffsetHz: number | null };

describe('calibration from reports', () => {
  for (const viewport of VIEWPORTS) {
    it(
      `at ${viewport.width}×${viewport.height}: read the proposal, see the window before and after, confirm and apply it`,
      { timeout: 180_000 },
      async () => {
        const browser = await openBrowser(viewport);
        const { page } = browser;
        try {
          await signIn(page, 'operator@faintline.example');
          await visibleText(page, /Ilse Marrow/).waitFor();
          const stations = (await getJson(page, '/stations')) as { id: number; name: string }[];
          // the first station band with a proposal, as the server works it out from the demo reports (each screen size applies its own)
          let attic: { id: number; name: string } | undefined;
          let band: BandResult | undefined;
          for (const station of stations) {
            const found = (await getJson(page, `/stations/${station.id}/calibration/from-reports`)) as { bands: BandResult[] };
            band = found.bands.find((b) => b.enough);
            if (band) {
              attic = station;
              break;
            }
          }
          assert.ok(attic && band && band.proposedOffsetHz !== null, 'the demo reports give one of the operator’s stations a proposal');

          await page.goto(`${BASE_URL}/stations/${attic.id}/calibrate`);
          await page.getByRole('radio', { name: 'From reports' }).locator('visible=true').click();
          await visibleText(page, /Receivers heard you/).waitFor();
          await visibleText(page, /As heard now/).waitFor();
          await visibleText(page, /After applying/).waitFor();
          await visibleText(page, /^Stability on /).waitFor();
          await visibleText(page, /^Verdict: (steady|drifts as it warms|wanders|too few reports)/).waitFor();
          await screenshot(page, `e2e-calibration-reports-${viewport.name}`);
          await visibleText(page, /^Stability on /).scrollIntoViewIfNeeded();
          await screenshot(page, `e2e-calibration-stability-${viewport.name}`);
          assert.deepEqual(await axeFindings(page), [], 'axe findings on the proposal');

          await page
            .getByRole('button', { name: new RegExp(`^Apply .* to `) })
            .locator('visible=true')
            .first()
            .click();
          const dialog = page.getByRole('dialog');
          await dialog.waitFor();
          await screenshot(page, `e2e-calibration-reports-confirm-${viewport.name}`);
          assert.deepEqual(await axeFindings(page), [], 'axe findings on the confirm dialog');
          const saved = page.waitForResponse((r) => r.url().endsWith(`/api/stations/${attic.id}/calibration`) && r.status() === 200);
          await dialog.getByRole('button', { name: 'Apply offset' }).click();
          await saved;
          await visibleText(page, /^Applied /).waitFor();
          await screenshot(page, `e2e-calibration-reports-applied-${viewport.name}`);

          const station = (await getJson(page, `/stations/${attic.id}`)) as {
            bands: { bandId: string; calibrationOffsetHz: number; calibrationSource: string }[];
          };
          const applied = station.bands.find((b) => b.bandId === band.bandId)!;
          assert.equal(applied.calibrationOffsetHz, band.proposedOffsetHz);
          assert.equal(applied.calibrationSource, 'reports');
          const log = (await getJson(page, '/audit')) as { action: string }[];
          assert.ok(log.some((e) => e.action === 'calibration.save'));
          // reports heard before the new calibration no longer count on that band
          const after = (await getJson(page, `/stations/${attic.id}/calibration/from-reports`)) as { bands: BandResult[] };
          assert.equal(after.bands.find((b) => b.bandId === band.bandId)!.proposedOffsetHz, null);
          assert.deepEqual(browser.errors, []);
        } finally {
          await browser.close();
        }
      },
    );
  }
});
