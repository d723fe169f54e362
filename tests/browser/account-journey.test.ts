import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { artifactPath, browserAvailability, closeAppInBrowser, launchBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { buildUser, createUser } from '../helpers/factories.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();

describe.skipIf(skip)('account journey in Chromium', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  const user = buildUser({ name: 'Rowan Tinsmith' });
  const newPassword = 'a-brand-new-password';

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(15_000));
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  /** Opens the local mailbox page and follows the link in the newest mail with this subject. */
  async function followMailLink(subject: RegExp) {
    await page.goto(`${server.url}/dev/mail`);
    const mail = page.getByRole('article').filter({ has: page.getByRole('heading', { name: subject }) }).first();
    await mail.getByRole('link').first().click();
  }

  it('signs up and is asked to confirm the address', async () => {
    await page.goto(server.url);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Create account' }).click();
    await page.getByLabel('Name').fill(user.name);
    await page.getByLabel('E-mail').fill(user.email);
    await page.getByLabel('Password', { exact: true }).fill(user.password);
    await page.getByLabel('Password again').fill(user.password);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('heading', { name: 'Check your e-mail' }).waitFor();
    expect(await page.textContent('main')).toContain(user.email);
  });

  it('confirms the address from the mail link', async () => {
    await followMailLink(/Confirm your e-mail/);
    await page.getByRole('heading', { name: 'E-mail address confirmed' }).waitFor();
  });

  it('signs in and reaches the account page', async () => {
    await page.getByRole('link', { name: 'Sign in' }).first().click();
    await page.getByLabel('E-mail').fill(user.email);
    await page.getByLabel('Password').fill(user.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    // The name is shown in its own box, ready to change.
    expect(await page.getByLabel('Name', { exact: true }).inputValue()).toBe(user.name);
    await page.getByText('The burn log shows measurements in').waitFor();
    await page.screenshot({ path: artifactPath('account-page-1280.png'), fullPage: true });
  });

  it('saves the units preference', async () => {
    await page.getByRole('radio', { name: /Millimetres/ }).check();
    await page.getByText('Saved.').waitFor();
    await page.reload();
    expect(await page.getByRole('radio', { name: /Millimetres/ }).isChecked()).toBe(true);
  });

  it('signs out, resets a forgotten password through the mail link, and signs in with the new one', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.goto(`${server.url}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByLabel('E-mail').fill(user.email);
    await page.getByRole('button', { name: 'Send reset link' }).click();
    await page.getByText(/a reset link is on its way/).waitFor();

    await followMailLink(/Reset your Canwright password/);
    await page.getByRole('heading', { name: 'Choose a new password' }).waitFor();
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByLabel('New password again').fill(newPassword);
    await page.getByRole('button', { name: 'Save new password' }).click();
    await page.getByText('Your password is changed').waitFor();

    await page.getByLabel('E-mail').fill(user.email);
    await page.getByLabel('Password').fill(user.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('That e-mail and password do not match an account.').waitFor();

    await page.getByLabel('Password').fill(newPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
  });

  it('shows the account page on a phone screen without sideways scrolling', async () => {
    const phone = await browser.newPage();
    await phone.setViewportSize({ width: 390, height: 844 });
    await phone.goto(`${server.url}/account`);
    await phone.getByRole('heading', { name: 'Your account' }).waitFor();
    const overflow = await phone.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await phone.screenshot({ path: artifactPath('account-page-390.png'), fullPage: true });
    await phone.close();
  });

  it('lets an admin disable an account, which signs that person out', async () => {
    const admin = await createUser(server, { role: 'admin', name: 'Avery Admin' });
    const adminContext = await launchBrowser();
    try {
      const adminPage = await adminContext.newPage();
      await adminPage.goto(`${server.url}/sign-in`);
      await adminPage.getByLabel('E-mail').fill(admin.email);
      await adminPage.getByLabel('Password').fill(admin.password);
      await adminPage.getByRole('button', { name: 'Sign in' }).click();
      await adminPage.getByRole('link', { name: 'Users' }).click();
      await adminPage.getByRole('heading', { name: 'Users' }).waitFor();
      await adminPage.getByRole('button', { name: `Disable ${user.name}` }).click();
      await adminPage.getByRole('group', { name: `Disable ${user.name}?` }).getByRole('button', { name: 'Disable account' }).click();
      await adminPage.getByRole('button', { name: `Enable ${user.name}` }).waitFor();
      await adminPage.screenshot({ path: artifactPath('admin-users-1280.png'), fullPage: true });

      await page.reload();
      await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    } finally {
      await adminContext.close();
    }
  });
});
