import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript helper without types (it runs before anything is installed)
import { findMismatch } from '../../scripts/ensure-deps.mjs';

function project(lock: object, installed?: object): string {
  const root = mkdtempSync(join(tmpdir(), 'canwright-deps-'));
  writeFileSync(join(root, 'package-lock.json'), JSON.stringify(lock));
  if (installed) {
    mkdirSync(join(root, 'node_modules'));
    writeFileSync(join(root, 'node_modules', '.package-lock.json'), JSON.stringify(installed));
  }
  return root;
}

const lock = { packages: { '': {}, 'node_modules/zod': { version: '4.6.7' }, 'node_modules/fsevents': { version: '2.3.3', optional: true } } };

describe('findMismatch (npm start / npm test install step)', () => {
  it('asks for an install when node_modules is missing', () => {
    expect(findMismatch(project(lock))).toBe('node_modules is missing');
  });
  it('asks for an install when a version differs from the lock file', () => {
    expect(findMismatch(project(lock, { packages: { 'node_modules/zod': { version: '4.0.0' } } }))).toBe('zod is not at 4.6.7');
  });
  it('is satisfied when every non-optional package matches', () => {
    expect(findMismatch(project(lock, { packages: { 'node_modules/zod': { version: '4.6.7' } } }))).toBeUndefined();
  });
});
