import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { hostname, tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
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

describe('lockDataDir and a holder on its way out', () => {
  const children: ChildProcess[] = [];
  afterEach(() => {
    for (const child of children.splice(0)) child.kill('SIGKILL');
  });
  const holdBy = (dir: string, pid: number) => writeFileSync(join(dir, 'canwright.lock'), JSON.stringify({ pid, host: hostname(), startedAt: '2026-12-02T09:00:00Z' }));
  const run = (command: string, args: string[]) => {
    const child = spawn(command, args, { stdio: ['ignore', 'pipe', 'ignore'] });
    children.push(child);
    return child;
  };

  it('still refuses a holder that keeps running, after the short wait', () => {
    const dir = freshDir();
    const live = run('sleep', ['30']);
    holdBy(dir, live.pid!);
    const started = Date.now();
    expect(() => lockDataDir(dir, { exitWaitMs: 300 })).toThrow(`pid ${live.pid}`);
    expect(Date.now() - started).toBeGreaterThanOrEqual(300);
  });

  it('takes over from a holder that exits during the wait, and says so', () => {
    const dir = freshDir();
    const exiting = run('sleep', ['0.3']);
    holdBy(dir, exiting.pid!);
    const lock = lockDataDir(dir, { exitWaitMs: 5000 });
    expect(lock.takenOver).toContain(`pid ${exiting.pid}`);
    expect(lock.takenOver).toContain('has exited');
    lock.release();
  });

  // proc(5): a zombie ("Z" in /proc/<pid>/stat) has exited but still answers kill(pid, 0).
  it.skipIf(process.platform !== 'linux')('takes over at once from a zombie holder', async () => {
    const dir = freshDir();
    // The shell starts a short sleep, prints its pid and becomes a long sleep that never reaps it.
    const parent = run('sh', ['-c', 'sleep 0.05 & echo $!; exec sleep 30']);
    const pid = Number(await new Promise<string>((resolve) => parent.stdout!.once('data', (data) => resolve(String(data).trim()))));
    await new Promise((resolve) => setTimeout(resolve, 400));
    expect(readFileSync(`/proc/${pid}/stat`, 'utf8')).toMatch(/\) Z /);
    holdBy(dir, pid);
    const started = Date.now();
    const lock = lockDataDir(dir, { exitWaitMs: 5000 });
    expect(Date.now() - started).toBeLessThan(1000);
    expect(lock.takenOver).toContain(`pid ${pid}`);
    lock.release();
  });
});
