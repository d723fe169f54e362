import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';

export const repoRoot = fileURLToPath(new URL('../..', import.meta.url));

export interface StartedProcess {
  child: ChildProcess;
  output(): string;
  exited: Promise<number | null>;
}

/**
 * Runs `npm start`'s script (node scripts/start.mjs) with extra environment, capturing its output.
 * `ownGroup` starts it in a process group of its own, so a test can kill the whole group at once.
 */
export function runStart(env: Record<string, string>, { ownGroup = false } = {}): StartedProcess {
  const child = spawn(process.execPath, ['scripts/start.mjs'], {
    cwd: repoRoot,
    detached: ownGroup,
    env: { ...process.env, NODE_ENV: 'development', CI: '', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let text = '';
  child.stdout!.on('data', (chunk: Buffer) => (text += chunk.toString()));
  child.stderr!.on('data', (chunk: Buffer) => (text += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return { child, output: () => text, exited };
}

export async function waitForOutput(started: StartedProcess, pattern: RegExp, timeoutMs = 90_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!pattern.test(started.output())) {
    if (started.child.exitCode !== null) throw new Error(`process exited (${started.child.exitCode}) before ${pattern}:\n${started.output()}`);
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${pattern}:\n${started.output()}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}
