import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/** Every API route stops reading a body past 1 MB (saved designs past 256 kB) with 413, sign-in included. */
describe('request body limits', () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  const big = JSON.stringify({ email: 'someone@workshop.example', password: 'x'.repeat(2 * 1024 * 1024) });
  const post = (path: string, body: BodyInit, extra: RequestInit = {}) =>
    fetch(server.url + path, { method: 'POST', headers: { 'Content-Type': 'application/json', Origin: server.url }, body, ...extra });

  it('refuses a 2 MB sign-in body with 413 before better-auth reads it', async () => {
    const response = await post('/api/auth/sign-in/email', big);
    expect(response.status).toBe(413);
    expect(await response.json()).toMatchObject({ error: { code: 'TOO_LARGE' } });
  });

  it('also when the body comes in chunks with no length given', async () => {
    const bytes = new TextEncoder().encode(big);
    const stream = new ReadableStream({
      start(controller) {
        for (let i = 0; i < bytes.length; i += 64 * 1024) controller.enqueue(bytes.subarray(i, i + 64 * 1024));
        controller.close();
      },
    });
    const response = await post('/api/auth/sign-in/email', stream, { duplex: 'half' } as RequestInit);
    expect(response.status).toBe(413);
  });

  it('refuses a body that claims another type but is too large, and still reads a normal sign-in', async () => {
    expect((await fetch(server.url + '/api/auth/sign-in/email', { method: 'POST', headers: { 'Content-Type': 'text/plain', Origin: server.url }, body: big })).status).toBe(413);
    const normal = await post('/api/auth/sign-in/email', JSON.stringify({ email: 'nobody@workshop.example', password: 'not-a-password' }));
    expect(normal.status).toBe(401);
  });

  it('refuses a 2 MB body on the app’s own routes too', async () => {
    expect((await post('/api/designs', big)).status).toBe(413);
    expect((await post('/api/printer-profiles', big)).status).toBe(413);
  });
});
