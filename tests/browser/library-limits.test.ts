import { readFileSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_TAGS } from '../../shared/library/library-schemas.ts';
import { artifactPath, browserAvailability, closeAppInBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { createUser, signedInClient } from '../helpers/factories.ts';
import type { HttpClient } from '../helpers/http-client.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();
const overflowX = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

/**
 * Nothing typed in the library is cut short in silence: a value past the API's limit
 * (shared/library/library-schemas.ts: names 120, tags 40 and 20 per design, searches 100)
 * stays as typed with a message at its field; a tag already there says so; copying the share
 * link says it did, or selects the link when the browser will not copy.
 */
describe.skipIf(skip)('library limits, tags and the share link', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  let api: HttpClient;
  let designId = '';
  const template = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));
  const NAME = template.name as string;

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
    const maker = await createUser(server, { name: 'Rowan Tinsmith' });
    api = await signedInClient(server, maker);
    const created = await api.post('/api/designs', { document: template, tags: ['pint', 'build night'] });
    designId = created.body.id;
    await page.goto(`${server.url}/sign-in?next=%2Flibrary`);
    await page.getByLabel('E-mail').fill(maker.email);
    await page.getByLabel('Password').fill(maker.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Your library', level: 1 }).waitFor();
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  const nameOnServer = async () => ((await api.get(`/api/designs/${designId}`)).body as { name: string }).name;
  const tagsOnServer = async () => ((await api.get(`/api/designs/${designId}`)).body as { tags: string[] }).tags;

  it('keeps a 121-character name as typed, says the limit, and saves nothing until it fits', async () => {
    const row = page.getByRole('row').filter({ hasText: NAME });
    await row.getByRole('button', { name: 'Rename' }).click();
    const input = page.getByLabel(`New name for ${NAME}`);
    const long = 'Alder Street Thursday build-night stove, second batch, with the wider jets and the taller pot stand for the big kettle!'.padEnd(121, '!');
    expect(long).toHaveLength(121);
    await input.fill(long);
    await page.getByText('Use at most 120 characters; this has 121.').waitFor();
    expect(await input.inputValue()).toBe(long); // not cut to 120
    expect(await input.getAttribute('aria-invalid')).toBe('true');
    await page.getByRole('button', { name: 'Save name' }).click();
    await page.waitForTimeout(300);
    expect(await nameOnServer()).toBe(NAME);
    await page.screenshot({ path: artifactPath('library-limits-rename-1280.png'), fullPage: true });

    await input.fill('Thursday pint stove');
    expect(await page.getByText(/Use at most 120 characters/).count()).toBe(0);
    await page.getByRole('button', { name: 'Save name' }).click();
    await page.getByRole('link', { name: 'Thursday pint stove' }).waitFor();
    expect(await nameOnServer()).toBe('Thursday pint stove');
  });

  it('keeps a search past 100 characters in its field, says so, and keeps the list', async () => {
    const search = page.getByLabel('Search names and tags');
    await search.fill('p'.repeat(101));
    await page.getByText('Use at most 100 characters; this has 101.').waitFor();
    expect(await search.inputValue()).toHaveLength(101);
    await page.waitForTimeout(400); // past the search delay: nothing was sent, the list is still there
    expect(await page.getByRole('link', { name: 'Thursday pint stove' }).isVisible()).toBe(true);
    expect(await page.getByText(/could not be loaded/).count()).toBe(0);
    await search.fill('');
  });

  it('says a tag is already there, in any case, and sends nothing', async () => {
    await page.goto(`${server.url}/library/${designId}`);
    await page.getByRole('heading', { name: 'Thursday pint stove', level: 1 }).waitFor();
    const tag = page.getByLabel(/^New tag/);
    await tag.fill('  PINT ');
    await page.getByText('“pint” is already a tag of this design.').waitFor();
    await page.getByRole('button', { name: 'Add tag' }).click();
    await page.waitForTimeout(300);
    expect(await tag.inputValue()).toBe('  PINT ');
    expect(await tagsOnServer()).toEqual(['pint', 'build night']);

    await tag.fill('x'.repeat(41));
    await page.getByText('Use at most 40 characters; this has 41.').waitFor();
    await tag.fill('');
    await page.getByRole('button', { name: 'Add tag' }).click();
    await page.getByText('Type a tag to add.').waitFor();

    await tag.fill('Tall pot');
    await page.getByRole('button', { name: 'Add tag' }).click();
    await page.getByRole('button', { name: 'Remove tag tall pot' }).waitFor();
    // The list shows the tag as the save's answer arrives; the field empties just after.
    await expect.poll(() => tag.inputValue()).toBe('');
    expect(await tagsOnServer()).toEqual(['pint', 'build night', 'tall pot']);
  });

  it(`says a design is full at ${MAX_TAGS} tags`, async () => {
    const twenty = Array.from({ length: MAX_TAGS }, (_, i) => `batch ${i + 1}`);
    expect((await api.patch(`/api/designs/${designId}`, { tags: twenty })).status).toBe(200);
    await page.reload();
    await page.getByRole('button', { name: 'Remove tag batch 20' }).waitFor();
    await page.getByLabel(/^New tag/).fill('one more');
    await page.getByText(`A design can have at most ${MAX_TAGS} tags. Remove one to add another.`).waitFor();
    await page.getByRole('button', { name: 'Add tag' }).click();
    await page.waitForTimeout(300);
    expect(await tagsOnServer()).toEqual(twenty);
    expect(await page.getByLabel(/^New tag/).inputValue()).toBe('one more');
  });

  it('confirms a copied share link in a live status, and selects the link when the clipboard is refused', async () => {
    await browser.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: server.url });
    await page.getByRole('button', { name: 'Share a link' }).click();
    const link = page.getByLabel(/Share link/);
    await link.waitFor();
    const url = await link.inputValue();
    await page.getByRole('button', { name: 'Copy link' }).click();
    await page.getByRole('status').filter({ hasText: 'Link copied.' }).waitFor();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(url);
    await page.screenshot({ path: artifactPath('library-share-copied-1280.png'), fullPage: true });

    // A browser that refuses the clipboard (as a page served without HTTPS, or a denied permission, does).
    await page.evaluate(() => {
      navigator.clipboard.writeText = () => Promise.reject(new DOMException('Write permission denied.', 'NotAllowedError'));
    });
    await page.getByRole('button', { name: 'Copy link' }).click();
    await page.getByRole('status').filter({ hasText: 'This browser would not copy the link, so it is selected' }).waitFor();
    const selection = await link.evaluate((input: HTMLInputElement) => ({ focused: document.activeElement === input, from: input.selectionStart, to: input.selectionEnd, length: input.value.length }));
    expect(selection).toEqual({ focused: true, from: 0, to: url.length, length: url.length });
  });

  it('shows the library and a design on a 390 x 844 phone without sideways scrolling', async () => {
    const phone = await browser.newPage();
    try {
      await phone.setViewportSize({ width: 390, height: 844 });
      await phone.goto(`${server.url}/library`);
      await phone.getByRole('button', { name: 'Rename' }).click();
      await phone.getByLabel(/^New name for/).fill('n'.repeat(130));
      await phone.getByText('Use at most 120 characters; this has 130.').waitFor();
      expect(await overflowX(phone)).toBeLessThanOrEqual(0);
      await phone.screenshot({ path: artifactPath('library-limits-390.png'), fullPage: true });
      await phone.goto(`${server.url}/library/${designId}`);
      await phone.getByLabel(/^New tag/).fill('batch 3');
      await phone.getByText('“batch 3” is already a tag of this design.').waitFor();
      expect(await overflowX(phone)).toBeLessThanOrEqual(0);
      await phone.screenshot({ path: artifactPath('library-history-limits-390.png'), fullPage: true });
    } finally {
      await phone.close();
    }
  });
});
