import { readFileSync } from 'node:fs';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { designSchema, type DesignInput } from '../../shared/design/design-schema.ts';
import catalogue from '../../templates/catalogue/vessels.json' with { type: 'json' };
import { artifactPath, browserAvailability, closeAppInBrowser, openAppInBrowser, type AppInBrowser } from '../helpers/browser.ts';
import { readPdfText } from '../helpers/rasterize-pdf.ts';

const { skip } = browserAvailability();
const inch = (n: number) => n * 25.4; // 25.4 mm an inch, exact (ISO 31-1)

/** A catalogue can as the design file stores it (templates/catalogue/vessels.json). */
function catalogueCan(id: string) {
  const entry = catalogue.find((e) => e.id === id)!;
  return { source: 'catalogue', catalogueId: id, name: entry.name, outerDiameterMm: entry.diameterMm, heightMm: entry.heightMm, wallThicknessMm: entry.wallThicknessMm, seamAngleDeg: 0, bottomRimInsetMm: entry.bottomRimInsetMm };
}

/** Deep equality where numbers may differ by float rounding (a length typed as 5/8 in is 0.625 x 25.4 either way). */
function expectSameDesign(actual: unknown, expected: unknown, path = 'design'): void {
  if (typeof expected === 'number') return void expect(actual as number, path).toBeCloseTo(expected, 9);
  if (Array.isArray(expected)) {
    expect(Array.isArray(actual), path).toBe(true);
    expect((actual as unknown[]).length, `${path}.length`).toBe(expected.length);
    return expected.forEach((item, i) => expectSameDesign((actual as unknown[])[i], item, `${path}.${i}`));
  }
  if (expected && typeof expected === 'object') {
    expect(Object.keys(actual as object).sort(), `${path} keys`).toEqual(Object.keys(expected).sort());
    for (const [key, value] of Object.entries(expected)) expectSameDesign((actual as Record<string, unknown>)[key], value, `${path}.${key}`);
    return;
  }
  expect(actual, path).toEqual(expected);
}

/** Types a length and commits it, as a maker does (Enter). */
async function typeLength(field: Locator, text: string): Promise<void> {
  await field.fill(text);
  await field.press('Enter');
}

async function download(page: Page, click: () => Promise<void>): Promise<Buffer> {
  const downloading = page.waitForEvent('download');
  await click();
  return readFileSync(await (await downloading).path());
}

/** Holes each piece of the kit says it has, read back from the PDF's own text with pdf.js. */
async function kitHoleLabels(page: Page): Promise<string[]> {
  await page.getByRole('link', { name: 'Print the kit' }).click();
  await page.getByRole('heading', { name: 'Print the kit', level: 1 }).waitFor();
  const pdf = await download(page, () => page.getByRole('button', { name: 'Download PDF kit' }).click());
  const pages = await readPdfText(new Uint8Array(pdf));
  await page.getByRole('link', { name: 'Back to the design' }).click();
  await page.getByRole('heading', { name: 'Design a stove' }).waitFor();
  return pages;
}

/** "Secondary jets: 14 × 3/16 in" on a strip, "Cut on this line · 37 × 1/4 in" on a disc: the count the kit prints. */
function printedCount(pages: string[], pattern: RegExp): number {
  const found = pages.map((p) => pattern.exec(p)).find(Boolean);
  expect(found, String(pattern)).toBeTruthy();
  return Number(found![1]);
}

/** Sum of every "Drills on this sheet" legend: each hole once, tiles' shared bands included once. */
function legendTotal(pages: string[]): number {
  return pages.reduce((sum, text) => {
    const legend = /Drills on this sheet (.*?) Print at 100/.exec(text);
    return sum + (legend ? [...legend[1]!.matchAll(/(\d+) × /g)].reduce((a, m) => a + Number(m[1]), 0) : 0);
  }, 0);
}

describe.skipIf(skip)('building stoves from a blank design, on the screen only', () => {
  let app: AppInBrowser;
  let page: Page;
  beforeAll(async () => {
    app = await openAppInBrowser(20_000);
    page = app.page;
    await page.goto(`${app.server.url}/design`);
    await page.getByRole('heading', { name: 'Design a stove' }).waitFor();
  });
  afterAll(() => closeAppInBrowser(app));

  const row = (name: string) => page.getByRole('group', { name, exact: true });

  it('builds a single-can stove: a jet row, a low primary row and doubling rings', async () => {
    await page.getByRole('button', { name: 'New design' }).click();
    await expect.poll(() => page.getByLabel('Design name').inputValue()).toBe('New stove');
    await page.getByLabel('Design name').fill('Single-can test stove');

    await page.getByRole('button', { name: 'Add a row round the wall' }).click();
    const jets = row('Secondary jets');
    await jets.getByLabel('Holes (positions)').fill('16');
    await jets.getByLabel('Height from').selectOption('top');
    await typeLength(jets.getByLabel('Height of centres'), '5/8');

    await page.getByRole('button', { name: 'Add a row round the wall' }).click();
    await row('Row 2').getByRole('textbox', { name: /^Name/ }).fill('Low primary');
    const low = row('Low primary');
    await low.getByLabel('Air').selectOption('primary');
    await low.getByLabel('Drill').selectOption('frac:1/4');
    await low.getByLabel('Holes (positions)').fill('12');
    await low.getByLabel('Height from').selectOption('bottom');
    await typeLength(low.getByLabel('Height of centres'), '1/2');

    await page.getByRole('button', { name: 'Add rings on a can end' }).click();
    const rings = row('Bottom rings (can bottom)');
    await rings.getByLabel('Number of rings').fill('3');
    await typeLength(rings.getByLabel('First ring radius'), '3/8');
    await typeLength(rings.getByLabel('Ring spacing'), '3/8');
    await page.waitForTimeout(400);

    const file = JSON.parse((await download(page, () => page.getByRole('button', { name: 'Download design file' }).click())).toString('utf8'));
    const byHand: DesignInput = {
      schemaVersion: 1,
      name: 'Single-can test stove',
      units: 'in',
      parts: [
        {
          id: 'chamber',
          role: 'burn-chamber',
          name: 'Burn chamber',
          vessel: catalogueCan('food-303x406') as DesignInput['parts'][number]['vessel'],
          sideRows: [
            { id: 'row', label: 'Secondary jets', group: 'secondary', drillId: 'frac:3/16', count: 16, height: { from: 'top', mm: inch(5 / 8) } },
            { id: 'row-2', label: 'Low primary', group: 'primary', drillId: 'frac:1/4', count: 12, height: { from: 'bottom', mm: inch(1 / 2) } },
          ],
          endPatterns: [{ id: 'rings', label: 'Bottom rings', group: 'primary', drillId: 'frac:1/4', centerHole: true, stagger: true, rings: { strategy: 'divider', ringCount: 3, firstCount: 4, firstRadiusMm: inch(3 / 8), ringSpacingMm: inch(3 / 8) } }],
        },
      ],
    };
    expectSameDesign(file, designSchema.parse(byHand));

    const pdf = await kitHoleLabels(page);
    expect(printedCount(pdf, /Secondary jets: (\d+) ×/)).toBe(16);
    expect(printedCount(pdf, /Low primary: (\d+) ×/)).toBe(12);
    // Doubling rings from 4 with a centre hole: 1 + 4 + 8 + 16 = 29.
    expect(printedCount(pdf, /Burn chamber, bottom Cut on this line · (\d+) ×/)).toBe(29);
    expect(legendTotal(pdf)).toBe(16 + 12 + 29);
  });

  it('builds a two-can stove with a seam keep-out, a skipped position and three explicit rings', async () => {
    await page.getByRole('button', { name: 'New design' }).click();
    await page.getByLabel('Design name').fill('Two-can test stove');

    await page.getByRole('button', { name: 'Add a row round the wall' }).click();
    const jets = row('Secondary jets');
    await jets.getByLabel('Holes (positions)').fill('16');
    await jets.getByLabel('Height from').selectOption('top');
    await typeLength(jets.getByLabel('Height of centres'), '5/8');
    await jets.getByRole('button', { name: 'Add a keep-out to Secondary jets' }).click();
    await jets.getByRole('button', { name: /^Position 9, opposite the seam/ }).click();
    // Position 1 sits at 0°, inside the seam keep-out (-10° to 10°); position 9 is left out by hand.
    await jets.getByText('16 positions, 14 holes: the one opposite the seam (position 9) left out; 1 position in a keep-out is left out').waitFor();

    await page.getByRole('button', { name: 'Add rings on a can end' }).click();
    const rings = row('Bottom rings (can bottom)');
    await rings.getByRole('combobox', { name: /^Rings/ }).selectOption('explicit');
    for (let i = 0; i < 3; i++) await rings.getByRole('button', { name: 'Add a ring to Bottom rings' }).click();
    await rings.getByLabel('Ring 3 radius').waitFor();

    await page.getByRole('button', { name: 'Add part' }).click();
    await expect.poll(() => page.getByRole('tab', { name: 'Outer shell' }).getAttribute('aria-selected')).toBe('true');
    await page.getByRole('button', { name: 'Add a row round the wall' }).click();
    await row('Secondary jets').getByRole('textbox', { name: /^Name/ }).fill('Shell intake');
    const intake = row('Shell intake');
    await intake.getByLabel('Air').selectOption('intake');
    await intake.getByLabel('Drill').selectOption('frac:3/8');
    await intake.getByLabel('Holes (positions)').fill('8');
    await intake.getByLabel('Height from').selectOption('bottom');
    await typeLength(intake.getByLabel('Height of centres'), '1/2');
    await page.waitForTimeout(400);

    const file = JSON.parse((await download(page, () => page.getByRole('button', { name: 'Download design file' }).click())).toString('utf8'));
    // Each new ring: one 1/4 in hole plus 3 mm of metal (the default ligament) outside the last,
    // so 9.35, 18.7 and 28.05 mm, its holes at the outer ring's pitch: 6, 12, 18.
    const byHand: DesignInput = {
      schemaVersion: 1,
      name: 'Two-can test stove',
      units: 'in',
      parts: [
        {
          id: 'chamber',
          role: 'burn-chamber',
          name: 'Burn chamber',
          vessel: catalogueCan('food-303x406') as DesignInput['parts'][number]['vessel'],
          sideRows: [{ id: 'row', label: 'Secondary jets', group: 'secondary', drillId: 'frac:3/16', count: 16, skip: [8], height: { from: 'top', mm: inch(5 / 8) }, keepOuts: [{ label: 'Seam', startDeg: -10, endDeg: 10 }], keepOutPolicy: 'drop' }],
          endPatterns: [
            {
              id: 'rings',
              label: 'Bottom rings',
              group: 'primary',
              drillId: 'frac:1/4',
              centerHole: true,
              stagger: true,
              rings: { strategy: 'explicit', rings: [{ radiusMm: 9.35, count: 6 }, { radiusMm: 18.7, count: 12 }, { radiusMm: 28.05, count: 18 }] },
            },
          ],
        },
        {
          id: 'shell',
          role: 'shell',
          name: 'Outer shell',
          // The smallest catalogue can at least 10 mm wider than the 303 chamber (80.96 mm).
          vessel: catalogueCan('metric-99x118') as DesignInput['parts'][number]['vessel'],
          sideRows: [{ id: 'row', label: 'Shell intake', group: 'intake', drillId: 'frac:3/8', count: 8, height: { from: 'bottom', mm: inch(1 / 2) } }],
        },
      ],
    };
    expectSameDesign(file, designSchema.parse(byHand));

    const pdf = await kitHoleLabels(page);
    expect(printedCount(pdf, /Secondary jets: (\d+) ×/)).toBe(14);
    expect(printedCount(pdf, /Shell intake: (\d+) ×/)).toBe(8);
    // Centre hole and three rings: 1 + 6 + 12 + 18 = 37.
    expect(printedCount(pdf, /Burn chamber, bottom Cut on this line · (\d+) ×/)).toBe(37);
    expect(legendTotal(pdf)).toBe(14 + 8 + 37);
    await page.screenshot({ path: artifactPath('design-two-can-1280.png'), fullPage: true });
  });
});
