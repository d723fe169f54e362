import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { buildClient, clientBuildIsStale } from '../server/boot/client-build.ts';

/** Gzipped JavaScript the landing page loads (its entry and the chunks index.html preloads). Target: <= 170 kB. */
export async function benchBundle(): Promise<void> {
  const root = fileURLToPath(new URL('..', import.meta.url));
  const clientDir = join(root, 'dist', 'client');
  if (clientBuildIsStale(root, clientDir)) await buildClient(root);
  const html = readFileSync(join(clientDir, 'index.html'), 'utf8');
  const scripts = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+\.js)"/g)].map((m) => m[1]!);
  const bytes = [...new Set(scripts)].reduce((sum, file) => sum + gzipSync(readFileSync(join(clientDir, file))).length, 0);
  const kB = bytes / 1000;
  console.log(`landing page JavaScript: ${kB.toFixed(1)} kB gzip in ${scripts.length} files  (target <= 170 kB: ${kB <= 170 ? 'met' : 'NOT met'})`);
}
