import { readFileSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { artifactPath, browserAvailability, launchBrowser } from '../helpers/browser.ts';
import { createUser, signedInClient, type TestUser } from '../helpers/factories.ts';
import { clientDir, startTestServer, type TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();
const pint = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));

/** Reads the big timer as seconds. */
async function timerSeconds(page: Page): Promise<number> {
  const [m, s] = (await page.getByRole('timer').innerText()).split(':').map(Number);
  return (m as number) * 60 + (s as number);
}

describe.skipIf(skip)('a maker times a test burn on a phone, logs it with a photo and sees it on the chart', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  let maker: TestUser;
  let designId = '';

  beforeAll(async () => {
    server = await startTestServer({ clientDir });
    maker = await createUser(server, { name: 'Kit Fielding' });
    const http = await signedInClient(server, maker);
    designId = (await http.post('/api/designs', { document: pint })).body.id;
    browser = await launchBrowser({ width: 390, height: 844 });
    page = await browser.newPage();
    page.setDefaultTimeout(20_000);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('runs the timer through a reload: start, jets, boiling, out', async () => {
    await page.goto(`${server.url}/sign-in?next=${encodeURIComponent(`/library/${designId}/timer`)}`);
    await page.getByLabel('E-mail').fill(maker.email);
    await page.getByLabel('Password').fill(maker.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: 'Start: fire lit' }).click();
    await page.waitForTimeout(1_200);
    await page.getByRole('button', { name: 'Jets lit' }).click();
    await page.getByText('Jets lit at').waitFor();
    const beforeReload = await timerSeconds(page);
    await page.screenshot({ path: artifactPath('burn-timer-390.png'), fullPage: true });

    // The phone reloads the page (or the screen locked and the tab was dropped): the fire burned on.
    await page.waitForTimeout(1_100);
    await page.reload();
    await page.getByText('Jets lit at').waitFor();
    expect(await timerSeconds(page)).toBeGreaterThanOrEqual(beforeReload + 1);
    await page.getByRole('button', { name: 'Water boiling' }).click();
    await page.waitForTimeout(1_100);
    await page.getByRole('button', { name: 'Flame out' }).click();
    await page.getByText('Out at').waitFor();
    expect(await page.getByRole('button', { name: 'Pause' }).count()).toBe(0);
  });

  it('writes the entry from the timer in the maker units and saves it', async () => {
    await page.getByRole('button', { name: 'Write up the entry' }).click();
    await page.getByRole('heading', { name: 'Log a burn' }).waitFor();
    // The timer's times arrive in the form; the burn time is at least the 3 s waited above.
    expect(await page.getByLabel('Jets lit').inputValue()).toMatch(/^0:0[1-9]$/);
    expect(await page.getByLabel('Flame out (burn time)').inputValue()).toMatch(/^0:0[3-9]$/);
    // A new account with inch lengths reads ounces and degF until it chooses.
    await page.getByLabel('Fuel loaded (oz)').fill('lots');
    await page.getByRole('button', { name: 'Save the entry' }).click();
    await page.getByText('Type a number in ounces, such as 12.').waitFor();
    await page.getByLabel('Fuel loaded (oz)').fill('5.5');
    await page.getByLabel('Fuel', { exact: true }).fill('softwood pellets');
    await page.getByLabel('Air temperature (°F)').fill('50');
    await page.getByLabel('5: a closed, steady ring').check();
    await page.screenshot({ path: artifactPath('burn-entry-390.png'), fullPage: true });
    await page.getByRole('button', { name: 'Save the entry' }).click();
    await page.getByText('Saved. Add photos of the burn if you have them.').waitFor();

    const http = await signedInClient(server, maker);
    const [burn] = (await http.get(`/api/designs/${designId}/burns`)).body.burns;
    // 5.5 oz x 28.349523125 g = 155.92 g; (50 - 32) / 1.8 = 10 degC (NIST Handbook 44 appendix C; NIST SP 811).
    expect(burn.fuelMassG).toBeCloseTo(155.92, 2);
    expect(burn.ambientC).toBeCloseTo(10, 6);
    expect(burn).toMatchObject({ version: 1, flameRing: 5, fuelKind: 'softwood pellets' });
    expect(burn.timeToJetsS).toBeGreaterThanOrEqual(1);
    expect(burn.timeToBoilS).toBeGreaterThan(burn.timeToJetsS);
    expect(burn.burnTimeS).toBeGreaterThan(burn.timeToBoilS);
    // Saved: the timer is done with, so the design page offers a new one.
    expect(await page.evaluate(() => localStorage.getItem('canwright.burn-timer.v1'))).toBeNull();
    expect(await page.evaluate(() => localStorage.getItem('canwright.unsaved-burns.v1'))).toBe('[]');
  });

  it('adds a photo to the entry', async () => {
    const picture = await sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 200, g: 90, b: 30 } } }).png().toBuffer();
    await page.getByLabel('Add photos').setInputFiles({ name: 'flame-ring.png', mimeType: 'image/png', buffer: picture });
    await page.getByRole('img', { name: 'Photo 1 of the burn' }).waitFor();
    await page.getByText('Photos (1 of 12)').waitFor();
    // The thumbnail really arrives from the server (served to its owner only).
    await expect.poll(() => page.getByRole('img', { name: 'Photo 1 of the burn' }).evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
    await page.screenshot({ path: artifactPath('burn-photo-390.png'), fullPage: true });
  });

  it('shows the burn on the design page: best burn, chart and table', async () => {
    await page.getByRole('link', { name: 'Back to the design' }).click();
    await page.getByRole('heading', { name: 'Best burn so far' }).waitFor();
    await page.getByTestId('burn-chart').locator('.recharts-symbols').first().waitFor();
    // One burn with three times measured: a point for each on the chart.
    expect(await page.getByTestId('burn-chart').locator('.recharts-scatter-symbol').count()).toBe(3);
    const row = page.getByRole('table', { name: 'Burns by version' }).getByRole('row').nth(1);
    expect(await row.innerText()).toMatch(/1\s+\S+\s+5\.0 : 1\s+5\/8 in\s+0:0\d\s+0:0\d\s+0:0\d/);
    expect(await page.getByRole('list', { name: 'Burn entries' }).locator('img').count()).toBe(1);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: artifactPath('burn-design-page-390.png'), fullPage: true });
  });

  it('keeps an entry on the phone when the connection drops, and saves it later', async () => {
    await page.goto(`${server.url}/library/${designId}/burns/new`);
    await page.getByLabel('Notes').fill('Written with no signal at the allotment');
    // No signal: the request never reaches the server.
    await page.route('**/api/designs/*/burns', (route) => (route.request().method() === 'POST' ? route.abort('internetdisconnected') : route.continue()));
    await page.getByRole('button', { name: 'Save the entry' }).click();
    await page.getByText('This entry is kept on this device and nothing is lost').waitFor();
    await page.unroute('**/api/designs/*/burns');

    await page.goto(`${server.url}/library/${designId}`);
    await page.getByText('1 entry is kept on this device and not yet saved.').waitFor();
    await page.getByRole('button', { name: 'Save them now' }).click();
    await page.getByText('Written with no signal at the allotment').waitFor();
    const http = await signedInClient(server, maker);
    expect((await http.get(`/api/designs/${designId}/burns`)).body.burns.map((b: { notes: string | null }) => b.notes)).toContain('Written with no signal at the allotment');
    expect(await page.evaluate(() => localStorage.getItem('canwright.unsaved-burns.v1'))).toBe('[]');
  });
});
