import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { artifactPath, browserAvailability, closeAppInBrowser, launchBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { createUser } from '../helpers/factories.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();
const storageKey = 'canwright.printerProfile.v1';

/** Fetches a URL from inside the page, as the download link would, and reports what came back. */
async function fetchFromPage(page: Page, href: string) {
  return page.evaluate(async (url) => {
    const response = await fetch(url);
    const bytes = new Uint8Array(await response.arrayBuffer());
    return { status: response.status, type: response.headers.get('content-type'), head: String.fromCharCode(...bytes.slice(0, 5)) };
  }, href);
}

async function expectNoSidewaysScroll(page: Page) {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
}

async function measure(page: Page, name: string, acrossMm: string, downMm: string) {
  await page.getByLabel('Across the page (mm)').fill(acrossMm);
  await page.getByLabel('Down the page (mm)').fill(downMm);
  await page.getByLabel('Printer name').fill(name);
}

describe.skipIf(skip)('printer calibration in Chromium', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(15_000));
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  describe('as a visitor', () => {
    it('opens from the main navigation', async () => {
      await page.goto(server.url);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Printer' }).click();
      await page.getByRole('heading', { name: 'Printer calibration' }).waitFor();
      await page.getByRole('heading', { name: 'Saved in this browser' }).waitFor();
    });

    it('links the calibration sheet for the chosen paper, and the link answers with a PDF', async () => {
      await page.getByLabel('Paper').selectOption('a4');
      const link = page.getByRole('link', { name: 'Download the calibration sheet (PDF)' });
      expect(await link.getAttribute('download')).not.toBeNull();
      const href = await link.getAttribute('href');
      expect(href).toBe('/api/render/calibration.pdf?paper=a4');
      const answer = await fetchFromPage(page, href ?? '');
      expect(answer.status).toBe(200);
      expect(answer.type).toBe('application/pdf');
      // ISO 32000-1, 7.5.2: a PDF file begins with the header "%PDF-".
      expect(answer.head).toBe('%PDF-');
    });

    it('says how far off the printer is while the lengths are typed', async () => {
      await page.getByLabel('Across the page (mm)').fill('152.25');
      await page.getByLabel('Down the page (mm)').fill('198.6');
      // Worked arithmetic: 152.25 / 150 = 1.015, 1.5 % long; 198.6 / 200 = 0.993, 0.7 % short.
      await page.getByText('Your printer prints 1.5 % long across.').waitFor();
      await page.getByText('Your printer prints 0.7 % short down the page.').waitFor();
    });

    it('asks to check the print dialog when a ruler is far off', async () => {
      await page.getByLabel('Across the page (mm)').fill('144');
      // Worked arithmetic: 144 / 150 = 0.96, 4 % short, past the 2 % rule of thumb (common practice, no source).
      await page.getByText('Your printer prints 4.0 % short across.').waitFor();
      await page.getByText(/check the print dialog was set to 100 %/).waitFor();
      await page.getByLabel('Across the page (mm)').fill('152.25');
      expect(await page.getByText(/check the print dialog/).count()).toBe(0);
    });

    it('refuses a length outside the accepted range, beside its field', async () => {
      await page.getByLabel('Down the page (mm)').fill('19.86');
      await page.getByRole('button', { name: 'Save in this browser' }).click();
      // shared/print/printer-profile.ts accepts 200 mm +-10 %: 180 to 220 mm (worked arithmetic).
      await page.getByText('between 180 and 220 mm').waitFor();
      expect(await page.getByLabel('Down the page (mm)').getAttribute('aria-invalid')).toBe('true');
      expect(await page.evaluate((key) => localStorage.getItem(key), storageKey)).toBeNull();
    });

    it('saves the profile in this browser, says signing in keeps it with an account, and keeps it after a reload', async () => {
      await measure(page, 'Garage inkjet', '152.25', '198.6');
      await expect.poll(() => page.getByText('is kept in this browser only').count()).toBe(1);
      await page.getByRole('button', { name: 'Save in this browser' }).click();
      await page.getByText('Saved “Garage inkjet” in this browser.').waitFor();

      await page.reload();
      const saved = page.getByRole('region', { name: 'Saved in this browser' });
      await saved.getByText('Garage inkjet').waitFor();
      expect(await saved.textContent()).toContain('152.25 mm of 150');
      // Worked arithmetic as above: +1.5 % across, -0.7 % down (shown with a minus sign, U+2212).
      expect(await saved.textContent()).toContain('+1.5 %');
      expect(await saved.textContent()).toContain('\u22120.7 %');
      const stored = await page.evaluate((key) => localStorage.getItem(key), storageKey);
      expect(JSON.parse(stored ?? 'null')).toEqual({ name: 'Garage inkjet', measuredXMm: 152.25, measuredYMm: 198.6 });
      await page.screenshot({ path: artifactPath('printer-visitor-1280.png'), fullPage: true, animations: 'disabled' });
    });

    it('fits a phone screen without sideways scrolling', async () => {
      const phone = await browser.newPage();
      await phone.setViewportSize({ width: 390, height: 844 });
      await phone.goto(`${server.url}/printer`);
      await phone.getByRole('region', { name: 'Saved in this browser' }).getByText('Garage inkjet').waitFor();
      await phone.getByLabel('Across the page (mm)').fill('152.25');
      await phone.getByText('Your printer prints 1.5 % long across.').waitFor();
      await expectNoSidewaysScroll(phone);
      await phone.screenshot({ path: artifactPath('printer-visitor-390.png'), fullPage: true, animations: 'disabled' });
      await phone.close();
    });

    it('forgets the stored profile', async () => {
      await page.getByRole('button', { name: 'Forget' }).click();
      await page.getByText('Nothing is saved in this browser yet.').waitFor();
      expect(await page.evaluate((key) => localStorage.getItem(key), storageKey)).toBeNull();
    });

    it('ignores stored data that is not a valid profile instead of failing', async () => {
      for (const bad of ['not json {', JSON.stringify({ name: 'Old', measuredXMm: '150' }), JSON.stringify({ name: 'Far off', measuredXMm: 300, measuredYMm: 200 })]) {
        await page.evaluate(([key, value]) => localStorage.setItem(key ?? '', value ?? ''), [storageKey, bad]);
        await page.reload();
        await page.getByRole('heading', { name: 'Printer calibration' }).waitFor();
        await page.getByText('Nothing is saved in this browser yet.').waitFor();
      }
      await page.evaluate((key) => localStorage.removeItem(key), storageKey);
    });
  });

  describe('as a signed-in maker', () => {
    let maker: BrowserContext;
    let makerPage: Page;

    beforeAll(async () => {
      const user = await createUser(server, { name: 'Morgan Metalwork' });
      maker = await launchBrowser();
      makerPage = await maker.newPage();
      makerPage.setDefaultTimeout(15_000);
      await makerPage.goto(`${server.url}/sign-in?next=%2Fprinter`);
      await makerPage.getByLabel('E-mail').fill(user.email);
      await makerPage.getByLabel('Password').fill(user.password);
      await makerPage.getByRole('button', { name: 'Sign in' }).click();
      await makerPage.getByRole('heading', { name: 'Printer calibration' }).waitFor();
    });
    afterAll(async () => {
      await maker?.close();
    });

    const item = (name: string) => makerPage.getByRole('list', { name: 'Your printer profiles' }).getByRole('listitem').filter({ hasText: name });

    it('saves two profiles to the account; the first becomes the default', async () => {
      await makerPage.getByRole('heading', { name: 'Your printers' }).waitFor();
      await makerPage.getByText('No printer profiles yet.').waitFor();
      expect(await makerPage.getByText('is kept in this browser only').count()).toBe(0);

      await measure(makerPage, 'Workshop laser', '151.5', '201');
      await makerPage.getByRole('button', { name: 'Save profile' }).click();
      await makerPage.getByText('Saved “Workshop laser” to your account as your default printer.').waitFor();

      await measure(makerPage, 'Office inkjet', '149.25', '199');
      await makerPage.getByRole('button', { name: 'Save profile' }).click();
      await makerPage.getByText('Saved “Office inkjet” to your account.').waitFor();

      await item('Office inkjet').waitFor();
      expect(await item('Workshop laser').getByText('Default', { exact: true }).count()).toBe(1);
      expect(await item('Office inkjet').getByText('Default', { exact: true }).count()).toBe(0);
      // Worked arithmetic: 151.5 / 150 = 1.01 (+1.0 %), 201 / 200 = 1.005 (+0.5 %).
      expect(await item('Workshop laser').textContent()).toMatch(/151\.5 mm of 150.*\+1\.0 %.*201 mm of 200.*\+0\.5 %/);
      // Worked arithmetic: 149.25 / 150 = 0.995 and 199 / 200 = 0.995, both 0.5 % short.
      expect(await item('Office inkjet').textContent()).toMatch(/149\.25 mm of 150.*\u22120\.5 %.*199 mm of 200.*\u22120\.5 %/);
    });

    it('makes the second profile the default', async () => {
      await item('Office inkjet').getByRole('button', { name: 'Make default' }).click();
      await item('Office inkjet').getByText('Default', { exact: true }).waitFor();
      expect(await item('Workshop laser').getByText('Default', { exact: true }).count()).toBe(0);
      // The API lists the default first.
      expect(await makerPage.getByRole('list', { name: 'Your printer profiles' }).getByRole('heading').first().textContent()).toContain('Office inkjet');
      await makerPage.screenshot({ path: artifactPath('printer-account-1280.png'), fullPage: true, animations: 'disabled' });
    });

    it('deletes a profile only after a second click', async () => {
      await item('Workshop laser').getByRole('button', { name: 'Delete' }).click();
      await item('Workshop laser').getByRole('button', { name: 'Keep it' }).click();
      await item('Workshop laser').getByRole('button', { name: 'Delete' }).click();
      await item('Workshop laser').getByRole('button', { name: 'Yes, delete' }).click();
      await item('Workshop laser').waitFor({ state: 'detached' });

      const answer = await makerPage.evaluate(async () => (await fetch('/api/printer-profiles')).json());
      expect(answer.profiles.map((p: { name: string; isDefault: boolean }) => [p.name, p.isDefault])).toEqual([['Office inkjet', true]]);
    });

    it('moves a profile measured in this browser before signing in into the account, and the browser forgets it', async () => {
      await makerPage.evaluate(([key, value]) => localStorage.setItem(key ?? '', value ?? ''), [storageKey, JSON.stringify({ name: 'Garage inkjet', measuredXMm: 152.25, measuredYMm: 198.6 })]);
      await makerPage.reload();
      const offer = makerPage.getByRole('region', { name: /Measured in this browser before you signed in/ });
      await offer.getByText('Garage inkjet').waitFor();
      await offer.getByRole('button', { name: 'Keep it with my account' }).click();
      await item('Garage inkjet').waitFor();
      await offer.waitFor({ state: 'detached' });
      expect(await makerPage.evaluate((key) => localStorage.getItem(key), storageKey)).toBeNull();
      const answer = await makerPage.evaluate(async () => (await fetch('/api/printer-profiles')).json());
      const moved = answer.profiles.find((p: { name: string }) => p.name === 'Garage inkjet');
      expect([moved.measuredXMm, moved.measuredYMm]).toEqual([152.25, 198.6]);
    });

    it('shows the saved profiles on a phone screen without sideways scrolling', async () => {
      const phone = await maker.newPage();
      await phone.setViewportSize({ width: 390, height: 844 });
      await phone.goto(`${server.url}/printer`);
      await phone.getByRole('list', { name: 'Your printer profiles' }).getByText('Office inkjet').waitFor();
      await expectNoSidewaysScroll(phone);
      await phone.screenshot({ path: artifactPath('printer-account-390.png'), fullPage: true, animations: 'disabled' });
      await phone.close();
    });
  });
});
