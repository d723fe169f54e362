// Installs dependencies when node_modules is missing or does not match package-lock.json.
// Plain JavaScript with Node built-ins only: it runs before anything is installed.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

function readJson(path) {
  try {
    return JSON.parse(readFileSync(path, 'utf8'));
  } catch {
    return undefined;
  }
}

/** Names the first package whose installed version differs from the lock file, or undefined. */
export function findMismatch(root) {
  const lock = readJson(join(root, 'package-lock.json'));
  const installed = readJson(join(root, 'node_modules', '.package-lock.json'));
  if (!lock) return 'package-lock.json is missing';
  if (!installed) return 'node_modules is missing';
  for (const [path, entry] of Object.entries(lock.packages ?? {})) {
    if (path === '' || entry.optional || entry.link) continue;
    if (installed.packages?.[path]?.version !== entry.version) return `${path.replace(/^.*node_modules\//, '')} is not at ${entry.version}`;
  }
  return undefined;
}

export function ensureDependencies(root) {
  const mismatch = findMismatch(root);
  if (!mismatch) return;
  if (!existsSync(join(root, 'package-lock.json'))) throw new Error('package-lock.json is missing; cannot install reproducibly.');
  console.log(`Installing dependencies (${mismatch})...`);
  const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
  const result = spawnSync(npm, ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) {
    console.error('Installing dependencies failed (npm ci). See the messages above.');
    process.exit(result.status ?? 1);
  }
}
