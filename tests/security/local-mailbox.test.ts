import { afterEach, describe, expect, it, vi } from 'vitest';
import { startServer, type RunningServer } from '../../server/server.ts';
import { createUser } from '../helpers/factories.ts';
import { createTestDatabase } from '../helpers/test-database.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/**
 * The local mailbox holds every sign-in and reset link: whoever reads it can take any account.
 * It is for the person at this machine only, and gone when the server listens for others.
 */
describe('the local mailbox', () => {
  let server: TestServer | RunningServer | undefined;
  let drop: (() => Promise<void>) | undefined;
  afterEach(async () => {
    await server?.close();
    await drop?.();
    server = undefined;
    drop = undefined;
    vi.restoreAllMocks();
  });

  const get = (path: string, headers: Record<string, string> = {}) => fetch(server!.url + path, { headers: { Accept: 'application/json', ...headers } });
  const requestReset = (email: string) =>
    fetch(server!.url + '/api/auth/request-password-reset', { method: 'POST', headers: { 'Content-Type': 'application/json', Origin: server!.url }, body: JSON.stringify({ email, redirectTo: '/reset-password' }) });

  it('answers a caller on this machine, and nobody whose request a proxy relayed', async () => {
    server = await startTestServer();
    expect((await get('/api/dev/mail')).status).toBe(200);
    expect(await (await get('/api/app-info')).json()).toMatchObject({ devMailbox: true });

    const relayed = await get('/api/dev/mail', { 'X-Forwarded-For': '203.0.113.9' });
    expect(relayed.status).toBe(404);
    expect(await (await get('/api/app-info', { 'X-Forwarded-For': '203.0.113.9' })).json()).toMatchObject({ devMailbox: false });
    expect((await get('/api/dev/mail', { Forwarded: 'for=203.0.113.9' })).status).toBe(404);
  });

  it('does not exist on a server listening on every address; mail is logged as not sent, without its link', async () => {
    const database = await createTestDatabase();
    drop = database.drop;
    const warnings: string[] = [];
    vi.spyOn(console, 'warn').mockImplementation((line: unknown) => void warnings.push(String(line)));
    server = await startServer({ database: database.target, port: 0, host: '0.0.0.0', seedDemo: false, quiet: true });
    expect(server.mail).toBeUndefined();
    expect((await get('/api/dev/mail')).status).toBe(404);
    expect(await (await get('/api/app-info')).json()).toMatchObject({ devMailbox: false });

    const user = await createUser(server as TestServer);
    expect((await requestReset(user.email)).status).toBe(200);
    await vi.waitFor(() => expect(warnings.some((w) => w.includes('Mail not sent'))).toBe(true));
    const line = warnings.find((w) => w.includes('Mail not sent'))!;
    expect(line).toContain(user.email);
    expect(line).not.toMatch(/token|https?:\/\//i);
  });

  it('opens to the network only when the operator says so', async () => {
    const database = await createTestDatabase();
    drop = database.drop;
    server = await startServer({ database: database.target, port: 0, host: '0.0.0.0', seedDemo: false, quiet: true, localMailboxForNetwork: true });
    expect((await get('/api/dev/mail', { 'X-Forwarded-For': '203.0.113.9' })).status).toBe(200);
  });

  it('is never kept in production, even on this machine', async () => {
    const database = await createTestDatabase();
    drop = database.drop;
    vi.spyOn(console, 'warn').mockImplementation(() => {});
    server = await startServer({ database: database.target, port: 0, host: '127.0.0.1', seedDemo: false, quiet: true, production: true });
    expect(server.mail).toBeUndefined();
    expect((await get('/api/dev/mail')).status).toBe(404);
  });
});
