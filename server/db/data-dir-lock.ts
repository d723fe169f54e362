import { closeSync, mkdirSync, openSync, readFileSync, rmSync, statSync, writeSync } from 'node:fs';
import { hostname } from 'node:os';
import { join, resolve } from 'node:path';

/**
 * PGlite takes no lock on its folder, and two processes writing one folder lose data.
 * So the server holds a lock file in DATA_DIR for as long as it runs: created with the `wx`
 * flag (fails if it exists), holding our pid. A lock whose pid is gone on this host, or is a
 * zombie (exited, not yet reaped), is stale and taken over. A holder that still runs is given a
 * short wait first: right after `kill -9` of a whole process group the old server may still be
 * on its way out, and a restart must not be refused for that.
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
  /** Said when the lock was taken over from a server that had exited. */
  takenOver?: string;
  release(): void;
}

/** How long a holder that still runs is given to finish exiting (common practice, no source). */
const EXIT_WAIT_MS = 3000;
const POLL_MS = 50;

interface LockContents {
  pid: number;
  host: string;
  startedAt: string;
}

export function lockDataDir(dataDir: string, { exitWaitMs = EXIT_WAIT_MS }: { exitWaitMs?: number } = {}): DataDirLock {
  mkdirSync(dataDir, { recursive: true });
  const path = join(resolve(dataDir), 'canwright.lock');
  let takenOver: string | undefined;
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(path, 'wx');
      const contents: LockContents = { pid: process.pid, host: hostname(), startedAt: new Date().toISOString() };
      writeSync(fd, JSON.stringify(contents));
      closeSync(fd);
      let released = false;
      return {
        path,
        takenOver,
        release() {
          if (released) return;
          released = true;
          if (readHolder(path)?.pid === process.pid) rmSync(path, { force: true });
        },
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = readHolder(path);
      if (holder && isAlive(holder) && !waitForExit(holder, exitWaitMs)) throw new DataDirLockedError(path, holder.pid);
      if (!holder && Date.now() - statSync(path).mtimeMs < 5000) throw new DataDirLockedError(path, 0); // being written right now
      if (holder) takenOver = `The server that held the data folder (pid ${holder.pid}, started ${holder.startedAt || 'at an unknown time'}) has exited; this one takes over its lock.`;
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

/** This process, or a pid on another host (a shared network folder) that cannot be checked. */
const uncheckable = (holder: LockContents) => holder.pid === process.pid || (holder.host !== '' && holder.host !== hostname());

function isAlive(holder: LockContents): boolean {
  if (uncheckable(holder)) return true;
  try {
    process.kill(holder.pid, 0);
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
  return !isZombie(holder.pid);
}

/**
 * Linux: the state letter in /proc/<pid>/stat (proc(5)): Z zombie, X dead. Elsewhere there is
 * no /proc, and a process that answers signals counts as running.
 */
function isZombie(pid: number): boolean {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    const state = stat.slice(stat.lastIndexOf(')') + 2, stat.lastIndexOf(')') + 3);
    return state === 'Z' || state === 'X';
  } catch {
    return false;
  }
}

/** True when a holder on this host stops running within `ms`; a holder elsewhere is never waited for. */
function waitForExit(holder: LockContents, ms: number): boolean {
  if (uncheckable(holder)) return false;
  const pause = new Int32Array(new SharedArrayBuffer(4));
  for (const until = Date.now() + ms; Date.now() < until; ) {
    Atomics.wait(pause, 0, 0, POLL_MS); // a synchronous sleep: nothing else runs before the lock anyway
    if (!isAlive(holder)) return true;
  }
  return false;
}
