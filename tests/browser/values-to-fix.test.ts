import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { browserAvailability, closeAppInBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { createUser } from '../helpers/factories.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();

/**
 * Phrases a validator writes on its own (zod 3 and 4 default messages, from memory of their
 * wording): none of them may reach a person. Our messages say what to type instead.
 */
const RAW =
  /Too (big|small)|expected (string|number|int|array|object|boolean|one of)|Invalid (input|option|type|enum|string|email|union|key|element|date)|received (NaN|undefined|null|string|number)|Unrecognized key|String must contain|Number must be|^Required$/m;

/**
 * A value that does not validate (30.5 jets, no hole count, a can 0.01 in across) keeps every
 * panel on screen with the last layout that worked, marked as not up to date; the typed value
 * survives a trip to the print screen, which refuses to print and says why.
 */
describe.skipIf(skip)('values still to fix', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  async function expectNoRawText(where: string) {
    const text = await page.evaluate(() => document.body.innerText);
    expect(text.match(RAW)?.[0], `${where}: ${text.match(new RegExp(`.{0,60}(${RAW.source}).{0,60}`, 'm'))?.[0]}`).toBeUndefined();
  }
  const jetHoles = () => page.getByRole('group', { name: 'Secondary jets' }).getByRole('spinbutton', { name: /^Holes \(positions\)/ });

  it('keeps the preview, the air panel and the print section, marked as not up to date', async () => {
    await page.goto(server.url + '/design');
    await page.getByRole('heading', { name: 'Design a stove', level: 1 }).waitFor();
    await jetHoles().fill('30.5');

    const problems = page.getByRole('region', { name: /One value needs fixing/ });
    await problems.getByText('Burn chamber › Secondary jets › Holes: needs a whole number').waitFor();
    await page.getByText('The preview shows the last layout that worked.', { exact: false }).or(page.getByText('Not up to date.').first()).first().waitFor();
    for (const what of ['This list', 'The air panel', 'This section']) {
      expect(await page.getByText(`${what} shows the last layout that worked. Fix first:`, { exact: false }).isVisible(), what).toBe(true);
    }
    // The preview still draws the last layout: its canvas is on screen and inked.
    const canvas = page.locator('canvas').first();
    expect(await canvas.isVisible()).toBe(true);
    expect(await page.getByRole('heading', { name: 'Print the kit', level: 2 }).isVisible()).toBe(true);
    expect(await page.getByRole('link', { name: 'Print the kit' }).isVisible()).toBe(true);
    expect(await page.getByRole('list', { name: 'Findings' }).or(page.getByText('No findings')).first().isVisible()).toBe(true);
    await expectNoRawText('design, holes 30.5');
  });

  it('says every other kind of bad value in the form’s words', async () => {
    const jets = page.getByRole('group', { name: 'Secondary jets' });
    await jetHoles().fill('');
    await page.getByText(/Burn chamber › Secondary jets › Holes: /).first().waitFor();
    await expectNoRawText('design, no hole count');
    await jetHoles().fill('30.5');

    await jets.getByRole('textbox', { name: /^Height of centres/ }).fill('');
    await jets.getByRole('textbox', { name: /^Height of centres/ }).blur();
    await expectNoRawText('design, empty height');

    const diameter = page.getByRole('textbox', { name: /^Diameter over the seam/ });
    await diameter.fill('0.01');
    await diameter.blur();
    await page.getByText(/Diameter over the seam.*at least/).first().waitFor();
    await expectNoRawText('design, a can 0.01 in across');
    await diameter.fill('400');
    await diameter.blur();
    await page.getByText(/Diameter over the seam.*at most/).first().waitFor();
    await expectNoRawText('design, a can 400 in across');
    await diameter.fill('3 3/16');
    await diameter.blur();

    const ratio = page.getByRole('spinbutton', { name: /^Target primary to secondary ratio/ }).or(page.getByRole('textbox', { name: /^Target primary to secondary ratio/ }));
    await ratio.fill('');
    await ratio.blur();
    await expectNoRawText('design, empty target ratio');
    await ratio.fill('99');
    await ratio.blur();
    await expectNoRawText('design, target ratio 99');
    await ratio.fill('1');
  });

  it('keeps the typed value through the print screen, which refuses to print and says why', async () => {
    await expect.poll(() => jetHoles().inputValue()).toBe('30.5');
    await page.waitForTimeout(400);
    await page.getByRole('link', { name: 'Print the kit' }).click();
    await page.getByRole('heading', { name: 'Print the kit', level: 1 }).waitFor();
    const refusal = page.getByRole('alert').filter({ hasText: 'This design has values to fix before it can print' });
    await refusal.getByText('Burn chamber › Secondary jets › Holes: needs a whole number').waitFor();
    expect(await page.getByRole('button', { name: 'Download PDF kit' }).count()).toBe(0);
    await expectNoRawText('print, refused');

    await page.getByRole('link', { name: 'Back to the design to fix them' }).click();
    await page.getByRole('heading', { name: 'Design a stove', level: 1 }).waitFor();
    await expect.poll(() => jetHoles().inputValue()).toBe('30.5');
    await page.reload();
    await page.getByRole('heading', { name: 'Design a stove', level: 1 }).waitFor();
    await expect.poll(() => jetHoles().inputValue()).toBe('30.5');

    await jetHoles().fill('16');
    await expect.poll(() => page.getByText('Not up to date.').count()).toBe(0);
    await page.getByRole('link', { name: 'Print the kit' }).click();
    await page.getByRole('button', { name: 'Download PDF kit' }).waitFor();
  });

  it('says sign-up, sign-in and reset problems in its own words', async () => {
    await page.goto(server.url + '/sign-up');
    await page.getByLabel('Name').fill('Quillon '.repeat(16)); // 128 characters, past the 100 allowed
    await page.getByLabel('E-mail').fill('not-an-address');
    await page.getByLabel('Password', { exact: true }).fill('short');
    await page.getByLabel('Password again').fill('shorter');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByText('Use at least 8 characters.').waitFor();
    await page.getByText('Use at most 100 characters.').waitFor();
    await expectNoRawText('sign-up');

    await page.goto(server.url + '/sign-in');
    await page.getByRole('button', { name: 'Sign in' }).last().click();
    await page.getByText('Enter your password.').waitFor();
    await expectNoRawText('sign-in, empty');
    const maker = await createUser(server);
    await page.getByLabel('E-mail').fill(maker.email);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).last().click();
    await page.getByRole('alert').first().waitFor();
    await expectNoRawText('sign-in, wrong password');

    await page.getByLabel('Password').fill(maker.password);
    await page.getByRole('button', { name: 'Sign in' }).last().click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    for (const path of ['/account', '/library', '/design']) {
      await page.goto(server.url + path);
      await page.getByRole('heading', { level: 1 }).waitFor();
      await page.waitForTimeout(300);
      await expectNoRawText(path);
    }
    const note = page.getByLabel('Version note (optional)');
    if ((await note.count()) === 0) {
      await page.getByRole('button', { name: 'Save as new design' }).click();
      await note.waitFor();
    }
    await note.fill('x'.repeat(501));
    await page.getByText(/at most 500 characters/).waitFor();
    await expectNoRawText('design, version note too long');
  });
});
