import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { demoAccounts } from '../../server/seed/demo-accounts.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { freePort, runStart, waitForOutput, type StartedProcess } from '../helpers/processes.ts';
import { recordCount } from '../helpers/security-counts.ts';

/**
 * A write the server acknowledged survives the server's sudden death (kill -9 of its whole
 * process group, mid-write), and a restart right after is never refused by the lock the dead
 * process left (PostgreSQL manual, "Reliability and the Write-Ahead Log": a committed
 * transaction is durable).
 */
const CYCLES = 5;
const WRITERS = 3;
const dataDir = mkdtempSync(join(tmpdir(), 'canwright-crash-'));
let running: StartedProcess | undefined;
afterAll(() => {
  if (running?.child.exitCode === null) process.kill(-running.child.pid!, 'SIGKILL');
  rmSync(dataDir, { recursive: true, force: true });
});

const maker = demoAccounts.find((account) => account.role === 'maker')!;

describe('kill -9 during acknowledged writes', () => {
  it(`loses nothing acknowledged over ${CYCLES} cycles, and every restart comes up`, async ({ task }) => {
    const port = await freePort();
    const url = `http://localhost:${port}`;
    const acknowledged: string[] = [];
    let unanswered = 0;
    for (let cycle = 1; cycle <= CYCLES; cycle++) {
      const server = runStart({ PORT: String(port), DATA_DIR: dataDir }, { ownGroup: true });
      running = server;
      await waitForOutput(server, /Canwright is running at/);
      expect(server.output(), `restart ${cycle}`).not.toMatch(/cannot start/);

      const http = new HttpClient(url);
      expect((await http.post('/api/auth/sign-in/email', { email: maker.email, password: maker.password })).status).toBe(200);
      // Everything acknowledged so far is still there after the crash before this start.
      for (const id of acknowledged) expect((await http.get(`/api/designs/${id}`)).status, `design ${id} after restart ${cycle}`).toBe(200);

      let stop = false;
      const writer = async (n: number) => {
        for (let i = 0; !stop; i++) {
          try {
            const response = await http.post('/api/designs', { document: { ...pintCanStove, name: `Crash test ${cycle}.${n}.${i}` } });
            if (response.status === 201) acknowledged.push(response.body.id);
          } catch {
            unanswered++; // the server died before answering: not acknowledged, so not counted
            return;
          }
        }
      };
      const writers = Array.from({ length: WRITERS }, (_, n) => writer(n));
      await new Promise((resolve) => setTimeout(resolve, 1200));
      process.kill(-server.child.pid!, 'SIGKILL');
      stop = true;
      await Promise.all(writers);
      await server.exited;
    }

    // One last start to check the writes of the last cycle.
    const last = runStart({ PORT: String(port), DATA_DIR: dataDir }, { ownGroup: true });
    running = last;
    await waitForOutput(last, /Canwright is running at/);
    const http = new HttpClient(url);
    expect((await http.post('/api/auth/sign-in/email', { email: maker.email, password: maker.password })).status).toBe(200);
    const lost = [];
    for (const id of acknowledged) if ((await http.get(`/api/designs/${id}`)).status !== 200) lost.push(id);
    process.kill(-last.child.pid!, 'SIGTERM');
    await last.exited;

    expect(lost).toEqual([]);
    expect(acknowledged.length).toBeGreaterThan(CYCLES * 5);
    recordCount(task, 'kill -9 cycles', `${CYCLES} cycles, ${acknowledged.length} acknowledged writes, 0 lost, ${unanswered} cut off unanswered, ${CYCLES + 1} starts, none refused`);
  });
});
