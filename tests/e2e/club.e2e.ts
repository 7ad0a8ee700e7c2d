import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import type { Page } from 'playwright-core';
import { BASE_URL, VIEWPORTS, openBrowser, screenshot, signIn, startServer, visibleText, type RunningServer } from './harness';

let server: RunningServer;
before(async () => {
  server = await startServer();
});
after(() => server.stop());

const CLUB = 'Saltmarsh Beacon Circle';

/** A JSON call from inside the page, with its session cookie. */
async function call<T>(page: Page, method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> {
  return page.evaluate(
    async ({ method, path, body }) => {
      const res = await fetch(path, {
        method,
        headers: body === undefined ? {} : { 'Content-Type': 'application/json' },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      const text = await res.text();
      return { status: res.status, body: text ? JSON.parse(text) : null };
    },
    { method, path, body },
  );
}

async function invitationLink(email: string): Promise<string> {
  const deadline = Date.now() + 15_000;
  while (Date.now() < deadline) {
    const res = await fetch(`${BASE_URL}/dev/inbox/messages.json`);
    const messages = (await res.json()) as { to: string | string[]; text?: string; html?: string }[];
    const mail = [...messages].reverse().find((m) => JSON.stringify(m.to).includes(email));
    const found = mail && `${mail.text ?? ''} ${mail.html ?? ''}`.match(/https?:\/\/[^\s"'<>]*\/join\?token=[^\s"'<>]+/);
    if (found) return found[0].replace(/&amp;/g, '&');
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no invitation mail for ${email}`);
}

const button = (page: Page, name: string | RegExp) => page.getByRole('button', { name }).locator('visible=true').first();
const link = (page: Page, name: string | RegExp) => page.getByRole('link', { name }).locator('visible=true').first();

for (const viewport of VIEWPORTS) {
  describe(`club screens in the browser at ${viewport.width}×${viewport.height}`, () => {
    it('when the admin invites a member who joins, reviews a filter violation, parts a collision, suspends and lifts a station, everyone sees it logged', async () => {
      const admin = await openBrowser(viewport);
      const member = await openBrowser(viewport);
      const owner = await openBrowser(viewport);
      const memberEmail = `e2e-${viewport.name}@test.faintline.example`;
      const v = viewport.name;
      try {
        // — the admin opens the club and invites someone (first with a mistyped address)
        await signIn(admin.page, 'admin@faintline.example');
        await visibleText(admin.page, /Overview|Stations/).waitFor();
        await admin.page.goto(`${BASE_URL}/club`);
        await screenshot(admin.page, `club-hub-${v}`);
        await link(admin.page, CLUB).click(); // the row is a link named by what it shows
        await admin.page.waitForURL(/\/club\/\d+$/);
        const clubId = Number(admin.page.url().match(/\/club\/(\d+)$/)![1]);
        await admin.page.getByLabel('E-mail of the person to invite').fill('not-an-address');
        await button(admin.page, 'Send invitation').click();
        await visibleText(admin.page, 'Enter a valid e-mail address').waitFor();
        await admin.page.getByLabel('E-mail of the person to invite').fill(memberEmail);
        await button(admin.page, 'Send invitation').click();
        await visibleText(admin.page, `Invitation sent to ${memberEmail}.`).waitFor();
        await visibleText(admin.page, memberEmail).waitFor(); // pending list
        await screenshot(admin.page, `club-members-${v}`);

        // — the admin raises the club's power limit, sees it saved and shown, then puts it back
        const power = admin.page.getByLabel('Power limit for members (dBm)');
        const limitBefore = await power.inputValue();
        await power.fill('61');
        await button(admin.page, 'Save club settings').click();
        await visibleText(admin.page, 'The power limit is at most 60 dBm (1 kW)').waitFor();
        await power.fill('33');
        await button(admin.page, 'Save club settings').click();
        await visibleText(admin.page, 'Saved. The review uses the new limit at once.').waitFor();
        await visibleText(admin.page, /power limit 33 dBm/).waitFor();
        await screenshot(admin.page, `club-settings-${v}`);
        const restored = await call(admin.page, 'PATCH', `/api/clubs/${clubId}`, { maxPowerDbm: Number(limitBefore) });
        assert.equal(restored.status, 200, JSON.stringify(restored.body));

        // — the new person opens the mailed link signed out, registers there and accepts
        const joinUrl = await invitationLink(memberEmail);
        await member.page.goto(joinUrl.replace(/^https?:\/\/[^/]+/, BASE_URL));
        await visibleText(member.page, 'You are invited to a club').waitFor();
        await screenshot(member.page, `club-join-signed-out-${v}`);
        await member.page.getByRole('radio', { name: 'Create account' }).click();
        await member.page.getByLabel('E-mail', { exact: true }).fill(memberEmail);
        await member.page.getByLabel('Display name', { exact: true }).fill(`Wren Tallis ${v}`);
        await member.page.getByLabel('Password', { exact: true }).fill('faintline-demo');
        await button(member.page, 'Create account').click();
        await button(member.page, 'Accept invitation').waitFor();
        await screenshot(member.page, `club-join-signed-in-${v}`);
        await button(member.page, 'Accept invitation').click();
        await visibleText(member.page, `You are now a member of ${CLUB}.`).waitFor();
        await button(member.page, 'Open the club').click();
        await member.page.waitForURL(new RegExp(`/club/${clubId}$`));
        await visibleText(member.page, /Wren Tallis/).waitFor();

        // — arrange a filter violation as the member: 20 m enabled on a unit that then loses its filters
        const unit = await call<{ id: number }>(member.page, 'POST', '/api/units', {
          name: `Porch board ${v}`,
          serialLabel: 'PB-1',
          controller: 'Wi-Fi microcontroller',
          timeSource: 'network',
          generatorKind: 'pll',
          referenceHz: 25e6,
          tolerancePpm: 10,
          tempCoPpmPerC: 0.5,
          disciplined: false,
          generatorLevelDbm: 10,
          attenuatorDb: 0,
          amplifier: null,
          filters: [{ bands: ['20m'], type: 'chebyshev-0.5', order: 5, cutoffHz: 15.6e6 }],
          antenna: { kind: 'dipole', bands: ['20m'], gainDbi: 2.15 },
          notes: '',
        });
        assert.equal(unit.status, 201, JSON.stringify(unit.body));
        const stationName = `Porch beacon ${v}`;
        const station = await call<{ id: number }>(member.page, 'POST', '/api/stations', {
          name: stationName,
          callsign: 'Q7WRT',
          locator: 'JO22',
          unitId: unit.body.id,
          transmitEnabled: true,
        });
        assert.equal(station.status, 201, JSON.stringify(station.body));
        const band = await call(member.page, 'PUT', `/api/stations/${station.body.id}/bands/20m`, {
          enabled: true,
          calibrationOffsetHz: 0,
        });
        assert.equal(band.status, 200, JSON.stringify(band.body));
        const stripped = await call(member.page, 'PATCH', `/api/units/${unit.body.id}`, { filters: [] });
        assert.equal(stripped.status, 200, JSON.stringify(stripped.body));

        // — the admin's review: filter to what needs attention, on 20 m, and read the finding
        await link(admin.page, `Review of ${CLUB}`).click();
        await admin.page.waitForURL(/\/review$/);
        await visibleText(admin.page, stationName).waitFor();
        await admin.page.getByRole('radio', { name: 'Status: Needs attention' }).click();
        await admin.page.getByRole('radio', { name: 'Band: 20 m' }).click();
        await visibleText(admin.page, /20 m is enabled, but no low-pass filter/).waitFor();
        await screenshot(admin.page, `club-review-${v}`);

        // — collisions: the seeded pair on 20 m, and a proposal to Attic beacon's owner
        await link(admin.page, `Collisions of ${CLUB}`).click();
        await admin.page.waitForURL(/\/conflicts$/);
        await visibleText(admin.page, 'Colliding pairs').waitFor();
        await visibleText(admin.page, /Attic beacon/).waitFor();
        await visibleText(admin.page, /Shed rig/).waitFor();
        await button(admin.page, /to the owner of Attic beacon$/).click();
        await visibleText(admin.page, 'Sent — waiting for the owner').waitFor();
        await screenshot(admin.page, `club-conflicts-${v}`);

        // — the owner of Attic beacon sees a notice and accepts the offset
        await signIn(owner.page, 'operator@faintline.example');
        await link(owner.page, /^Notices\W*\d+\W*unread$/).waitFor();
        const attic = (await call<{ id: number; name: string; audioOffsetHz: number }[]>(owner.page, 'GET', '/api/stations')).body.find(
          (s) => s.name === 'Attic beacon',
        )!;
        await link(owner.page, /^Notices/).click();
        await owner.page.waitForURL(/\/notices$/);
        await visibleText(owner.page, /proposes moving Attic beacon/).waitFor();
        await screenshot(owner.page, `club-notices-${v}`);
        await owner.page.goto(`${BASE_URL}/proposals`);
        await button(owner.page, /^Accept .* for Attic beacon$/).waitFor();
        await screenshot(owner.page, `club-proposals-${v}`);
        // Wait for this accept itself: an earlier screen size's accepted proposal shows the same words.
        const accepted = owner.page.waitForResponse(
          (r) => /\/api\/offset-proposals\/\d+\/accept$/.test(r.url()) && r.request().method() === 'POST',
        );
        await button(owner.page, /^Accept .* for Attic beacon$/).click();
        assert.equal((await accepted).status(), 200);
        await visibleText(owner.page, /Accepted: the station uses the new offset/).waitFor();
        const moved = (await call<{ audioOffsetHz: number }>(owner.page, 'GET', `/api/stations/${attic.id}`)).body;
        assert.notEqual(moved.audioOffsetHz, attic.audioOffsetHz);

        // — band use over the next 24 hours (chart loads lazily)
        await admin.page.goto(`${BASE_URL}/club/${clubId}/occupancy`);
        await visibleText(admin.page, 'Transmissions per hour').waitFor();
        await admin.page.locator('svg rect').first().waitFor({ state: 'attached' });
        await visibleText(admin.page, 'Per band, next 24 hours').waitFor();
        await screenshot(admin.page, `club-occupancy-${v}`);

        // — suspend the member's station (a too-short reason first), then lift it
        await admin.page.goto(`${BASE_URL}/club/${clubId}/review`);
        await button(admin.page, `Suspend ${stationName}`).click();
        await visibleText(admin.page, `Suspend ${stationName}?`).waitFor();
        await admin.page.getByLabel('Reason (the owner sees this)').fill('bad');
        await button(admin.page, 'Suspend station').click();
        await visibleText(admin.page, /at least 5 characters/).waitFor();
        await screenshot(admin.page, `club-suspend-dialog-${v}`);
        await admin.page.getByLabel('Reason (the owner sees this)').fill('20 m has no low-pass filter on the unit');
        await button(admin.page, 'Suspend station').click();
        await visibleText(admin.page, `${stationName} is suspended. Wren Tallis ${v} has been told why.`).waitFor();
        const suspended = (await call<{ suspension: unknown }>(member.page, 'GET', `/api/stations/${station.body.id}`)).body;
        assert.ok(suspended.suspension, 'the station says suspended');
        await member.page.goto(`${BASE_URL}/stations/${station.body.id}`);
        await visibleText(member.page, /Suspended by .+ of .+ since .* UTC/).waitFor();
        await button(admin.page, `Lift the stop on ${stationName}`).click();
        await visibleText(admin.page, `Let ${stationName} send again?`).waitFor();
        await screenshot(admin.page, `club-lift-dialog-${v}`);
        await button(admin.page, /^Lift the stop$/).click();
        await visibleText(admin.page, `${stationName} may send again. Wren Tallis ${v} has been told.`).waitFor();

        // — the club log (admin) and the own logs (member, owner), each with a CSV download
        await admin.page.goto(`${BASE_URL}/club/${clubId}/log`);
        await visibleText(admin.page, /Lifted the suspension of Porch beacon/).waitFor();
        await visibleText(admin.page, /Suspended Porch beacon/).waitFor();
        await visibleText(admin.page, /Proposed audio offset .* for Attic beacon/).waitFor();
        await screenshot(admin.page, `club-log-${v}`);
        const csvHref = await admin.page.getByRole('link', { name: 'Download CSV' }).locator('visible=true').first().getAttribute('href');
        assert.equal(csvHref, `/api/clubs/${clubId}/audit?format=csv`);
        const csv = await admin.page.evaluate(async (href) => (await fetch(href)).text(), csvHref!);
        assert.match(csv, /^time_utc,who,action/);
        assert.match(csv, /Suspended Porch beacon/);

        await member.page.goto(`${BASE_URL}/activity`);
        await visibleText(member.page, /Suspended Porch beacon/).waitFor();
        await visibleText(member.page, /Lifted the suspension of Porch beacon/).waitFor();
        await screenshot(member.page, `club-activity-${v}`);
        await owner.page.goto(`${BASE_URL}/activity`);
        await visibleText(owner.page, /Accepted the club's audio offset .* for Attic beacon/).waitFor();
        assert.equal(
          await owner.page.getByRole('link', { name: 'Download CSV' }).locator('visible=true').first().getAttribute('href'),
          '/api/audit?format=csv',
        );

        // put Attic beacon back, so the next screen size finds the seeded collision again
        await call(owner.page, 'PATCH', `/api/stations/${attic.id}`, { audioOffsetHz: attic.audioOffsetHz });
        assert.deepEqual([...admin.errors, ...member.errors, ...owner.errors], []);
      } catch (error) {
        // what each browser showed when it failed, for the person reading the report
        await Promise.all(
          [admin, member, owner].map((b, i) => b.page.screenshot({ path: `screenshots/club-failure-${v}-${i}.png` }).catch(() => {})),
        );
        throw error;
      } finally {
        await Promise.all([admin.close(), member.close(), owner.close()]);
      }
    });
  });
}
