import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { hostname, tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DataDirLockedError, lockDataDir } from '../../server/db/data-dir-lock.ts';

const freshDir = () => mkdtempSync(join(tmpdir(), 'canwright-lock-'));

describe('lockDataDir', () => {
  it('refuses a second holder while the first holds it, and frees it on release', () => {
    const dir = freshDir();
    const first = lockDataDir(dir);
    expect(() => lockDataDir(dir)).toThrow(DataDirLockedError);
    expect(() => lockDataDir(dir)).toThrow(/already using the data folder/);
    first.release();
    expect(existsSync(first.path)).toBe(false);
    lockDataDir(dir).release();
  });

  it('takes over a lock left by a process that has died', () => {
    const dir = freshDir();
    // A pid that surely does not run: a child that has already exited.
    const dead = spawnSync(process.execPath, ['-e', '0']).pid;
    writeFileSync(join(dir, 'canwright.lock'), JSON.stringify({ pid: dead, host: hostname(), startedAt: '2026-01-01T00:00:00Z' }));
    const lock = lockDataDir(dir);
    expect(lock.path).toBe(join(dir, 'canwright.lock'));
    lock.release();
  });

  it('names the holding pid in its message', () => {
    const dir = freshDir();
    const lock = lockDataDir(dir);
    try {
      lockDataDir(dir);
      expect.unreachable();
    } catch (error) {
      expect((error as DataDirLockedError).holderPid).toBe(process.pid);
      expect((error as Error).message).toContain(`pid ${process.pid}`);
    } finally {
      lock.release();
    }
  });
});
