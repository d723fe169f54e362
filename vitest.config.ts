import { defineConfig } from 'vitest/config';

/**
 * Test layers, each a vitest project: unit (pure code), api (the server in-process over HTTP,
 * a fresh in-memory PGlite per file), api-postgres (the same files against a real PostgreSQL
 * server, when TEST_DATABASE_URL is set), render (PDF and SVG output, rasterised and measured),
 * security (every route for every actor, fuzzed bodies, limits, kill -9 during writes),
 * process (npm start as a real process) and browser (Chromium through playwright-core).
 */
/** Security files that talk to one in-process server also run on PostgreSQL. */
const securityOnPostgres = ['route-matrix', 'control-characters', 'body-limits', 'same-origin', 'local-mailbox'].map((name) => `tests/security/${name}.test.ts`);
const postgres = process.env.TEST_DATABASE_URL
  ? [
      { test: { name: 'api-postgres', include: ['tests/api/**/*.test.ts'], testTimeout: 30_000, hookTimeout: 60_000, env: { TEST_DB: 'postgres' } } },
      { test: { name: 'security-postgres', include: securityOnPostgres, testTimeout: 60_000, hookTimeout: 60_000, env: { TEST_DB: 'postgres' } } },
    ]
  : [];

export default defineConfig({
  test: {
    reporters: ['default', './tests/reporters/counts-reporter.ts'],
    projects: [
      { test: { name: 'unit', include: ['tests/unit/**/*.test.ts', 'shared/**/*.test.ts'] } },
      { test: { name: 'api', include: ['tests/api/**/*.test.ts'], testTimeout: 30_000, hookTimeout: 60_000 } },
      { test: { name: 'render', include: ['tests/render/**/*.test.ts'], testTimeout: 120_000, hookTimeout: 120_000 } },
      // Attacks on the server as a whole: every route for every actor, fuzzed bodies, limits, crashes.
      { test: { name: 'security', include: ['tests/security/**/*.test.ts'], globalSetup: ['tests/setup/build-client.ts'], testTimeout: 120_000, hookTimeout: 120_000 } },
      ...postgres,
      { test: { name: 'process', include: ['tests/process/**/*.test.ts'], globalSetup: ['tests/setup/build-client.ts'], testTimeout: 120_000, hookTimeout: 120_000 } },
      { test: { name: 'browser', include: ['tests/browser/**/*.test.ts'], globalSetup: ['tests/setup/check-browser.ts', 'tests/setup/build-client.ts'], testTimeout: 120_000, hookTimeout: 120_000, fileParallelism: false } },
    ],
  },
});
