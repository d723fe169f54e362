import { closeSync, mkdirSync, openSync, readFileSync, rmSync, statSync, writeSync } from 'node:fs';
import { hostname } from 'node:os';
import { join, resolve } from 'node:path';

/**
 * PGlite takes no lock on its folder, and two processes writing one folder lose data.
 * So the server holds a lock file in DATA_DIR for as long as it runs: created with the `wx`
 * flag (fails if it exists), holding our pid. A lock whose pid is gone on this host is stale
 * and taken over.
 */
export class DataDirLockedError extends Error {
  constructor(
    readonly lockPath: string,
    readonly holderPid: number,
  ) {
    super(
      `Another Canwright server (pid ${holderPid}) is already using the data folder ${resolve(lockPath, '..')}.\n` +
        `Stop that server first, or give this one its own folder with DATA_DIR=...\n` +
        `(If you are sure no server is running, delete ${lockPath}.)`,
    );
    this.name = 'DataDirLockedError';
  }
}

export interface DataDirLock {
  path: string;
  release(): void;
}

interface LockContents {
  pid: number;
  host: string;
  startedAt: string;
}

export function lockDataDir(dataDir: string): DataDirLock {
  mkdirSync(dataDir, { recursive: true });
  const path = join(resolve(dataDir), 'canwright.lock');
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(path, 'wx');
      const contents: LockContents = { pid: process.pid, host: hostname(), startedAt: new Date().toISOString() };
      writeSync(fd, JSON.stringify(contents));
      closeSync(fd);
      let released = false;
      return {
        path,
        release() {
          if (released) return;
          released = true;
          if (readHolder(path)?.pid === process.pid) rmSync(path, { force: true });
        },
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = readHolder(path);
      if (holder && isAlive(holder)) throw new DataDirLockedError(path, holder.pid);
      if (!holder && Date.now() - statSync(path).mtimeMs < 5000) throw new DataDirLockedError(path, 0); // being written right now
      rmSync(path, { force: true }); // stale: its process is gone
    }
  }
  throw new Error(`Could not take the lock ${path}; another process keeps creating it.`);
}

function readHolder(path: string): LockContents | undefined {
  try {
    const parsed = JSON.parse(readFileSync(path, 'utf8')) as Partial<LockContents>;
    return typeof parsed.pid === 'number' ? { pid: parsed.pid, host: String(parsed.host ?? ''), startedAt: String(parsed.startedAt ?? '') } : undefined;
  } catch {
    return undefined; // unreadable or half-written: treat as stale
  }
}

function isAlive(holder: LockContents): boolean {
  // A pid from another host (a shared network folder) cannot be checked: assume it is alive.
  if (holder.host && holder.host !== hostname()) return true;
  if (holder.pid === process.pid) return true;
  try {
    process.kill(holder.pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}
