import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { buildClient, clientBuildIsStale } from '../server/boot/client-build.ts';

/**
 * JavaScript the landing page loads (its entry and the chunks index.html preloads), as the server
 * sends it: the brotli files the build wrote (server/http/client-files.ts). Goal: <= 100 kB brotli.
 * Gzip is reported beside it, the figure earlier runs measured.
 */
export async function benchBundle(): Promise<void> {
  const root = fileURLToPath(new URL('..', import.meta.url));
  const clientDir = join(root, 'dist', 'client');
  if (clientBuildIsStale(root, clientDir)) await buildClient(root);
  const html = readFileSync(join(clientDir, 'index.html'), 'utf8');
  const scripts = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+\.js)"/g)].map((m) => m[1]!);
  const files = [...new Set(scripts)];
  const gzip = files.reduce((sum, file) => sum + gzipSync(readFileSync(join(clientDir, file))).length, 0) / 1000;
  const brotli = files.reduce((sum, file) => sum + (existsSync(join(clientDir, `${file}.br`)) ? readFileSync(join(clientDir, `${file}.br`)).length : NaN), 0) / 1000;
  console.log(`landing page JavaScript on the wire: ${brotli.toFixed(1)} kB brotli (${gzip.toFixed(1)} kB gzip) in ${files.length} files  (goal <= 100 kB brotli: ${brotli <= 100 ? 'met' : 'NOT met'})`);
}
