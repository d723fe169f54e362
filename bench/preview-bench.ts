import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';
import { buildClient, clientBuildIsStale } from '../server/boot/client-build.ts';
import { startServer } from '../server/server.ts';

/**
 * Canvas preview redraw of a 500-hole wall strip in Chromium (software drawing, headless):
 * the median of 50 redraws measured in the page. Target: <= 4 ms.
 */
export async function benchPreview(): Promise<void> {
  const chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
  if (!existsSync(chromiumPath)) return console.log(`preview redraw: skipped (no Chromium at ${chromiumPath})`);
  const root = fileURLToPath(new URL('..', import.meta.url));
  const clientDir = join(root, 'dist', 'client');
  if (clientBuildIsStale(root, clientDir)) await buildClient(root);
  const server = await startServer({ database: { kind: 'memory' }, port: 0, host: '127.0.0.1', clientDir, quiet: true });
  const browser = await chromium.launchPersistentContext(join('/tmp', `canwright-bench-${process.pid}`), {
    executablePath: chromiumPath,
    headless: true,
    viewport: { width: 1280, height: 800 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    const page = await browser.newPage();
    await page.goto(`${server.url}/preview-demo`);
    await page.waitForFunction(() => typeof (window as { __canwrightPreviewBench?: unknown }).__canwrightPreviewBench === 'function');
    const median = await page.evaluate(() => (window as unknown as { __canwrightPreviewBench: (runs: number) => number }).__canwrightPreviewBench(50));
    console.log(`preview redraw, 500 holes, Chromium: median ${median.toFixed(2)} ms over 50 redraws  (target <= 4 ms: ${median <= 4 ? 'met' : 'NOT met'})`);
  } finally {
    await browser.close();
    await server.close();
  }
}
