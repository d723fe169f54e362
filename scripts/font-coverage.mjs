#!/usr/bin/env node
// Writes shared/print/plex-coverage.ts: the characters each shipped IBM Plex Sans subset prints,
// read from the WOFF files with fontkit. Run after updating @fontsource/ibm-plex-sans:
//   node scripts/font-coverage.mjs
import { readFile, writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { register } from 'tsx/esm/api';

register();
const { deriveCoverage, formatCoverageModule } = await import('../server/render/pdf/plex-files.ts');
const require = createRequire(import.meta.url);
const { version } = JSON.parse(await readFile(require.resolve('@fontsource/ibm-plex-sans/package.json'), 'utf8'));
const target = new URL('../shared/print/plex-coverage.ts', import.meta.url);
await writeFile(target, formatCoverageModule(await deriveCoverage(), version));
console.log(`Wrote ${target.pathname}`);
