import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Locator, Page } from 'playwright-core';
import { BASE_URL, VIEWPORTS, failureScreenshot, openBrowser, screenshot, startServer, type RunningServer } from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

const wide = VIEWPORTS.find((v) => v.name === 'wide')!;

const isFocused = (target: Locator) => target.evaluate((el) => el === document.activeElement).catch(() => false);

/** Presses Tab (or Shift+Tab) until `target` has the focus, as someone without a mouse would; fails if it is never reached. */
async function tabTo(page: Page, target: Locator, key: 'Tab' | 'Shift+Tab' = 'Tab') {
  const visible = target.locator('visible=true').first();
  await visible.waitFor();
  for (let presses = 0; presses < 80; presses++) {
    if (await isFocused(visible)) return visible;
    await page.keyboard.press(key);
  }
  throw new Error(`${target} never took the focus from ${key}`);
}

/** What has the focus, for a failure message. */
const focusedDescription = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement;
    return el
      ? `${el.tagName} ${el.getAttribute('role') ?? ''} "${el.getAttribute('aria-label') ?? el.textContent?.slice(0, 40)}"`
      : 'nothing';
  });

describe(`keyboard only at ${wide.width}×${wide.height}`, () => {
  it('signs in, creates a station, enables a band with Space, and cancels a delete dialog with Escape, focus back on its opener', async () => {
    const browser = await openBrowser(wide);
    const { page } = browser;
    const stationName = 'Keyboard beacon';
    try {
      // — sign in: Tab between the fields, Enter submits
      await page.goto(`${BASE_URL}/sign-in`);
      await tabTo(page, page.getByLabel('E-mail', { exact: true }));
      await page.keyboard.type('operator@faintline.example');
      await tabTo(page, page.getByLabel('Password', { exact: true }));
      await page.keyboard.type('faintline-demo');
      await page.keyboard.press('Enter');
      await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
      await page
        .getByText(/Ilse Marrow/)
        .locator('visible=true')
        .first()
        .waitFor();

      // — to Stations through the side rail's tab list, then the new-station form
      const stationsTab = await tabTo(page, page.getByRole('tab', { name: 'Stations' }));
      await page.keyboard.press('Enter');
      await page.waitForURL(/\/stations$/);
      assert.equal(await stationsTab.getAttribute('aria-selected'), 'true');
      await tabTo(page, page.getByRole('button', { name: 'Add station', exact: true }));
      await page.keyboard.press('Enter');
      await page.waitForURL(/\/stations\/new$/);
      await tabTo(page, page.getByLabel('Name', { exact: true }));
      await page.keyboard.type(stationName);
      await tabTo(page, page.getByLabel('Callsign', { exact: true }));
      await page.keyboard.type('q1imw');
      await tabTo(page, page.getByLabel('Locator', { exact: true }));
      await page.keyboard.type('IO91wm');
      // the unit chips are one Tab stop; the arrow keys move inside and Space chooses
      await tabTo(page, page.getByRole('radiogroup', { name: 'Unit' }).getByRole('radio').and(page.locator('[tabindex="0"]')));
      const loft = page.getByRole('radio', { name: 'Unit Loft board' }).locator('visible=true');
      for (let presses = 0; presses < 6 && !(await isFocused(loft)); presses++) await page.keyboard.press('ArrowRight');
      assert.ok(await isFocused(loft), `the arrow keys did not reach Loft board (focus on ${await focusedDescription(page)})`);
      await page.keyboard.press('Space');
      assert.equal(await loft.getAttribute('aria-checked'), 'true');
      await screenshot(page, 'e2e-keyboard-new-station-wide');
      await tabTo(page, page.getByLabel('Name', { exact: true }), 'Shift+Tab');
      await page.keyboard.press('Enter'); // Enter in a field submits the form
      await page.waitForURL(/\/stations\/\d+$/);
      await page.getByText(stationName).locator('visible=true').first().waitFor();

      // — bands: Space flips the 40 m switch, and the server keeps it
      await tabTo(page, page.getByRole('button', { name: 'Bands and calibration' }));
      await page.keyboard.press('Enter');
      await page.waitForURL(/\/bands$/);
      const forty = await tabTo(page, page.getByRole('switch', { name: 'Enable 40 m' }));
      assert.equal(await forty.getAttribute('aria-checked'), 'false');
      await page.keyboard.press('Space');
      await page.getByText('40 m is enabled').locator('visible=true').first().waitFor();
      assert.equal(await forty.getAttribute('aria-checked'), 'true');
      const stationId = Number(new URL(page.url()).pathname.split('/')[2]);
      const bands = await page.evaluate(async (id) => (await (await fetch(`/api/stations/${id}`)).json()) as unknown, stationId);
      assert.match(JSON.stringify(bands), /"bandId":"40m","enabled":true/);
      await screenshot(page, 'e2e-keyboard-bands-wide');

      // — back to the station, open the delete dialog, Escape cancels it and the focus returns to Delete
      await tabTo(page, page.getByRole('button', { name: /back/i }), 'Shift+Tab');
      await page.keyboard.press('Enter');
      await page.waitForURL(/\/stations\/\d+$/);
      const deleteButton = await tabTo(page, page.getByRole('button', { name: `Delete ${stationName}` }));
      await page.keyboard.press('Enter');
      const dialog = page.getByRole('dialog');
      await dialog.waitFor();
      assert.ok(
        await dialog.evaluate((el) => el.contains(document.activeElement)),
        `the focus stayed outside the dialog (on ${await focusedDescription(page)})`,
      );
      await screenshot(page, 'e2e-keyboard-delete-dialog-wide');
      await page.keyboard.press('Escape');
      await dialog.waitFor({ state: 'detached' });
      assert.ok(await isFocused(deleteButton), `the focus went to ${await focusedDescription(page)}, not back to Delete`);
      // nothing was deleted
      assert.equal(await page.evaluate(async (id) => (await fetch(`/api/stations/${id}`)).status, stationId), 200);
      assert.deepEqual(browser.errors, []);
    } catch (failure) {
      await failureScreenshot(page, 'e2e-keyboard-failed-wide');
      throw failure;
    } finally {
      await browser.close();
    }
  });
});
