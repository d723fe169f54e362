import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriousViolations } from '../helpers/axe.ts';
import { browserAvailability, closeAppInBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { readFileSync } from 'node:fs';
import { createUser, signedInClient } from '../helpers/factories.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();

/** axe-core (WCAG 2.1 A/AA rules) finds no serious or critical problem on the main pages. */
describe.skipIf(skip)('accessibility of the main pages', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  let sharedPath = '';

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  const pages: [string, string, string][] = [
    ['landing', '/', 'Canwright'],
    ['sign in', '/sign-in', 'Sign in'],
    ['sign up', '/sign-up', 'Create your account'],
    ['design', '/design', 'Design a stove'],
    ['print (the draft the design page started)', '/design/print', 'Print the kit'],
    ['printer', '/printer', 'Printer calibration'],
  ];

  it.each(pages)('%s page (%s)', async (_name, path, heading) => {
    await page.goto(server.url + path);
    await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
    await page.waitForTimeout(300);
    const violations = await seriousViolations(page);
    expect(violations, JSON.stringify(violations, null, 1)).toEqual([]);
  });

  it('design page with the view from above and a value that does not validate', async () => {
    await page.goto(server.url + '/design');
    await page.getByRole('heading', { name: 'Design a stove', level: 1 }).waitFor();
    await page.getByRole('tab', { name: 'From above' }).click();
    await page.getByRole('spinbutton', { name: /^Holes \(positions\)/ }).first().fill('30.5');
    await page.getByText('Not up to date').first().waitFor();
    await page.waitForTimeout(300);
    const violations = await seriousViolations(page);
    expect(violations, JSON.stringify(violations, null, 1)).toEqual([]);
    await page.getByRole('spinbutton', { name: /^Holes \(positions\)/ }).first().fill('16');
  });

  it('account page, signed in', async () => {
    const user = await createUser(server);
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(user.email);
    await page.getByLabel('Password').fill(user.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    expect(await seriousViolations(page)).toEqual([]);
  });

  it('library, history (with its burn log), burn and shared pages', async () => {
    const maker = await createUser(server);
    const api = await signedInClient(server, maker);
    const document = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));
    const created = await api.post('/api/designs', { document });
    const shared = await api.post(`/api/designs/${created.body.id}/share`, {});
    sharedPath = shared.body.shareUrlPath;
    const burn = await api.post(`/api/designs/${created.body.id}/burns`, { date: '2026-11-30T10:00:00Z', timeToJetsS: 120, timeToBoilS: 540, boilWaterL: 0.5, burnTimeS: 1300, fuelMassG: 160, flameRing: 4 });
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(maker.email);
    await page.getByLabel('Password').fill(maker.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    for (const [path, heading] of [
      ['/library', 'Your library'],
      [`/library/${created.body.id}`, document.name],
      [`/library/${created.body.id}/burns/new`, 'Log a burn'],
      [`/library/${created.body.id}/burns/${burn.body.id}`, new Date('2026-11-30T10:00:00Z').toLocaleDateString('en-US').replace(/^/, 'Burn of ')],
      [`/library/${created.body.id}/timer`, 'Burn timer'],
      [shared.body.shareUrlPath, document.name],
    ]) {
      await page.goto(server.url + path);
      await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
      await page.waitForTimeout(300);
      expect(await seriousViolations(page), path).toEqual([]);
    }
  });

  // The library test above signed a maker in and shared a design; its pages are reached the same way.
  it.each([
    ['design', () => '/design', 'Design a stove'],
    ['print', () => '/design/print', 'Print the kit'],
    ['library', () => '/library', 'Your library'],
    ['shared design', () => sharedPath, 'Alder Street pint-can stove'],
  ])('every control on the %s page is reachable with the Tab key', async (_name, path, heading) => {
    await page.goto(server.url + path());
    await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
    await page.waitForTimeout(300);
    // Controls on screen: a control hidden at this width (the phone-only sort menu) cannot take focus.
    // A tab list is one stop in the Tab order (WAI-ARIA Authoring Practices, tabs pattern): its
    // unselected tabs are reached with the arrow keys, which the next test checks.
    const controls = await page.evaluate(
      () =>
        [...document.querySelectorAll('main button:not([disabled]), main input, main select, main a[href], main [tabindex="0"]')].filter(
          (el) => el.getClientRects().length > 0 && !(el.getAttribute('role') === 'tab' && el.getAttribute('aria-selected') !== 'true'),
        ).length,
    );
    const reached = new Set<string>();
    for (let i = 0; i < controls + 40; i++) {
      await page.keyboard.press('Tab');
      const key = await page.evaluate(() => {
        const el = document.activeElement as HTMLElement | null;
        if (!el || !el.closest('main')) return null;
        const all = [...document.querySelectorAll('main *')];
        return String(all.indexOf(el));
      });
      if (key) reached.add(key);
    }
    expect(reached.size).toBeGreaterThanOrEqual(controls);
  });
  // WAI-ARIA Authoring Practices, tabs pattern: arrow keys move and select, Home/End jump to the
  // ends, the selected tab alone is in the Tab order and names the panel it controls.
  it('moves through the preview view tabs with the arrow keys, Home and End', async () => {
    await page.goto(server.url + '/design');
    const tabs = page.getByRole('tablist', { name: 'Preview view' });
    await tabs.waitFor();
    const names = await tabs.getByRole('tab').allTextContents();
    expect(names.length).toBeGreaterThanOrEqual(4);
    const selected = () => tabs.locator('[role="tab"][aria-selected="true"]');
    const focusedName = () => page.evaluate(() => document.activeElement?.textContent ?? '');
    await selected().focus();
    const first = await selected().textContent();
    await page.keyboard.press('ArrowRight');
    expect(await selected().textContent()).toBe(names[(names.indexOf(first!) + 1) % names.length]);
    expect(await focusedName()).toBe(await selected().textContent());
    await page.keyboard.press('End');
    expect(await selected().textContent()).toBe(names.at(-1));
    await page.keyboard.press('ArrowRight');
    expect(await selected().textContent()).toBe(names[0]);
    await page.keyboard.press('ArrowLeft');
    expect(await selected().textContent()).toBe(names.at(-1));
    await page.keyboard.press('Home');
    expect(await selected().textContent()).toBe(names[0]);
    expect(await tabs.locator('[role="tab"][tabindex="0"]').count()).toBe(1);
    const panelId = await selected().getAttribute('aria-controls');
    const panel = page.locator(`[id="${panelId}"]`);
    expect(await panel.getAttribute('role')).toBe('tabpanel');
    expect(await panel.getAttribute('aria-labelledby')).toBe(await selected().getAttribute('id'));
  });
});
