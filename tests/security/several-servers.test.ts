import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { developmentLimits } from '../../server/http/rate-limits.ts';
import { demoAccounts } from '../../server/seed/demo-accounts.ts';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { HttpClient } from '../helpers/http-client.ts';
import { freePort, runStart, waitForOutput, type StartedProcess } from '../helpers/processes.ts';
import { createPostgresTestDatabase } from '../helpers/test-database.ts';

/**
 * Two Canwright servers on one PostgreSQL database, as behind a load balancer: a session made on
 * one works on the other, and a per-account sign-in limit counts tries on both together. Runs
 * where a PostgreSQL server is at hand (TEST_DATABASE_URL; CI starts one).
 */
const postgres = process.env.TEST_DATABASE_URL;
const maker = demoAccounts.find((account) => account.role === 'maker')!;

describe.skipIf(!postgres)('several servers, one database', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'canwright-two-'));
  const servers: StartedProcess[] = [];
  let drop: () => Promise<void>;
  let urls: [string, string];

  beforeAll(async () => {
    const database = await createPostgresTestDatabase();
    drop = database.drop;
    const ports = [await freePort(), await freePort()];
    urls = [`http://localhost:${ports[0]}`, `http://localhost:${ports[1]}`];
    // One public address for both, as a load balancer gives them; the same secret signs sessions.
    const shared = { DATABASE_URL: database.target.url, PUBLIC_URL: urls[0], BETTER_AUTH_SECRET: 'several-servers-test-secret-0123456789abcdef', DATA_DIR: dataDir };
    for (const port of ports) {
      const server = runStart({ ...shared, PORT: String(port) });
      servers.push(server);
      await waitForOutput(server, /Canwright is running at/);
    }
  });

  afterAll(async () => {
    for (const server of servers) if (server.child.exitCode === null) server.child.kill('SIGTERM');
    await Promise.all(servers.map((server) => server.exited));
    await drop?.();
    rmSync(dataDir, { recursive: true, force: true });
  });

  /** A browser at the public address, whose requests the balancer sends to server `n`. */
  const client = (n: 0 | 1) => new HttpClient(urls[n], { Origin: urls[0] });

  it('a session made on one server works on the other, and what one saves the other serves', async () => {
    const onFirst = client(0);
    expect((await onFirst.post('/api/auth/sign-in/email', { email: maker.email, password: maker.password })).status).toBe(200);
    const onSecond = new HttpClient(urls[1], { Origin: urls[0], Cookie: onFirst.cookieHeader });
    const account = await onSecond.get('/api/account');
    expect(account.status).toBe(200);
    expect(account.body.email).toBe(maker.email);
    const created = await onSecond.post('/api/designs', { document: { ...pintCanStove, name: 'Made on the second server' } });
    expect(created.status).toBe(201);
    expect((await onFirst.get(`/api/designs/${created.body.id}`)).body.name).toBe('Made on the second server');
  });

  it('counts failed sign-ins on one account across both servers', async () => {
    const limit = developmentLimits.failedSignInsPerAccount;
    const wrong = { email: maker.email, password: 'not-the-password-1' };
    const statuses: number[] = [];
    // Half the tries on each server: neither alone sees as many as the limit.
    for (let i = 0; i < limit; i++) statuses.push((await client((i % 2) as 0 | 1).post('/api/auth/sign-in/email', wrong)).status);
    expect(statuses.every((status) => status === 401)).toBe(true);
    const next = [await client(0).post('/api/auth/sign-in/email', wrong), await client(1).post('/api/auth/sign-in/email', wrong)];
    expect(next.map((response) => response.status)).toEqual([429, 429]);
    expect(Number(next[1]!.headers.get('retry-after'))).toBeGreaterThan(0);
  });
});
