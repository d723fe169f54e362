import { readFileSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { browserAvailability, closeAppInBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { createUser, signedInClient, type TestUser } from '../helpers/factories.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();
const template = (name: string) => readFileSync(new URL(`../../templates/${name}.json`, import.meta.url));
const pint = JSON.parse(template('pint-can-stove').toString('utf8'));
const no10Name: string = JSON.parse(template('no10-can-stove').toString('utf8')).name;
const metricName: string = JSON.parse(template('metric-tin-stove').toString('utf8')).name;

/**
 * Every way another design reaches the design screen keeps the work on it: the edited design is
 * put aside, listed with the reason, and brought back as it was. Signing out hides a person's work
 * from the next visitor and offers it again after they sign back in.
 */
describe.skipIf(skip)('edited work is put aside, never lost', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  const edited = 'Kestrel Lane test stove';

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
  });
  afterAll(() => closeAppInBrowser({ server, browser }));
  beforeEach(async () => {
    await browser.clearCookies();
    await page.goto(server.url);
    await page.evaluate(() => localStorage.clear());
  });

  const nameField = () => page.getByLabel('Design name');
  const asideList = () => page.getByRole('region', { name: /put aside/ });

  async function designer() {
    await page.goto(server.url + '/design');
    await page.getByRole('heading', { name: 'Design a stove', level: 1 }).waitFor();
  }
  async function editName(name = edited) {
    await nameField().fill(name);
    await page.waitForTimeout(500); // an edit becomes a step of the draft after 300 ms
  }
  async function bringBack(reason: RegExp) {
    const entry = asideList().getByRole('listitem').filter({ hasText: `“${edited}”` });
    await entry.filter({ hasText: reason }).waitFor();
    await entry.getByRole('button', { name: `Bring back “${edited}”` }).click();
    await expect.poll(() => nameField().inputValue()).toBe(edited);
  }
  async function signIn(user: TestUser) {
    await page.goto(server.url + '/sign-in');
    await page.getByLabel('E-mail').fill(user.email);
    await page.getByLabel('Password').fill(user.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
  }
  async function loadExample(id: string) {
    await page.getByLabel('Start again from an example').selectOption(id);
    await page.getByRole('button', { name: 'Load', exact: true }).click();
  }

  it('loading an example', async () => {
    await designer();
    await editName();
    await loadExample('no10-can-stove');
    await expect.poll(() => nameField().inputValue()).toBe(no10Name);
    await bringBack(/put aside when you opened the example/);
    // The example, never edited, is not kept as a second piece of work.
    await expect.poll(() => asideList().count()).toBe(0);
  });

  it('starting a new design', async () => {
    await designer();
    await editName();
    await page.getByRole('button', { name: 'New design' }).click();
    await expect.poll(() => nameField().inputValue()).toBe('New stove');
    await bringBack(/put aside when you started a new design/);
  });

  it('opening a design file, and a bad or foreign file replaces nothing', async () => {
    await designer();
    await editName();
    const input = page.getByLabel('Design file to open');
    await input.setInputFiles({ name: 'notes.json', mimeType: 'application/json', buffer: Buffer.from('{ this is not JSON') });
    await page.getByText('Nothing on screen was changed.').waitFor();
    expect(await nameField().inputValue()).toBe(edited);
    await input.setInputFiles({ name: 'printer.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify({ printer: 'office', scale: 1.002 })) });
    await page.getByText('Nothing on screen was changed.').waitFor();
    expect(await nameField().inputValue()).toBe(edited);
    expect(await asideList().count()).toBe(0);

    await input.setInputFiles({ name: 'metric-tin-stove.json', mimeType: 'application/json', buffer: template('metric-tin-stove') });
    await expect.poll(() => nameField().inputValue()).toBe(metricName);
    await bringBack(/put aside when you opened the file “metric-tin-stove\.json”/);
  });

  it('opening a copy of a shared design', async () => {
    const owner = await createUser(server);
    const api = await signedInClient(server, owner);
    const created = await api.post('/api/designs', { document: { ...pint, name: 'Birch Row shared stove' } });
    const shared = await api.post(`/api/designs/${created.body.id}/share`, {});
    await designer();
    await editName();
    await page.goto(server.url + shared.body.shareUrlPath);
    await page.getByRole('button', { name: 'Open a copy in the designer' }).or(page.getByRole('link', { name: 'Open a copy in the designer' })).click();
    await page.getByRole('heading', { name: 'Design a stove', level: 1 }).waitFor();
    await expect.poll(() => nameField().inputValue()).toBe('Birch Row shared stove');
    await bringBack(/put aside when you opened a copy of the shared design “Birch Row shared stove”/);
  });

  it('opening a design from the library', async () => {
    const maker = await createUser(server);
    const api = await signedInClient(server, maker);
    const created = await api.post('/api/designs', { document: { ...pint, name: 'Library pint stove' } });
    await signIn(maker);
    await designer();
    await editName();
    await page.goto(`${server.url}/library/${created.body.id}`);
    await page.getByRole('button', { name: 'Open version 1 in the designer' }).click();
    await page.getByRole('heading', { name: 'Design a stove', level: 1 }).waitFor();
    await expect.poll(() => nameField().inputValue()).toBe('Library pint stove');
    await bringBack(/put aside when you opened “Library pint stove” from your library/);
  });

  it('signing in carries a visitor’s work over; signing out puts it aside until they sign in again', async () => {
    const maker = await createUser(server);
    await designer();
    await editName();
    await signIn(maker);
    await designer();
    expect(await nameField().inputValue()).toBe(edited);
    expect(await asideList().count()).toBe(0);

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: 'Sign in' }).first().waitFor();
    await designer();
    // The next person at this browser sees neither the work nor that it exists.
    expect(await nameField().inputValue()).not.toBe(edited);
    expect(await asideList().count()).toBe(0);
    expect(await page.getByText(edited).count()).toBe(0);

    await signIn(maker);
    await designer();
    await bringBack(/put aside when you signed out/);
  });

  it('after opening an example, a save makes a new design and leaves the library design at one version', async () => {
    const maker = await createUser(server);
    const api = await signedInClient(server, maker);
    const created = await api.post('/api/designs', { document: { ...pint, name: 'Bound pint stove' } });
    await signIn(maker);
    await page.goto(`${server.url}/library/${created.body.id}`);
    await page.getByRole('button', { name: 'Open version 1 in the designer' }).click();
    await page.getByRole('button', { name: 'Save new version' }).waitFor();

    await loadExample('no10-can-stove');
    await expect.poll(() => nameField().inputValue()).toBe(no10Name);
    expect(await page.getByRole('button', { name: 'Save new version' }).count()).toBe(0);
    await page.getByRole('button', { name: 'Save as new design' }).click();
    await page.getByText(`Saved “${no10Name}” to your library as a new design.`).waitFor();

    const list = await api.get('/api/designs');
    expect(list.body.designs.map((d: { name: string }) => d.name).sort()).toEqual(['Bound pint stove', no10Name].sort());
    const original = await api.get(`/api/designs/${created.body.id}`);
    expect(original.body).toMatchObject({ name: 'Bound pint stove', currentVersion: 1 });
    // The new design is the one the screen is now bound to.
    await page.getByRole('button', { name: 'Save new version' }).waitFor();
  });
});
