import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createUser, signedInClient } from '../helpers/factories.ts';
import type { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

const pint = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));

/**
 * Cross-site request forgery (OWASP CSRF Prevention Cheat Sheet: verify the origin with standard
 * headers; Fetch Metadata as the fallback): a change that carries the session cookie is taken
 * only from Canwright's own pages. Another port on localhost is another origin, though the same
 * site to SameSite=Lax cookies.
 */
describe('changes only from our own pages', () => {
  let server: TestServer;
  let api: HttpClient;
  let cookie = '';

  beforeAll(async () => {
    server = await startTestServer();
    const maker = await createUser(server);
    api = await signedInClient(server, maker);
    cookie = api.cookieHeader;
    expect(cookie).not.toBe('');
  });
  afterAll(() => server.close());

  const create = (headers: Record<string, string>) =>
    fetch(server.url + '/api/designs', { method: 'POST', headers: { 'Content-Type': 'application/json', Cookie: cookie, ...headers }, body: JSON.stringify({ document: { ...pint, name: 'Forged stove' } }) });
  const count = async () => (await api.get('/api/designs')).body.designs.length as number;

  it('refuses a foreign Origin, another localhost port included, and nothing is made', async () => {
    const before = await count();
    const port = new URL(server.url).port;
    for (const origin of ['https://evil.example', `http://localhost:${Number(port) + 1}`, 'null']) {
      const response = await create({ Origin: origin });
      expect(response.status, origin).toBe(403);
      expect(await response.json()).toMatchObject({ error: { code: 'FOREIGN_ORIGIN' } });
    }
    expect(await create({ 'Sec-Fetch-Site': 'cross-site' }).then((r) => r.status)).toBe(403);
    expect(await create({ 'Sec-Fetch-Site': 'same-site' }).then((r) => r.status)).toBe(403);
    // A cookie with no word of where the request comes from is not trusted either.
    expect(await create({}).then((r) => r.status)).toBe(403);
    expect(await count()).toBe(before);
  });

  it('refuses a forged share and delete as well', async () => {
    const created = await api.post('/api/designs', { document: pint });
    const share = await fetch(`${server.url}/api/designs/${created.body.id}/share`, { method: 'POST', headers: { 'Content-Type': 'application/json', Cookie: cookie, Origin: 'https://evil.example' }, body: '{}' });
    expect(share.status).toBe(403);
    const remove = await fetch(`${server.url}/api/designs/${created.body.id}`, { method: 'DELETE', headers: { Cookie: cookie, Origin: 'https://evil.example' } });
    expect(remove.status).toBe(403);
    expect((await api.get(`/api/designs/${created.body.id}`)).body).toMatchObject({ shared: false });
  });

  it('takes our own origin, its loopback twin and same-origin fetch metadata', async () => {
    expect((await create({ Origin: server.url })).status).toBe(201);
    expect((await create({ Origin: server.url.replace('localhost', '127.0.0.1') })).status).toBe(201);
    expect((await create({ 'Sec-Fetch-Site': 'same-origin' })).status).toBe(201);
  });

  it('lets a tool with no session through to the usual answer (no cookie, nothing to forge)', async () => {
    const response = await fetch(server.url + '/api/designs', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ document: pint }) });
    expect(response.status).toBe(401);
  });
});
