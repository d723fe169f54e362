import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { artifactPath, browserAvailability, launchBrowser } from '../helpers/browser.ts';
import { clientDir, startTestServer, type TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();

/** Counts of the canvas's pixels: all, white paper, dark ink, and the white area's centre and box. */
async function samplePixels(page: Page) {
  return page.evaluate(() => {
    const canvas = document.querySelector('main canvas') as HTMLCanvasElement;
    const data = canvas.getContext('2d')!.getImageData(0, 0, canvas.width, canvas.height).data;
    let white = 0;
    let ink = 0;
    let accent = 0;
    let sumX = 0;
    for (let i = 0; i < data.length; i += 4) {
      const [r, g, b] = [data[i]!, data[i + 1]!, data[i + 2]!];
      if (r === 255 && g === 255 && b === 255) {
        white++;
        sumX += (i / 4) % canvas.width;
      } else if (r < 110 && g < 110 && b < 110) ink++;
      // Near the palette's accent, rgb(179, 77, 28) (shared/drawing/drawing-context.ts).
      else if (Math.abs(r - 179) < 30 && Math.abs(g - 77) < 30 && Math.abs(b - 28) < 30) accent++;
    }
    return { total: data.length / 4, white, ink, accent, whiteCentreX: white ? sumX / white : 0, dpr: window.devicePixelRatio };
  });
}

/** Waits for the next two animation frames, after which a scheduled redraw has painted. */
async function settle(page: Page) {
  await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))));
}

describe.skipIf(skip)('live preview in Chromium', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    server = await startTestServer({ clientDir });
    browser = await launchBrowser({ width: 1280, height: 800 });
    page = await browser.newPage();
    page.setDefaultTimeout(15_000);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('draws the first example design’s wall strip', async () => {
    await page.goto(`${server.url}/preview-demo`);
    await page.getByRole('img', { name: 'Wall strip of Burn chamber, 32 holes' }).waitFor();
    await page.evaluate(() => document.fonts.ready);
    await settle(page);
    const pixels = await samplePixels(page);
    // Not all background: a paper strip (white) with ink marks on it.
    expect(pixels.white / pixels.total).toBeGreaterThan(0.1);
    expect(pixels.ink).toBeGreaterThan(500);
    await page.screenshot({ path: artifactPath('preview-wall-1280.png'), fullPage: true });
  });

  it('switches to the bottom view, zooms with the buttons, the wheel and the keys, and fits again', async () => {
    await page.getByRole('radio', { name: 'Bottom' }).check();
    const preview = page.getByRole('img', { name: 'Bottom disc of Burn chamber, 29 holes' });
    await preview.waitFor();
    await settle(page);
    const fitted = await samplePixels(page);

    await page.getByRole('button', { name: 'Zoom in' }).click();
    await settle(page);
    const zoomed = await samplePixels(page);
    // A 1.4x zoom makes the white disc square 1.96x the area, less what runs off the canvas (worked arithmetic).
    expect(zoomed.white).toBeGreaterThan(fitted.white * 1.2);

    await page.getByRole('button', { name: 'Fit to view' }).click();
    await settle(page);
    expect((await samplePixels(page)).white).toBe(fitted.white);

    const box = (await page.locator('main canvas').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.wheel(0, -300);
    await settle(page);
    expect((await samplePixels(page)).white).toBeGreaterThan(fitted.white * 1.2);

    await preview.focus();
    await page.keyboard.press('0');
    await page.keyboard.press('-');
    await settle(page);
    // 1 / 1.4 per press: about half the area (worked arithmetic: 1 / 1.96).
    const smaller = await samplePixels(page);
    expect(smaller.white / fitted.white).toBeCloseTo(1 / 1.96, 1);
  });

  it('pans by dragging', async () => {
    await page.getByRole('button', { name: 'Fit to view' }).click();
    await settle(page);
    const before = await samplePixels(page);
    const box = (await page.locator('main canvas').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width / 2 - 60, box.y + box.height / 2, { steps: 5 });
    await page.mouse.up();
    await settle(page);
    const after = await samplePixels(page);
    // Dragged 60 CSS px to the left: the paper's centre moves 60 x devicePixelRatio device px.
    expect(after.whiteCentreX - before.whiteCentreX).toBeCloseTo(-60 * before.dpr, -1);
  });

  it('zooms with a two-finger pinch', async () => {
    await page.getByRole('button', { name: 'Fit to view' }).click();
    await settle(page);
    const before = await samplePixels(page);
    // Two touch pointers 100 px apart spread to 200 px: a 2x zoom about their midpoint (worked arithmetic).
    await page.evaluate(() => {
      const canvas = document.querySelector('main canvas') as HTMLCanvasElement;
      const { left, top, width, height } = canvas.getBoundingClientRect();
      const [cx, cy] = [left + width / 2, top + height / 2];
      const send = (type: string, pointerId: number, x: number) =>
        canvas.dispatchEvent(new PointerEvent(type, { pointerId, pointerType: 'touch', isPrimary: pointerId === 1, clientX: x, clientY: cy, bubbles: true }));
      send('pointerdown', 1, cx - 50);
      send('pointerdown', 2, cx + 50);
      send('pointermove', 2, cx + 150);
      send('pointerup', 1, cx - 50);
      send('pointerup', 2, cx + 150);
    });
    await settle(page);
    expect((await samplePixels(page)).white).toBeGreaterThan(before.white * 1.5);
  });

  it('shows the section through the stove and a 500-hole design', async () => {
    await page.getByRole('radio', { name: 'Section' }).check();
    await page.getByRole('img', { name: /^Section through the stove: Burn chamber from/ }).waitFor();
    await page.screenshot({ path: artifactPath('preview-assembled-1280.png') });
    await page.getByLabel('Design').selectOption({ label: '500-hole test can' });
    await page.getByRole('radio', { name: 'Wall strip' }).check();
    await page.getByRole('img', { name: /^Wall strip of Test can, 500 holes/ }).waitFor();
    await settle(page);
    const plain = await samplePixels(page);
    expect(plain.ink).toBeGreaterThan(1000);
    await page.screenshot({ path: artifactPath('preview-500-holes-1280.png') });
    // A finding's holes get rings in the accent colour.
    await page.getByRole('button', { name: /^Show the/ }).first().click();
    await settle(page);
    expect((await samplePixels(page)).accent).toBeGreaterThan(plain.accent);
  });

  it('measures the redraw of a 500-hole layout', async () => {
    const median = await page.evaluate(() => window.__canwrightPreviewBench!(50));
    console.log(`[preview bench] median redraw of a 500-hole wall strip at 1280 x 800: ${median.toFixed(2)} ms (50 runs)`);
    expect(Number.isFinite(median)).toBe(true);
  });

  it('fits a 390 px phone without sideways scrolling', async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByLabel('Design').selectOption({ index: 0 });
    await page.getByRole('img', { name: 'Wall strip of Burn chamber, 32 holes' }).waitFor();
    await settle(page);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    expect((await samplePixels(page)).ink).toBeGreaterThan(100);
    await page.screenshot({ path: artifactPath('preview-wall-390.png'), fullPage: true });
    await page.getByRole('radio', { name: 'Bottom' }).check();
    await settle(page);
    await page.screenshot({ path: artifactPath('preview-bottom-390.png'), fullPage: true });
  });
});
