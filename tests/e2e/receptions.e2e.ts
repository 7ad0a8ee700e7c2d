import assert from 'node:assert/strict';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { after, before, describe, it } from 'node:test';
import type { Page } from 'playwright-core';

import { BASE_URL, VIEWPORTS, openBrowser, screenshot, signIn, startServer, visibleText, type RunningServer } from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(async () => {
  await server.stop();
});

async function callApi(page: Page, method: string, apiPath: string, body?: unknown) {
  return page.evaluate(
    async ({ method, apiPath, body }) => {
      const res = await fetch(`/api${apiPath}`, {
        method,
        credentials: 'include',
        headers: { 'Content-Type': 'application/json' },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      const text = await res.text();
      return { status: res.status, body: text ? JSON.parse(text) : null };
    },
    { method, apiPath, body },
  );
}

/**
 * A file in no layout Faintline knows: tab-separated, receiver first, time as epoch seconds, frequency
 * in MHz, and a "comment" column the import must leave alone. Fictional receivers in real squares.
 */
function reportsFile(callsign: string, label: string): string {
  const receivers = [
    ['Q2ROB', 'JO62QM'],
    ['Q5KIW', 'FN31PR'],
    ['Q3MAR', 'PF95IB'],
    ['Q4SUN', 'QF56OD'],
    ['Q6LUZ', 'GG66RO'],
  ];
  const lines = ['heard_by\tgrid\twhen\ttx\tmhz\tsnr\tdrift\tnote'];
  // slots two minutes apart over the last day, on 20 m and 40 m
  // each screen size imports its own slots (600 s apart from the other's), so neither run is all repeats
  const start = Math.floor(Date.now() / 1000 / 120) * 120 - 20 * 3600 + (label.endsWith('wide') ? 600 : 0);
  for (let i = 0; i < 60; i += 1) {
    const [rx, grid] = receivers[i % receivers.length]!;
    const slot = start + i * 1200;
    const mhz = i % 3 === 0 ? '7.040100' : '14.097100';
    lines.push([rx, grid, String(slot), callsign, mhz, String(-25 + (i % 20)), '0', label].join('\t'));
  }
  // one row with an unreadable time: rejected, the others still stored
  lines.push(['Q2ROB', 'JO62QM', 'yesterday', callsign, '14.097100', '-12', '0', label].join('\t'));
  return `${lines.join('\n')}\n`;
}

describe('reception results from an imported file', () => {
  for (const viewport of VIEWPORTS) {
    it(
      `at ${viewport.width}×${viewport.height}: upload, correct a column, watch progress, then see figures, map, chart, table and export`,
      { timeout: 240_000 },
      async () => {
        const browser = await openBrowser(viewport);
        const { page } = browser;
        try {
          await signIn(page, 'operator@faintline.example');
          await visibleText(page, /Ilse Marrow/).waitFor();
          const stations = await callApi(page, 'GET', '/stations');
          const attic = (stations.body as { id: number; name: string; callsign: string }[]).find((s) => s.name === 'Attic beacon');
          assert.ok(attic, 'the demo data has the Attic beacon');

          const dir = mkdtempSync(path.join(process.env.TMPDIR ?? tmpdir(), 'faintline-import-'));
          const filePath = path.join(dir, `decodes-${viewport.name}.tsv`);
          writeFileSync(filePath, reportsFile(attic.callsign, `e2e-${viewport.name}`));

          await page.goto(`${BASE_URL}/receivers/import`);
          const chooser = page.waitForEvent('filechooser');
          await page.getByRole('button', { name: /Choose a file/ }).click();
          await (await chooser).setFiles(filePath);

          // the proposal and the first rows
          const preview = page.waitForResponse(
            (r) => r.url().includes('/api/reception-imports/preview') && r.request().method() === 'POST',
          );
          await visibleText(page, 'How the columns are read').waitFor();
          assert.equal((await preview).status(), 200);
          await visibleText(page, 'The first rows as they will be read').waitFor();

          // correct one column: whatever the proposal made of "note", it is not used
          await page.getByRole('button', { name: 'Change what “note” holds' }).click();
          await page.getByRole('radio', { name: 'Not used' }).locator('visible=true').first().click();
          // and the frequencies are in MHz, the times in seconds since 1970
          await page.getByRole('radio', { name: 'MHz' }).click();
          await page.getByRole('radio', { name: 'Seconds since 1970' }).click();
          const again = page.waitForResponse((r) => r.url().includes('/api/reception-imports/preview'));
          await page.getByRole('button', { name: 'Read again with these settings' }).click();
          assert.equal((await again).status(), 200);
          await visibleText(page, /First \d+ rows: \d+ read/).waitFor();
          await screenshot(page, `e2e-receptions-mapping-${viewport.name}`);

          const started = page.waitForResponse((r) => /\/api\/reception-imports$/.test(r.url()) && r.request().method() === 'POST');
          await page.getByRole('button', { name: 'Start the import' }).click();
          assert.equal((await started).status(), 202);
          // the progress bar while it runs (a small file may finish at once: then the result stands)
          await page.locator('[role="progressbar"]').or(visibleText(page, 'Finished')).first().waitFor();
          await visibleText(page, 'Finished').waitFor({ timeout: 60_000 });
          await page
            .getByLabel(/^Imported: [1-9]/)
            .filter({ visible: true })
            .first()
            .waitFor();
          await page.getByLabel('Rejected: 1').filter({ visible: true }).first().waitFor();
          await page.getByRole('link', { name: 'Download the rejected rows (CSV)' }).filter({ visible: true }).first().waitFor();
          await screenshot(page, `e2e-receptions-import-done-${viewport.name}`);

          // the station's results
          const reach = page.waitForResponse((r) => r.url().includes(`/api/stations/${attic.id}/reach`) && r.status() === 200);
          await page.goto(`${BASE_URL}/stations/${attic.id}/results`);
          await reach;
          await page
            .getByLabel(/^Reports: [1-9]/)
            .filter({ visible: true })
            .first()
            .waitFor();
          await page
            .getByLabel(/^Receivers: [1-9]/)
            .filter({ visible: true })
            .first()
            .waitFor();
          await page
            .getByRole('img', { name: /World map: .* and [1-9]\d* receivers?/ })
            .filter({ visible: true })
            .first()
            .waitFor({ timeout: 30_000 });
          const firstReceiver = page.getByRole('button', { name: /^Receiver Q\d[A-Z]+ at / }).first();
          await firstReceiver.focus();
          await visibleText(page, /last heard \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/).waitFor();
          await visibleText(page, 'When each band was heard (UTC hour)').waitFor({ timeout: 30_000 });
          // the strip's words, e.g. "40 m: 1,988 reports, busiest 00–01 UTC": counts above 999 are grouped with commas
          await visibleText(page, /\d+\s*m:\s\d{1,3}(,\d{3})*\sreports,\sbusiest \d{2}–\d{2} UTC/).waitFor();
          await visibleText(page, 'SNR against distance').waitFor();
          await visibleText(page, /Q2ROB|Q5KIW|Q3MAR|Q4SUN|Q6LUZ/).waitFor();
          await screenshot(page, `e2e-receptions-results-${viewport.name}`);

          // no sideways scroll on the page
          const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
          assert.ok(overflow <= 1, `the page scrolls sideways by ${overflow} px`);

          // export: the link's CSV carries the imported reports
          const href = await page.getByRole('link', { name: 'Export CSV' }).getAttribute('href');
          assert.ok(href && href.includes('format=csv'), `export link: ${href}`);
          const csv = await page.evaluate(async (url) => (await fetch(url, { credentials: 'include' })).text(), href);
          assert.match(csv, /Q2ROB/);
          assert.deepEqual(browser.errors, []);
        } finally {
          await browser.close();
        }
      },
    );
  }
});
