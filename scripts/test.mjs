// `npm test`: install what is missing, then run every test project (unit, api, browser) once.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureDependencies } from './ensure-deps.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
ensureDependencies(root);
const vitest = join(root, 'node_modules', 'vitest', 'vitest.mjs');
const result = spawnSync(process.execPath, [vitest, 'run', ...process.argv.slice(2)], { cwd: root, stdio: 'inherit' });
process.exit(result.status ?? 1);
