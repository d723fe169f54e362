import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

let server: TestServer;
let http: HttpClient;
beforeAll(async () => {
  server = await startTestServer();
  http = new HttpClient(server.url);
});
afterAll(() => server.close());

describe('GET /api/health', () => {
  it('answers ok with the database reachable', async () => {
    const response = await http.get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ status: 'ok', database: { reachable: true } });
    expect(response.body.database.kind).toBe(process.env.TEST_DB === 'postgres' ? 'postgres' : 'memory');
  });
});

describe('unknown API routes and bad bodies', () => {
  it('answers 404 in JSON for an unknown API path', async () => {
    const response = await http.get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body.error.code).toBe('NOT_FOUND');
  });

  it('answers 400 for a body that is not JSON', async () => {
    const response = await fetch(new URL('/api/account/preferences', server.url), {
      method: 'PATCH',
      headers: { 'Content-Type': 'application/json', Origin: server.url },
      body: '{"units": ',
    });
    expect(response.status).toBe(400);
    expect((await response.json()).error.code).toBe('INVALID_JSON');
  });

  it('answers 413 for a body over the size limit', async () => {
    const response = await http.patch('/api/account/preferences', { units: 'x'.repeat(1_100_000) });
    expect(response.status).toBe(413);
  });

  it('sends the usual security headers', async () => {
    const response = await http.get('/api/health');
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(response.headers.get('content-security-policy')).toContain("default-src 'self'");
    expect(response.headers.get('x-powered-by')).toBeNull();
  });
});
