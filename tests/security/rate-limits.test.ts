import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { productionLimits, type RateLimitPolicy } from '../../server/http/rate-limits.ts';
import { buildUser, createUser } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/**
 * Sign-in limits that neither a forged X-Forwarded-For defeats nor a shared address abuses
 * (OWASP Authentication Cheat Sheet, "Protect against automated attacks": limit per account as
 * well as per source; OWASP "Blocking Brute Force Attacks"). Small limits keep the test short;
 * the production figures are in server/http/rate-limits.ts.
 */
const policy: RateLimitPolicy = { ...productionLimits, signInsPerAddress: 20, failedSignInsPerAccount: 3, accountMailPerAccount: 2 };
const wrong = (email: string) => ({ email, password: 'not-the-password-1' });
let forged = 0;
/** A new made-up client address per request, as an attacker would send. */
const forgedAddress = () => `198.51.100.${(forged++ % 250) + 1}`;

describe('without TRUST_PROXY (the default): X-Forwarded-For is ignored', () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer({ rateLimits: policy });
  });
  afterAll(() => server.close());

  it('backs off an account after a few failed sign-ins, whatever address each try claims, with Retry-After', async () => {
    const victim = await createUser(server);
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) statuses.push((await new HttpClient(server.url, { 'X-Forwarded-For': forgedAddress() }).post('/api/auth/sign-in/email', wrong(victim.email))).status);
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
    const limited = await new HttpClient(server.url).post('/api/auth/sign-in/email', { email: victim.email, password: victim.password });
    expect(limited.status).toBe(429);
    const seconds = Number(limited.headers.get('retry-after'));
    // A short back-off: the window is one minute.
    expect(seconds).toBeGreaterThan(0);
    expect(seconds).toBeLessThanOrEqual(60);
    expect(limited.body).toMatchObject({ error: { code: 'RATE_LIMITED', message: expect.stringMatching(/^Too many tries in a short time\. Wait \d+ seconds? and try again\.$/) } });
  });

  it('counts failed tries only, and a sign-in that succeeds clears them: the owner is not held back', async () => {
    const maker = await createUser(server);
    for (let round = 0; round < 3; round++) {
      for (let miss = 0; miss < policy.failedSignInsPerAccount - 1; miss++) expect((await new HttpClient(server.url).post('/api/auth/sign-in/email', wrong(maker.email))).status).toBe(401);
      expect((await new HttpClient(server.url).post('/api/auth/sign-in/email', { email: maker.email, password: maker.password })).status).toBe(200);
    }
  });

  it('limits one address trying many accounts, though each try forges a new X-Forwarded-For', async () => {
    // The earlier tests used up part of this address's allowance; count from here.
    let limitedAt = -1;
    for (let i = 0; i < policy.signInsPerAddress + 1 && limitedAt < 0; i++) {
      const response = await new HttpClient(server.url, { 'X-Forwarded-For': forgedAddress() }).post('/api/auth/sign-in/email', wrong(buildUser().email));
      if (response.status === 429) limitedAt = i;
    }
    expect(limitedAt).toBeGreaterThanOrEqual(0);
    expect(limitedAt).toBeLessThanOrEqual(policy.signInsPerAddress);
  });

  it('limits account mail per address of the account, so nobody can flood an inbox', async () => {
    const maker = await createUser(server);
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++) {
      statuses.push((await new HttpClient(server.url, { 'X-Forwarded-For': forgedAddress() }).post('/api/auth/request-password-reset', { email: maker.email.toUpperCase(), redirectTo: '/reset-password' })).status);
    }
    expect(statuses).toEqual([200, 200, 429]);
  });
});

describe('behind one trusted proxy (TRUST_PROXY=1): the client address is the one the proxy adds', () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer({ rateLimits: policy, trustProxy: 1 });
  });
  afterAll(() => server.close());

  const via = (client: string) => new HttpClient(server.url, { 'X-Forwarded-For': client });

  it('one client who uses up its allowance does not lock the others out of sign-in', async () => {
    const attacker = via('203.0.113.7');
    let limited = false;
    for (let i = 0; i <= policy.signInsPerAddress && !limited; i++) limited = (await attacker.post('/api/auth/sign-in/email', wrong(buildUser().email))).status === 429;
    expect(limited).toBe(true);
    const maker = await createUser(server);
    expect((await via('203.0.113.99').post('/api/auth/sign-in/email', { email: maker.email, password: maker.password })).status).toBe(200);
  });

  it('a client cannot choose its address by adding its own hop in front of the proxy\'s', async () => {
    // The proxy appends the address it saw; the forged first entry is not trusted (one hop only).
    const responses = [];
    for (let i = 0; i <= policy.signInsPerAddress; i++) responses.push((await via(`${forgedAddress()}, 203.0.113.8`).post('/api/auth/sign-in/email', wrong(buildUser().email))).status);
    expect(responses).toContain(429);
  });
});

describe("Canwright's own routes", () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer({ rateLimits: { ...policy, apiPerAddress: 6, rendersPerAddress: 2 } });
  });
  afterAll(() => server.close());

  it('limit each address on /api and on renders, never the health check, with Retry-After and a plain message', async () => {
    const http = new HttpClient(server.url);
    for (let i = 0; i < 12; i++) expect((await http.get('/api/health')).status).toBe(200);
    const renders = [];
    for (let i = 0; i < 3; i++) renders.push((await http.get('/api/render/calibration.pdf?paper=a4')).status);
    expect(renders).toEqual([200, 200, 429]);
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await http.get('/api/app-info')).status);
    // Three /api requests so far (the renders) and three here, then the seventh is refused.
    expect(statuses).toEqual([200, 200, 200, 429]);
    const refused = await http.get('/api/app-info');
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(refused.body).toMatchObject({ error: { code: 'RATE_LIMITED' } });
  });
});
