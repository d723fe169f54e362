import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** Files and folders whose change means the client must be rebuilt. */
const inputs = ['src', 'shared', 'index.html', 'vite.config.ts', 'package-lock.json', 'public'];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, entry)));
  return newest;
}

/** True when dist/client is missing or older than any of its sources. */
export function clientBuildIsStale(root: string, clientDir: string): boolean {
  const built = join(clientDir, 'index.html');
  if (!existsSync(built)) return true;
  const builtAt = statSync(built).mtimeMs;
  return inputs.some((input) => newestMtime(join(root, input)) > builtAt);
}

/**
 * Always a production build: Vite keeps an inherited NODE_ENV (vitest sets "test"), which would
 * bundle React's development build, twice the size, into dist/ for npm start to serve later.
 */
export async function buildClient(root: string): Promise<void> {
  const { build } = await import('vite');
  const inherited = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({ root, mode: 'production', logLevel: 'warn', configFile: join(root, 'vite.config.ts') });
  } finally {
    if (inherited === undefined) delete process.env.NODE_ENV;
    else process.env.NODE_ENV = inherited;
  }
}
