import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildClient, clientBuildIsStale } from '../../server/boot/client-build.ts';

/** Builds the web client once before the tests that serve it, if it is missing or stale. */
export default async function setup(): Promise<void> {
  const root = fileURLToPath(new URL('../..', import.meta.url));
  if (clientBuildIsStale(root, join(root, 'dist', 'client'))) {
    console.log('[setup] building the web client for browser and process tests');
    await buildClient(root);
  }
}
