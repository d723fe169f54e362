import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriousViolations } from '../helpers/axe.ts';
import { artifactPath, browserAvailability, closeAppInBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { createUser, signedInClient, type TestUser } from '../helpers/factories.ts';
import type { HttpClient } from '../helpers/http-client.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();

/** No sideways scrolling on the page as a whole. */
const overflowX = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

/** An admin changes a role and disables an account, each after a confirm step that can be cancelled. */
describe.skipIf(skip)('the admin page', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  let dana: TestUser & { id: string };
  let danaHttp: HttpClient;

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
    // Alder Street Makerspace: one admin and two makers (invented names).
    const admin = await createUser(server, { role: 'admin', name: 'Avery Okafor' });
    dana = await createUser(server, { name: 'Dana Reyes' });
    await createUser(server, { name: 'Lee Marsh' });
    danaHttp = await signedInClient(server, dana);
    await page.goto(`${server.url}/sign-in?next=${encodeURIComponent('/admin/users')}`);
    await page.getByLabel('E-mail').fill(admin.email);
    await page.getByLabel('Password').fill(admin.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Users', level: 1 }).waitFor();
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  const row = () => page.getByRole('row').filter({ hasText: 'Dana Reyes' });
  const roleOnServer = async () => ((await danaHttp.get('/api/account')).body as { role: string }).role;

  it('counts the accounts with the plural right', async () => {
    // Three accounts were made above; CLDR English plurals: "one" only for 1.
    await page.getByRole('status').filter({ hasText: '3 accounts.' }).waitFor();
    await page.getByLabel('Search by name or e-mail').fill('Dana');
    await page.getByRole('status').filter({ hasText: '1 account matches.' }).waitFor();
    await page.getByLabel('Search by name or e-mail').fill('');
    await page.getByRole('status').filter({ hasText: '3 accounts.' }).waitFor();
  });

  it('asks before changing a role; Cancel changes nothing', async () => {
    await row().getByLabel('Role of Dana Reyes').selectOption('instructor');
    const ask = row().getByRole('group', { name: 'Make Dana Reyes an instructor?' });
    await ask.waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await page.screenshot({ path: artifactPath('admin-confirm-role-1280.png'), fullPage: true });
    await ask.getByRole('button', { name: 'Cancel' }).click();
    await ask.waitFor({ state: 'detached' });
    expect(await row().getByLabel('Role of Dana Reyes').inputValue()).toBe('maker');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toBe('Role of Dana Reyes');
    expect(await roleOnServer()).toBe('maker');
  });

  it('changes the role once confirmed and says so', async () => {
    await row().getByLabel('Role of Dana Reyes').selectOption('instructor');
    await row().getByRole('button', { name: 'Make instructor' }).click();
    await row().getByRole('status').filter({ hasText: 'Dana Reyes is now an instructor.' }).waitFor();
    expect(await row().getByLabel('Role of Dana Reyes').inputValue()).toBe('instructor');
    expect(await roleOnServer()).toBe('instructor');
  });

  it('asks before disabling, with the focus on Cancel; once confirmed the person is signed out', async () => {
    await row().getByRole('button', { name: 'Disable Dana Reyes' }).click();
    const ask = row().getByRole('group', { name: 'Disable Dana Reyes?' });
    await ask.waitFor();
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Cancel');
    await page.keyboard.press('Enter'); // Cancel, from the keyboard
    await ask.waitFor({ state: 'detached' });
    expect((await danaHttp.get('/api/account')).status).toBe(200);

    await row().getByRole('button', { name: 'Disable Dana Reyes' }).click();
    await ask.getByRole('button', { name: 'Disable account' }).click();
    await row().getByRole('status').filter({ hasText: 'Account disabled: Dana Reyes is signed out and cannot sign in.' }).waitFor();
    await row().getByText('Disabled', { exact: true }).waitFor();
    // better-auth's admin plugin ends the sessions of a banned user: her next request is refused.
    expect((await danaHttp.get('/api/account')).status).toBe(401);
    await page.screenshot({ path: artifactPath('admin-users-1280.png'), fullPage: true });
  });

  it('enables the account again without a second step', async () => {
    await row().getByRole('button', { name: 'Enable Dana Reyes' }).click();
    await row().getByRole('status').filter({ hasText: 'Account enabled: Dana Reyes can sign in again.' }).waitFor();
    expect((await signedInClient(server, dana).then((c) => c.get('/api/account'))).status).toBe(200);
  });

  it('fits a 390 x 844 phone without sideways scrolling, each account a card', async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    try {
      await page.reload();
      await page.getByRole('heading', { name: 'Users', level: 1 }).waitFor();
      await row().getByRole('button', { name: 'Disable Dana Reyes' }).waitFor();
      expect(await overflowX(page)).toBeLessThanOrEqual(0);
      // Every control of the card is inside the screen's width.
      for (const control of [row().getByLabel('Role of Dana Reyes'), row().getByRole('button', { name: 'Disable Dana Reyes' })]) {
        const box = await control.boundingBox();
        expect(box && box.x >= 0 && box.x + box.width <= 390, JSON.stringify(box)).toBe(true);
      }
      await row().getByRole('button', { name: 'Disable Dana Reyes' }).click();
      await row().getByRole('group', { name: 'Disable Dana Reyes?' }).waitFor();
      expect(await overflowX(page)).toBeLessThanOrEqual(0);
      expect(await seriousViolations(page)).toEqual([]);
      await page.screenshot({ path: artifactPath('admin-users-390.png'), fullPage: true });
      await row().getByRole('button', { name: 'Cancel' }).click();
    } finally {
      await page.setViewportSize({ width: 1280, height: 800 });
    }
  });
});
