import { readFileSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { vesselFromCatalogue } from '../../shared/vessels/index.ts';
import { artifactPath, browserAvailability, closeAppInBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { buildDesign } from '../helpers/design-factory.ts';
import { createUser, signedInClient } from '../helpers/factories.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();

/**
 * A sheet that cannot hold a piece says in one line what to do, and a button does it. The print
 * screen on a shared design's page is the same component as /design/print.
 */
describe.skipIf(skip)('a kit that does not fit the paper', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  let pintPath = '';
  let gallonPath = '';
  let tinPath = '';

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
    const api = await signedInClient(server, await createUser(server));
    const share = async (document: unknown) => {
      const created = await api.post('/api/designs', { document });
      return (await api.post(`/api/designs/${created.body.id}/share`, {})).body.shareUrlPath as string;
    };
    pintPath = await share(JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8')));
    // One-can stoves with a jet row and primary rings on the bottom (1 + 4 + 8 + 16 holes of 1/4 in).
    const rings = { id: 'bottom-rings', label: 'Primary rings', group: 'primary', drillId: 'frac:1/4', centerHole: true, rings: { strategy: 'divider', ringCount: 3, firstCount: 4, firstRadiusMm: 12, ringSpacingMm: 12 } } as const;
    const jets = (count: number) => ({ id: 'jets', label: 'Jets', group: 'secondary', drillId: 'frac:1/4', count, height: { from: 'top', mm: 20 }, startDeg: 0 }) as const;
    // Gallon paint can, 610x708: 6 5/8 in = 168.3 mm across (can code; from memory), less 2 x 4 mm
    // of rim: a 160.3 mm bottom disc. 32 jets keep the pitch under 3/4 in (528.7 / 32 = 16.5 mm).
    gallonPath = await share(buildDesign({ vessel: vesselFromCatalogue('paint-gallon'), sideRows: [jets(32)], endPatterns: [rings] }, { name: 'Gallon-can stove' }));
    // A measured tin 200 mm across: a 192 mm bottom disc; 36 jets (628.6 / 36 = 17.5 mm apart).
    const { catalogueId: _catalogue, ...gallonCan } = vesselFromCatalogue('paint-gallon');
    const tin = { ...gallonCan, source: 'measured' as const, name: 'Popcorn tin, measured', outerDiameterMm: 200, heightMm: 230 };
    tinPath = await share(buildDesign({ vessel: tin, sideRows: [jets(36)], endPatterns: [rings] }, { name: 'Popcorn-tin stove' }));
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  const sheets = () => page.getByRole('list', { name: 'Sheets of the kit' });
  // A select's name includes its chosen option ("Paper Letter"), so match the start.
  const paperSelect = () => page.getByRole('combobox', { name: /^Paper/ });
  const orientationSelect = () => page.getByRole('combobox', { name: /^Orientation/ });

  it('turns Letter back to portrait for a pint wall too tall for landscape', async () => {
    await page.goto(server.url + pintPath);
    await paperSelect().selectOption('letter');
    await sheets().waitFor();
    await orientationSelect().selectOption('landscape');
    // Letter landscape is 8.5 in = 215.9 mm tall (ANSI/ASME Y14.1 size A): with margins and the sheet
    // furniture that is too little for the 111.1 mm strip and its label bands.
    await page.getByText('Turn the paper to portrait: every piece fits on Letter portrait.').waitFor();
    expect(await sheets().count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Download PDF kit' }).isDisabled()).toBe(true);
    await page.screenshot({ path: artifactPath('print-paper-fix-turn-1280.png'), fullPage: true });
    await page.getByRole('button', { name: 'Turn to portrait' }).click();
    await sheets().waitFor();
    expect(await orientationSelect().inputValue()).toBe('portrait');
    await page.getByText('Paper changed to Letter portrait.').waitFor();
    expect(await page.evaluate(() => document.activeElement?.tagName)).toBe('SELECT');
  });

  it('offers A3 to a maker on A4 for a gallon-can bottom, and the PDF then downloads', async () => {
    await page.goto(server.url + gallonPath);
    await paperSelect().selectOption('a4');
    // The 160.3 mm disc takes a 172.3 mm square with its labels; A4 is 210 mm wide (ISO 216), less
    // 2 x 12.7 mm of margin and the 15 mm ruler column: 169.6 mm. A3 is 297 mm wide (ISO 216).
    await page.getByText('Use larger paper: every piece fits on A3 portrait.').waitFor();
    expect(await sheets().count()).toBe(0);
    await page.screenshot({ path: artifactPath('print-paper-fix-larger-1280.png'), fullPage: true });
    await page.getByRole('button', { name: 'Use A3 portrait' }).click();
    await sheets().waitFor();
    expect(await paperSelect().inputValue()).toBe('a3');
    await page.getByText('Paper changed to A3 portrait.').waitFor();
    const downloading = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download PDF kit' }).click();
    const path = artifactPath('print-paper-fix-gallon.pdf');
    await (await downloading).saveAs(path);
    // ISO 32000-1 section 7.5.2: a PDF file begins with "%PDF-".
    expect(readFileSync(path).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  });

  it('offers Tabloid on Letter for a disc wider than 8.5 in allows, and fits a phone', async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    try {
      await page.goto(server.url + tinPath);
      await paperSelect().selectOption('letter');
      // 192 + 12 mm = 204 mm square; Letter and Legal are 8.5 in = 215.9 mm wide (ANSI/ASME Y14.1
      // size A; Legal from memory), 190.5 mm inside the margins; Tabloid is 11 in = 279.4 mm wide (size B).
      await page.getByText('Use larger paper: every piece fits on Tabloid portrait.').waitFor();
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await page.getByRole('button', { name: 'Use Tabloid portrait' }).scrollIntoViewIfNeeded();
      await page.screenshot({ path: artifactPath('print-paper-fix-390.png') });
      await page.getByRole('button', { name: 'Use Tabloid portrait' }).click();
      await sheets().waitFor();
      expect(await paperSelect().inputValue()).toBe('tabloid');
    } finally {
      await page.setViewportSize({ width: 1280, height: 800 });
    }
  });
});
