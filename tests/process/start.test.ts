import { existsSync, mkdtempSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { demoAccounts } from '../../server/seed/demo-accounts.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { freePort, runStart, waitForOutput, type StartedProcess } from '../helpers/processes.ts';

const started: StartedProcess[] = [];
afterAll(async () => {
  for (const p of started) if (p.child.exitCode === null) p.child.kill('SIGKILL');
});

function start(env: Record<string, string>) {
  const p = runStart(env);
  started.push(p);
  return p;
}

describe('npm start as a real process', () => {
  it('refuses PORT=abc with a message naming PORT, and writes nothing', async () => {
    const dataDir = join(mkdtempSync(join(tmpdir(), 'canwright-env-')), 'data');
    const p = start({ PORT: 'abc', DATA_DIR: dataDir });
    expect(await p.exited).toBe(1);
    expect(p.output()).toMatch(/PORT: must be a whole number from 1 to 65535 \(got "abc"\)/);
    expect(existsSync(dataDir)).toBe(false);
  });

  it('serves, refuses a second server on the same DATA_DIR, keeps the data, and stops cleanly', async () => {
    const dataDir = mkdtempSync(join(tmpdir(), 'canwright-data-'));
    const port = await freePort();
    const first = start({ PORT: String(port), DATA_DIR: dataDir });
    // The banner arrives in several writes: wait for its last line, not its first.
    await waitForOutput(first, /Press Ctrl\+C to stop/);
    expect(first.output()).toContain(`http://localhost:${port}`);
    for (const account of demoAccounts) expect(first.output()).toContain(account.email);

    const url = `http://localhost:${port}`;
    const health = await new HttpClient(url).get('/api/health');
    expect(health.body).toMatchObject({ status: 'ok', database: { kind: 'pglite', reachable: true } });

    // Something the first server wrote: the maker's units preference.
    const maker = demoAccounts.find((a) => a.role === 'maker')!;
    const http = new HttpClient(url);
    expect((await http.post('/api/auth/sign-in/email', { email: maker.email, password: maker.password })).status).toBe(200);
    expect((await http.patch('/api/account/preferences', { units: 'mm' })).status).toBe(200);
    const before = readdirSync(join(dataDir, 'pglite')).sort();

    const secondPort = await freePort();
    const t0 = Date.now();
    const second = start({ PORT: String(secondPort), DATA_DIR: dataDir });
    expect(await second.exited).toBe(1);
    expect(Date.now() - t0).toBeLessThan(15_000);
    expect(second.output()).toMatch(/already using the data folder/);
    expect(second.output()).toContain(`pid ${first.child.pid}`);

    expect((await new HttpClient(url).get('/api/health')).status).toBe(200);
    expect((await http.get('/api/account')).body.units).toBe('mm');
    expect(readdirSync(join(dataDir, 'pglite')).sort()).toEqual(before);

    first.child.kill('SIGTERM');
    expect(await first.exited).toBe(0);
    expect(existsSync(join(dataDir, 'canwright.lock'))).toBe(false);

    // After a clean stop the data is intact for the next start.
    const again = start({ PORT: String(port), DATA_DIR: dataDir });
    await waitForOutput(again, /Canwright is running at/);
    const later = new HttpClient(url);
    expect((await later.post('/api/auth/sign-in/email', { email: maker.email, password: maker.password })).status).toBe(200);
    expect((await later.get('/api/account')).body.units).toBe('mm');
    again.child.kill('SIGINT');
    expect(await again.exited).toBe(0);
  });
});
