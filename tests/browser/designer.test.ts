import { readFileSync } from 'node:fs';
import { PDFDocument } from 'pdf-lib';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { artifactPath, browserAvailability, closeAppInBrowser, openAppInBrowser } from '../helpers/browser.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();
const PT_PER_MM = 72 / 25.4;

describe.skipIf(skip)('a visitor designs a stove and prints it', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  it('starts from the landing page without an account and sees the layout and its checks', async () => {
    await page.goto(server.url);
    await page.getByRole('link', { name: 'Start designing' }).waitFor();
    await page.screenshot({ path: artifactPath('landing-1280.png'), fullPage: true });
    await page.getByRole('link', { name: 'Start designing' }).click();
    await page.getByRole('heading', { name: 'Design a stove' }).waitFor();
    await page.getByRole('list', { name: 'Findings' }).or(page.getByText('No findings')).first().waitFor();
    expect(await page.getByLabel('Design name').inputValue()).toBe('Alder Street pint-can stove');
    await page.screenshot({ path: artifactPath('design-1280.png'), fullPage: true });
  });

  it('flags jets spread too far apart, and undo takes the change back', async () => {
    const jets = page.getByRole('group', { name: 'Secondary jets' });
    // 9 jets round a 303 can: pi x 80.9625 / 9 = 28.26 mm apart, past the 3/4 in (19.05 mm) error limit.
    const tooFar = page.getByText(/Jets of "Secondary jets" are up to 28\.26 mm apart/);
    await jets.getByLabel('Holes (positions)').fill('9');
    await tooFar.waitFor();
    await page.waitForTimeout(400); // the edit becomes an undo step after 300 ms
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => jets.getByLabel('Holes (positions)').inputValue()).toBe('16');
    await expect.poll(() => tooFar.count()).toBe(0);
  });

  it('keeps the unsaved design through a reload', async () => {
    await page.getByLabel('Design name').fill('Rowan’s first stove');
    await page.waitForTimeout(500);
    await page.reload();
    await page.getByRole('heading', { name: 'Design a stove' }).waitFor();
    expect(await page.getByLabel('Design name').inputValue()).toBe('Rowan’s first stove');
  });

  it('refuses a name the printed kit cannot show, naming the character, and keeps what was typed', async () => {
    const name = page.getByLabel('Design name');
    await name.fill('Snow ☃ stove');
    // shared/print/printable-text.ts: IBM Plex Sans carries no U+2603 SNOWMAN.
    await page.getByText('has a character the printed kit cannot show: "☃". Use letters, digits and common punctuation.').first().waitFor();
    expect(await name.inputValue()).toBe('Snow ☃ stove');
    await name.fill('Rowan’s first stove');
    await expect.poll(() => page.getByText('cannot show').count()).toBe(0);
  });

  it('opens the print screen and sees every sheet drawn (not blank) and the build sheet', async () => {
    await page.getByRole('link', { name: 'Print the kit' }).click();
    await page.getByRole('heading', { name: 'Print the kit' }).waitFor();
    await page.getByText('Rowan’s first stove', { exact: true }).waitFor(); // the draft, not the example
    const sheets = page.getByRole('list', { name: 'Sheets of the kit' }).getByRole('img');
    await expect.poll(() => sheets.count()).toBeGreaterThan(0);
    const inked = await sheets.first().evaluate((canvas) => {
      const c = canvas as HTMLCanvasElement;
      const data = c.getContext('2d')!.getImageData(0, 0, c.width, c.height).data;
      let dark = 0;
      for (let i = 0; i < data.length; i += 4) if (data[i]! < 128) dark++;
      return dark;
    });
    expect(inked).toBeGreaterThan(100);
    const buildSheet = page.getByRole('article', { name: 'Rowan’s first stove: build sheet' });
    // templates/pint-can-stove.json: 16 jets of 3/16 in, pilot from the 29-piece set (common practice, no source).
    await buildSheet.getByRole('row').filter({ hasText: 'Secondary jets' }).filter({ hasText: '3/16 in' }).waitFor();
    await buildSheet.getByText(/carbon monoxide/).first().waitFor();
    await page.screenshot({ path: artifactPath('print-1280.png'), fullPage: true });
  });

  it('downloads the PDF kit: a valid PDF of Letter pages (ANSI: 8.5 x 11 in), one per sheet shown plus the sheet map and the build sheet', async () => {
    const shown = await page.getByRole('list', { name: 'Sheets of the kit' }).getByRole('img').count();
    const downloading = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download PDF kit' }).click();
    const download = await downloading;
    const path = artifactPath('visitor-kit.pdf');
    await download.saveAs(path);
    const doc = await PDFDocument.load(readFileSync(path));
    expect(doc.getPageCount()).toBe(shown + 2);
    // No printer profile chosen: the file name says so.
    expect(download.suggestedFilename()).toBe('rowan-s-first-stove-kit-no-printer-profile.pdf');
    for (const p of doc.getPages()) {
      expect(p.getWidth()).toBeCloseTo(215.9 * PT_PER_MM, 1);
      expect(p.getHeight()).toBeCloseTo(279.4 * PT_PER_MM, 1);
    }
  });

  it('switches to A4 and downloads sheet 1 as an SVG sized in millimetres (ISO 216: 210 x 297 mm)', async () => {
    await page.getByRole('combobox', { name: /^Paper/ }).selectOption('a4');
    const downloading = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download sheet 1 as SVG' }).click();
    const svg = readFileSync(await (await downloading).path(), 'utf8');
    expect(svg).toMatch(/width="210mm"/);
    expect(svg).toMatch(/height="297mm"/);
  });

  it('scales the kit for the printer measured in this browser, sending its measurements with the request', async () => {
    const profile = { name: 'Garage inkjet', measuredXMm: 152.25, measuredYMm: 198.6 };
    await page.evaluate((value) => localStorage.setItem('canwright.printerProfile.v1', value), JSON.stringify(profile));
    await page.reload();
    const printer = page.getByRole('combobox', { name: /^Printer/ });
    await expect.poll(async () => (await printer.locator('option:checked').textContent()) ?? '').toBe('Garage inkjet (this browser)');
    const requested = page.waitForRequest((r) => r.url().endsWith('/api/render/pdf'));
    const downloading = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download PDF kit' }).click();
    expect((await requested).postDataJSON().printer).toEqual({ name: 'Garage inkjet', measuredXMm: 152.25, measuredYMm: 198.6 });
    // The profile's name goes in the file name (and on every sheet: tests/render/kit-marks.test.ts).
    expect((await downloading).suggestedFilename()).toBe('rowan-s-first-stove-kit-for-garage-inkjet.pdf');

    await printer.selectOption({ label: 'No correction: print as drawn' });
    const plain = page.waitForRequest((r) => r.url().endsWith('/api/render/pdf'));
    const again = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download PDF kit' }).click();
    expect((await plain).postDataJSON().printer).toBeUndefined();
    await again;
    await page.evaluate(() => localStorage.removeItem('canwright.printerProfile.v1'));
  });

  it('explains on the print screen, instead of failing, when the design has no holes', async () => {
    const kept = await page.evaluate(() => localStorage.getItem('canwright.draft.v2'));
    await page.evaluate(() => {
      const draft = JSON.parse(localStorage.getItem('canwright.draft.v2') ?? 'null');
      const current = draft.history[draft.index];
      for (const part of current.parts) {
        part.sideRows = [];
        if (part.endPatterns) part.endPatterns = [];
      }
      localStorage.setItem('canwright.draft.v2', JSON.stringify(draft));
    });
    await page.goto(`${server.url}/design/print`);
    await page.getByText('This design has no holes to print yet').waitFor();
    expect(await page.getByRole('button', { name: 'Download PDF kit' }).isDisabled()).toBe(true);
    await page.evaluate((draft) => localStorage.setItem('canwright.draft.v2', draft ?? ''), kept);
  });

  it('works on a phone screen without sideways scrolling', async () => {
    const phone = await browser.newPage();
    await phone.setViewportSize({ width: 390, height: 844 });
    await phone.goto(server.url);
    await phone.getByRole('link', { name: 'Start designing' }).waitFor();
    expect(await phone.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(0);
    await phone.screenshot({ path: artifactPath('landing-390.png'), fullPage: true });
    await phone.goto(`${server.url}/design`);
    await phone.getByRole('heading', { name: 'Design a stove' }).waitFor();
    const overflow = await phone.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await phone.screenshot({ path: artifactPath('design-390.png'), fullPage: true });
    await phone.goto(`${server.url}/design/print`);
    await phone.getByRole('heading', { name: 'Print the kit' }).waitFor();
    await phone.getByRole('list', { name: 'Sheets of the kit' }).waitFor();
    expect(await phone.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(0);
    await phone.screenshot({ path: artifactPath('print-390.png'), fullPage: true });
    await phone.close();
  });
});
