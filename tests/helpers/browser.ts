import { existsSync, mkdirSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { repoRoot } from './processes.ts';
import { clientDir, startTestServer, type TestServer } from './test-server.ts';

/** Debian's Chromium, or CHROMIUM_PATH. Browser tests never download a browser. */
export const chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
export const hasChromium = existsSync(chromiumPath);

/**
 * Where Chromium is missing the browser tests are skipped with a message, except on CI
 * (CI=true), where a missing browser is a failure.
 */
export function browserAvailability(): { skip: boolean } {
  if (hasChromium) return { skip: false };
  if (process.env.CI === 'true') throw new Error(`CI=true but Chromium is not at ${chromiumPath}: install it (apt-get install -y chromium) or set CHROMIUM_PATH.`);
  return { skip: true };
}

export async function launchBrowser(viewport = { width: 1280, height: 800 }): Promise<BrowserContext> {
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'canwright-chromium-')), {
    executablePath: chromiumPath,
    headless: true,
    viewport,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}

/** Screenshots are kept as test artifacts in test-results/browser/. */
export function artifactPath(name: string): string {
  const dir = join(repoRoot, 'test-results', 'browser');
  mkdirSync(dir, { recursive: true });
  return join(dir, name);
}

export interface AppInBrowser {
  server: TestServer;
  browser: BrowserContext;
  page: Page;
}

/** The whole app on a fresh in-memory database, and Chromium with one page open on nothing yet. */
export async function openAppInBrowser(timeoutMs = 20_000): Promise<AppInBrowser> {
  const server = await startTestServer({ clientDir });
  const browser = await launchBrowser();
  const page = await browser.newPage();
  page.setDefaultTimeout(timeoutMs);
  return { server, browser, page };
}

export async function closeAppInBrowser(app: Partial<AppInBrowser> | undefined): Promise<void> {
  await app?.browser?.close();
  await app?.server?.close();
}
