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

/** The newest link of this kind in a mail to `to`, from the local test inbox. */
async function mailedLink(to: string, route: string): Promise<string> {
  const deadline = Date.now() + 15_000;
  while (Date.now() < deadline) {
    const messages = (await (await fetch(`${BASE_URL}/dev/inbox/messages.json`)).json()) as { to: string[]; text: string }[];
    const mail = [...messages].reverse().find((m) => m.to.join(' ').includes(to) && m.text.includes(route));
    const found = mail?.text.match(new RegExp(`https?://[^\\s]*${route}\\?token=[^\\s]+`));
    if (found) return found[0];
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no ${route} mail to ${to}`);
}

const emailField = (page: Page) => page.getByLabel('E-mail', { exact: true }).locator('visible=true').first();
const button = (page: Page, name: string) => page.getByRole('button', { name, exact: true }).locator('visible=true').first();

for (const viewport of VIEWPORTS) {
  describe(`own account in the browser at ${viewport.width}×${viewport.height}`, () => {
    it('changes the password and signs in with it, moves the sign-in e-mail through the mailed link, then deletes the account', async () => {
      const browser = await openBrowser(viewport);
      const { page } = browser;
      const v = viewport.name;
      const email = `e2e-account-${v}@test.faintline.example`;
      const moved = `e2e-moved-${v}@test.faintline.example`;
      try {
        // — a new account (registered from the page, so the browser holds its session)
        await page.goto(`${BASE_URL}/sign-in`);
        await visibleText(page, 'Open the local test inbox').waitFor(); // a development build shows it
        const registered = await page.evaluate(
          async (body) =>
            (await fetch('/api/auth/register', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body })).status,
          JSON.stringify({ email, password: 'first-password-1', displayName: 'Quill Tester' }),
        );
        assert.equal(registered, 201);
        await page.goto(`${BASE_URL}/settings`);
        await visibleText(page, 'Sign-in e-mail').waitFor();
        await visibleText(page, 'Reception reports stay').waitFor(); // what deletion takes has loaded
        await screenshot(page, `account-settings-${v}`);

        // — change password: a wrong current password is refused beside its field; Enter submits
        const current = page.getByLabel('Current password', { exact: true });
        assert.equal(await current.getAttribute('spellcheck'), 'false');
        assert.equal(await current.getAttribute('autocomplete'), 'current-password');
        await current.fill('not-my-password');
        await page.getByLabel('New password', { exact: true }).fill('second-password-2');
        await page.getByLabel('New password', { exact: true }).press('Enter');
        await visibleText(page, 'This is not your current password').waitFor();
        await current.fill('first-password-1');
        await current.press('Enter');
        const changed = page.getByRole('status').filter({ hasText: 'Password changed.' });
        await changed.waitFor();
        assert.ok(await changed.isVisible());
        await screenshot(page, `account-password-changed-${v}`);

        // — sign out, and in again with the new password
        await button(page, 'Sign out').click();
        await page.getByRole('button', { name: 'Sign in' }).waitFor();
        await signIn(page, email, 'first-password-1');
        await visibleText(page, 'Wrong e-mail or password').waitFor();
        await signIn(page, email, 'second-password-2');
        await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));

        // — change e-mail: nothing changes until the link mailed to the new address is opened
        await page.goto(`${BASE_URL}/settings`);
        await page.getByLabel('New e-mail', { exact: true }).fill(moved);
        await page.getByLabel('Your password', { exact: true }).fill('second-password-2');
        await button(page, 'Send confirmation link').click();
        await visibleText(page, `We sent a confirmation link to ${moved}`).waitFor();
        await visibleText(page, `Waiting for you to open the link we sent to ${moved}`).waitFor();
        await screenshot(page, `account-email-pending-${v}`);
        const confirmLink = await mailedLink(moved, '/confirm-email');
        await page.goto(`${BASE_URL}/dev/inbox`);
        await page.locator(`a[href="${confirmLink}"]`).first().click();
        await visibleText(page, `Your sign-in e-mail is now ${moved}.`).waitFor();
        await screenshot(page, `account-email-confirmed-${v}`);
        await page.getByRole('link', { name: 'Back to settings' }).click();
        await visibleText(page, `You sign in with ${moved}`).waitFor();

        // — "Forgot password" carries the typed e-mail over
        // (a fresh load, so signing out lands on the sign-in screen rather than the confirmation page below in the stack)
        await page.goto(`${BASE_URL}/settings`);
        await button(page, 'Sign out').click();
        await page.getByRole('button', { name: 'Sign in' }).waitFor();
        await emailField(page).fill(moved);
        await page.getByRole('link', { name: 'Forgot your password?' }).click();
        await page.waitForURL(/\/forgot-password/);
        await visibleText(page, 'Reset your password').waitFor();
        assert.equal(await emailField(page).inputValue(), moved);

        // — delete the account: the password, then one more question; afterwards it cannot sign in
        await signIn(page, moved, 'second-password-2');
        await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
        await page.goto(`${BASE_URL}/settings`);
        await visibleText(page, 'Reception reports stay').waitFor();
        await page.getByLabel('Type your password to confirm', { exact: true }).fill('second-password-2');
        await button(page, 'Delete my account…').click();
        await visibleText(page, 'Delete your account for good?').waitFor();
        await screenshot(page, `account-delete-dialog-${v}`);
        await button(page, 'Delete my account').click();
        await page.getByRole('button', { name: 'Sign in' }).waitFor();
        await signIn(page, moved, 'second-password-2');
        await visibleText(page, 'Wrong e-mail or password').waitFor();
        assert.deepEqual(browser.errors, []);
      } catch (failure) {
        await failureScreenshot(page, `account-failed-${v}`);
        throw failure;
      } finally {
        await browser.close();
      }
    });
  });
}
