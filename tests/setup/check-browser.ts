import { existsSync } from 'node:fs';

/**
 * Says before the browser tests start whether Chromium is there. Without it the tests are
 * skipped (tests/helpers/browser.ts), except on CI, where that is a failure.
 */
export default function setup(): void {
  const path = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
  if (existsSync(path)) return;
  const how = 'install it with `apt-get install -y chromium`, or set CHROMIUM_PATH';
  // On CI each browser test file fails to load instead (tests/helpers/browser.ts), which counts as a failure.
  if (process.env.CI === 'true') console.error(`\n[browser] CI=true but Chromium is missing at ${path}: the browser tests FAIL. ${how}.\n`);
  else console.warn(`\n[browser] Chromium is missing at ${path}: the browser tests are SKIPPED. To run them, ${how}.\n`);
}
