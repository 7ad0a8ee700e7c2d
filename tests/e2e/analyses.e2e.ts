import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Page } from 'playwright-core';

import { BASE_URL, VIEWPORTS, axeFindings, openBrowser, screenshot, signIn, startServer, visibleText, type RunningServer } from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

const CLUB = 'Saltmarsh Beacon Circle';

async function look(page: Page, name: string) {
  await page.mouse.move(0, 0); // the pointer leaves the button it pressed (a hovered button is lighter)
  await screenshot(page, name);
  assert.deepEqual(await axeFindings(page), [], `axe findings on ${name}`);
}

/** A screenshot with this heading scrolled to the top of the view. */
async function shotAt(page: Page, heading: string, name: string) {
  await page
    .getByRole('heading', { name: heading, exact: true })
    .locator('visible=true')
    .first()
    .evaluate((e) => e.scrollIntoView());
  await screenshot(page, name);
}

const radio = (page: Page, group: string, name: string) =>
  page.getByRole('radiogroup', { name: group }).locator('visible=true').first().getByRole('radio', { name, exact: true });
const button = (page: Page, name: string) => page.getByRole('button', { name, exact: true }).locator('visible=true').first();
const link = (page: Page, name: string) => page.getByRole('link', { name }).locator('visible=true').first();

for (const viewport of VIEWPORTS) {
  const v = viewport.name;
  describe(`analyses in the browser at ${viewport.width}×${viewport.height}`, () => {
    it('when an operator compares the shed rig with the hilltop portable on 20 m, reads a verdict that the portable is stronger', async () => {
      const browser = await openBrowser(viewport);
      const { page } = browser;
      try {
        await signIn(page, 'second@faintline.example');
        await visibleText(page, /Overview|Stations/).waitFor();
        await page.goto(`${BASE_URL}/stations`);
        await link(page, 'Compare two stations, or one in two periods').click();
        await page.waitForURL(/\/compare$/);

        // nothing chosen yet: the form says what to fix
        await radio(page, 'Station A', 'Station A: Shed rig · Q2TRY').click();
        await button(page, 'Compare').click();
        await visibleText(page, 'Choose station B').waitFor();
        await visibleText(page, 'Choose a band').waitFor();

        await radio(page, 'Station B', 'Station B: Hilltop portable · Q2TRY/P').click();
        await radio(page, 'Band', '20 m').click();
        const answer = page.waitForResponse((r) => r.url().includes('/api/comparisons?'));
        await button(page, 'Compare').click();
        assert.equal((await answer).status(), 200);
        const verdict = page.getByTestId('comparison-verdict').locator('visible=true').first();
        await verdict.waitFor();
        const words = await verdict.innerText();
        // the demo's portable is heard about 3 dB better than the shed rig (server/db/seed/demo-receptions.ts)
        assert.match(words, /^B is \d+\.\d dB stronger \(\d+\.\d to \d+\.\d dB\), from \d+ common reports\./);
        await visibleText(page, 'By direction from A').waitFor();
        await visibleText(page, 'Heard B only (Q2TRY/P)').waitFor();
        await verdict.scrollIntoViewIfNeeded();
        assert.deepEqual(browser.errors, []);
        await look(page, `compare-${v}`);
        await shotAt(page, 'By direction from A', `compare-sectors-${v}`);
        await shotAt(page, 'Heard A only (Q2TRY)', `compare-one-side-${v}`);

        // one station in two periods: the week before the demo has no reports, so it claims nothing
        await radio(page, 'What to compare', 'One station, two periods').click();
        await radio(page, 'Station', 'Station: Shed rig · Q2TRY').click();
        const again = page.waitForResponse((r) => r.url().includes('/api/comparisons?') && r.url().includes('aFrom='));
        await button(page, 'Compare').click();
        assert.equal((await again).status(), 200);
        await page
          .getByText(/^Too few to say/)
          .locator('visible=true')
          .first()
          .waitFor();
        await look(page, `compare-periods-${v}`);
      } finally {
        await browser.close();
      }
    });

    it('when the club admin opens the club’s reach, sees the member stations, the listening posts and the open bands; a member is refused', async () => {
      const admin = await openBrowser(viewport);
      const member = await openBrowser(viewport);
      try {
        await signIn(admin.page, 'admin@faintline.example');
        await visibleText(admin.page, /Overview|Stations/).waitFor();
        await admin.page.goto(`${BASE_URL}/club`);
        await link(admin.page, CLUB).click(); // the row is a link named by what it shows
        await admin.page.waitForURL(/\/club\/\d+$/);
        const clubId = Number(admin.page.url().match(/\/club\/(\d+)$/)![1]);
        await link(admin.page, `Reach of ${CLUB}`).click();
        await admin.page.waitForURL(/\/reach$/);
        await visibleText(admin.page, 'Member stations').waitFor();
        for (const name of ['Shed rig · Q2TRY', 'Hilltop portable · Q2TRY/P', 'Attic beacon · Q1IMW'])
          await visibleText(admin.page, name).waitFor();
        await visibleText(admin.page, 'The club’s listening posts').waitFor();
        await visibleText(admin.page, /^Hanne's receiver · Q3HST$/).waitFor();
        await admin.page
          .getByRole('img', { name: /^Reports by UTC hour and band\..* 20 m: [\d,]+ reports/ })
          .first()
          .waitFor();
        assert.deepEqual(admin.errors, []);
        await look(admin.page, `club-reach-${v}`);
        await shotAt(admin.page, 'Member stations', `club-reach-stations-${v}`);
        await shotAt(admin.page, 'The club’s listening posts', `club-reach-posts-${v}`);

        await signIn(member.page, 'second@faintline.example');
        await visibleText(member.page, /Overview|Stations/).waitFor();
        await member.page.goto(`${BASE_URL}/club/${clubId}/reach`);
        await visibleText(member.page, 'The club’s reach could not be loaded').waitFor();
        await visibleText(member.page, `Only the admins of ${CLUB} can do this`).waitFor();
      } finally {
        await admin.close();
        await member.close();
      }
    });
  });
}
