import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { browserAvailability, closeAppInBrowser, launchBrowser, openAppInBrowser } from '../helpers/browser.ts';
import { buildUser, createUser, type TestUser } from '../helpers/factories.ts';
import type { TestServer } from '../helpers/test-server.ts';

const { skip } = browserAvailability();

/** After signing in (or signing up and confirming) a person is back where they were, and only ever on this site. */
describe.skipIf(skip)('signing in brings a person back', () => {
  let server: TestServer;
  let browser: BrowserContext;
  let page: Page;
  let maker: TestUser;

  beforeAll(async () => {
    ({ server, browser, page } = await openAppInBrowser(20_000));
    maker = await createUser(server, { name: 'Sky Tinsmith' });
  });
  afterAll(() => closeAppInBrowser({ server, browser }));

  async function fillSignIn(p: Page, user: Pick<TestUser, 'email' | 'password'>) {
    await p.getByLabel('E-mail').fill(user.email);
    await p.getByLabel('Password').fill(user.password);
    await p.getByRole('button', { name: 'Sign in' }).click();
  }

  it('from the header link, back to the page and its query', async () => {
    await page.goto(`${server.url}/printer?from=header`);
    await page.getByRole('heading', { name: 'Printer calibration', level: 1 }).waitFor();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
    expect(new URL(page.url()).searchParams.get('next')).toBe('/printer?from=header');
    await fillSignIn(page, maker);
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    expect(new URL(page.url()).pathname + new URL(page.url()).search).toBe('/printer?from=header');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sign in' }).waitFor();
  });

  // OWASP Unvalidated Redirects and Forwards Cheat Sheet: a "next" that leaves the site is ignored.
  // WHATWG URL Standard: "//host", "/\host" and "/<tab>/host" all name another host.
  it.each(['//evil.example/phish', '/\\evil.example/phish', 'https://evil.example/phish', '/\t/evil.example/phish'])('ignores next=%j and goes to the account page', async (next) => {
    const context = await launchBrowser();
    try {
      const p = await context.newPage();
      p.setDefaultTimeout(20_000);
      await p.goto(`${server.url}/sign-in?next=${encodeURIComponent(next)}`);
      await fillSignIn(p, maker);
      await p.getByRole('heading', { name: 'Your account', level: 1 }).waitFor();
      const at = new URL(p.url());
      expect(at.origin + at.pathname).toBe(`${new URL(server.url).origin}/account`);
    } finally {
      await context.close();
    }
  });

  it('through sign-up and the confirmation mail, back to where the person started', async () => {
    const newcomer = buildUser({ name: 'Jules Ferrier' });
    const context = await launchBrowser();
    try {
      const p = await context.newPage();
      p.setDefaultTimeout(20_000);
      await p.goto(`${server.url}/printer`);
      expect(await p.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Create account' }).getAttribute('href')).toBe('/sign-up?next=%2Fprinter');
      await p.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sign in' }).click();
      await p.getByRole('link', { name: 'Create an account' }).click();
      await p.getByRole('heading', { name: 'Create your account', level: 1 }).waitFor();
      expect(new URL(p.url()).searchParams.get('next')).toBe('/printer');
      await p.getByLabel('Name').fill(newcomer.name);
      await p.getByLabel('E-mail').fill(newcomer.email);
      await p.getByLabel('Password', { exact: true }).fill(newcomer.password);
      await p.getByLabel('Password again').fill(newcomer.password);
      await p.getByRole('button', { name: 'Create account' }).click();
      await p.getByRole('heading', { name: 'Check your e-mail', level: 1 }).waitFor();

      await p.goto(`${server.url}/dev/mail`);
      const mail = p.getByRole('article').filter({ has: p.getByRole('heading', { name: /Confirm your e-mail/ }) }).first();
      await mail.getByRole('link').first().click();
      await p.getByRole('heading', { name: 'E-mail address confirmed', level: 1 }).waitFor();
      await p.getByRole('main').getByRole('link', { name: 'Sign in' }).click();
      expect(new URL(p.url()).searchParams.get('next')).toBe('/printer');
      await fillSignIn(p, newcomer);
      await p.getByRole('heading', { name: 'Printer calibration', level: 1 }).waitFor();
      expect(new URL(p.url()).pathname).toBe('/printer');
    } finally {
      await context.close();
    }
  });

  it('from a page that needs an account, back to it', async () => {
    await page.goto(`${server.url}/library`);
    await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
    await fillSignIn(page, maker);
    await page.getByRole('heading', { name: 'Your library', level: 1 }).waitFor();
  });
});
