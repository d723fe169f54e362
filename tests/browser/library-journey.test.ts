import { readFileSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { artifactPath, browserAvailability, closeAppInBrowser, launchBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { createUser, type TestUser } from '../helpers/factories.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();
// templates/pint-can-stove.json: the example starts as this name, with 16 jets of 3/16 in.
const PINT_NAME = 'Alder Street pint-can stove';

async function signIn(page: Page, server: TestServer, user: Pick<TestUser, 'email' | 'password'>, next: string) {
  await page.goto(`${server.url}/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel('E-mail').fill(user.email);
  await page.getByLabel('Password').fill(user.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** No sideways scrolling on the page as a whole. */
async function overflowX(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

describe.skipIf(skip)('a maker saves, versions, restores and shares a design', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  let designId = '';
  let shareLink = '';

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  const jets = () => page.getByRole('group', { name: 'Secondary jets' }).getByLabel('Holes (positions)');
  const row = () => page.getByRole('row').filter({ hasText: PINT_NAME });

  it('signs in, starts from the pint example and saves it to the library', async () => {
    const maker = await createUser(server, { name: 'Rowan Tinsmith' });
    await signIn(page, server, maker, '/design');
    await page.getByRole('heading', { name: 'Design a stove' }).waitFor();
    expect(await page.getByLabel('Design name').inputValue()).toBe(PINT_NAME);
    await page.getByRole('button', { name: 'Save as new design' }).click();
    await page.getByText(`Saved “${PINT_NAME}” to your library as a new design.`).waitFor();
    await page.getByRole('button', { name: 'Save new version' }).waitFor();
    await page.screenshot({ path: artifactPath('library-save-bar-1280.png') });
  });

  it('finds it in the library and opens it in the designer', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Library' }).click();
    await page.getByRole('heading', { name: 'Your library' }).waitFor();
    await expect.poll(() => row().count()).toBe(1);
    expect(await row().textContent()).toContain('Never'); // not printed yet
    await row().getByRole('button', { name: 'Open' }).click();
    await page.getByRole('heading', { name: 'Design a stove' }).waitFor();
    expect(await jets().inputValue()).toBe('16');
  });

  it('saves 18 jets as version 2 and sees the change in the history', async () => {
    await jets().fill('18');
    await page.getByLabel('Version note (optional)').fill('Two more jets');
    await page.getByRole('button', { name: 'Save new version' }).click();
    await page.getByText('Saved version 2.').waitFor();

    await page.getByRole('link', { name: 'History' }).click();
    await page.getByRole('heading', { name: PINT_NAME, level: 1 }).waitFor();
    designId = new URL(page.url()).pathname.split('/').pop() ?? '';
    expect(designId).not.toBe('');
    const versions = page.getByRole('list', { name: 'Versions' }).getByRole('listitem').filter({ has: page.getByRole('heading', { level: 3 }) });
    await expect.poll(() => versions.count()).toBe(2);
    // Newest first. Worked arithmetic: 16 jets + 2 = 18, drilled 3/16 in as in the template.
    const newest = page.getByRole('list', { name: 'Changes in version 2' });
    expect(await newest.textContent()).toContain('jets: 16 -> 18 holes of 3/16 in');
    expect(await page.getByText('“Two more jets”').count()).toBe(1);
  });

  it('restores version 1 as version 3, which opens with 16 jets again', async () => {
    await page.getByRole('button', { name: 'Restore this version' }).click();
    await page.getByText('Version 1 restored as version 3.').waitFor();
    // Worked arithmetic: going back from 18 jets to the 16 of version 1.
    expect(await page.getByRole('list', { name: 'Changes in version 3' }).textContent()).toContain('jets: 18 -> 16 holes of 3/16 in');
    await page.getByRole('button', { name: 'Open in the designer' }).click();
    await page.getByRole('heading', { name: 'Design a stove' }).waitFor();
    expect(await jets().inputValue()).toBe('16');
  });

  it('turns sharing on and reads the full link', async () => {
    await page.goto(`${server.url}/library/${designId}`);
    await page.getByRole('button', { name: 'Share a link' }).click();
    const link = page.getByLabel(/Share link/);
    await link.waitFor();
    shareLink = await link.inputValue();
    expect(shareLink).toMatch(new RegExp(`^${server.url}/shared/[^/]+$`));
    await page.screenshot({ path: artifactPath('library-history-1280.png'), fullPage: true });

    await page.goto(`${server.url}/library`);
    await expect.poll(() => row().getByText('Shared').count()).toBe(1);
    expect(await row().textContent()).toContain('3'); // version 3
    await page.screenshot({ path: artifactPath('library-1280.png'), fullPage: true });
  });

  it('shows the library and history on a phone screen without sideways scrolling', async () => {
    const phone = await browser.newPage();
    try {
      await phone.setViewportSize({ width: 390, height: 844 });
      await phone.goto(`${server.url}/library`);
      await phone.getByRole('button', { name: 'Open' }).waitFor();
      expect(await overflowX(phone)).toBeLessThanOrEqual(0);
      await phone.screenshot({ path: artifactPath('library-390.png'), fullPage: true });
      await phone.goto(`${server.url}/library/${designId}`);
      await phone.getByRole('list', { name: 'Versions' }).waitFor();
      expect(await overflowX(phone)).toBeLessThanOrEqual(0);
      await phone.screenshot({ path: artifactPath('library-history-390.png'), fullPage: true });
    } finally {
      await phone.close();
    }
  });

  it('lets a visitor with no session open the link and download the PDF kit', async () => {
    const visitor = await launchBrowser();
    try {
      const guest = await visitor.newPage();
      guest.setDefaultTimeout(20_000);
      await guest.goto(shareLink);
      await guest.getByRole('heading', { name: PINT_NAME, level: 1 }).waitFor();
      const downloading = guest.waitForEvent('download');
      await guest.getByRole('button', { name: 'Download PDF kit' }).click();
      const path = artifactPath('shared-kit.pdf');
      await (await downloading).saveAs(path);
      // ISO 32000-1 section 7.5.2: a PDF file begins with the header "%PDF-".
      expect(readFileSync(path).subarray(0, 5).toString('latin1')).toBe('%PDF-');
      await guest.screenshot({ path: artifactPath('shared-design-1280.png'), fullPage: true });
      await guest.setViewportSize({ width: 390, height: 844 });
      await guest.getByRole('list', { name: 'Sheets of the kit' }).waitFor();
      expect(await overflowX(guest)).toBeLessThanOrEqual(0);
      await guest.screenshot({ path: artifactPath('shared-design-390.png'), fullPage: true });

      await guest.goto(`${server.url}/shared/not-a-real-token`);
      await guest.getByRole('heading', { name: 'This link does not work any more' }).waitFor();
    } finally {
      await visitor.close();
    }
  });

  it('keeps the design from a second maker: not found in the page, 404 from the API', async () => {
    const other = await createUser(server, { name: 'Sasha Solder' });
    const context = await launchBrowser();
    try {
      const second = await context.newPage();
      second.setDefaultTimeout(20_000);
      await signIn(second, server, other, `/library/${designId}`);
      await second.getByRole('heading', { name: 'Design not found' }).waitFor();
      const status = await second.evaluate(async (id) => (await fetch(`/api/designs/${id}`)).status, designId);
      expect(status).toBe(404);
    } finally {
      await context.close();
    }
  });
});
