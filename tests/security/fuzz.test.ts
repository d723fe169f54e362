import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { productionLimits, type RateLimitPolicy } from '../../server/http/rate-limits.ts';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { createUser, signedInClient } from '../helpers/factories.ts';
import type { HttpClient } from '../helpers/http-client.ts';
import { routeTable } from '../helpers/route-table.ts';
import { recordCount } from '../helpers/security-counts.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/**
 * A fuzz of every JSON route (OWASP Web Security Testing Guide, WSTG-INPV: input validation
 * testing): thousands of bodies, made from a valid body by dropping, replacing and nesting values
 * or made up whole, and not one may get a 5xx. The seed is fixed on CI (a failure there repeats
 * here with the same seed); elsewhere each run tries new bodies and prints its seed.
 */
const SEED = process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : process.env.CI ? 20261203 : Math.floor(Math.random() * 2 ** 31);
const RUNS_PER_APP_ROUTE = 150;
const RUNS_PER_AUTH_ROUTE = 25;
/** The fuzz sends thousands of requests from one address: limits are raised here (their own tests: rate-limits). */
const unlimited = Object.fromEntries(Object.keys(productionLimits).map((name) => [name, 1_000_000])) as unknown as RateLimitPolicy;

const design = () => structuredClone(pintCanStove) as Record<string, unknown>;
const validBodies: Record<string, () => Record<string, unknown>> = {
  'POST /api/designs': () => ({ document: design(), tags: ['fuzz'], name: 'Fuzz' }),
  'PATCH /api/designs/:id': () => ({ name: 'Fuzzed', tags: ['a', 'b'] }),
  'POST /api/designs/:id/versions': () => ({ document: design(), note: 'fuzz' }),
  'POST /api/printer-profiles': () => ({ name: 'Fuzz', measuredXMm: 150, measuredYMm: 200 }),
  'PATCH /api/printer-profiles/:id': () => ({ name: 'Fuzz', measuredXMm: 150.2 }),
  'PATCH /api/account/preferences': () => ({ units: 'mm', defaultPaper: 'a4', drillSetIds: ['frac:1/4'] }),
  'PATCH /api/account': () => ({ name: 'Fuzz Maker' }),
  // Not the owner's password (the fuzz must not delete the account the other routes use).
  'POST /api/account/delete': () => ({ password: 'not-the-fuzz-password' }),
  'PATCH /api/admin/users/:id': () => ({ role: 'instructor', disabled: false }),
  'POST /api/designs/:id/burns': () => ({ date: '2026-11-30T10:00:00Z', fuelKind: 'pellets', fuelMassG: 120, wind: 'light', windscreen: true, timeToJetsS: 140, flameRing: 4, smoke: 'some', notes: 'fuzz', version: 1 }),
  'POST /api/workshops': () => ({ title: 'Fuzz session', designId: ids.kitDesignId, startsAt: '2026-12-10T18:30:00Z', version: 1, place: 'Hall', notes: 'fuzz', capacity: 12, defaultPaper: 'a4' }),
  'PATCH /api/workshops/:id': () => ({ title: 'Fuzzed', place: 'Yard', capacity: 30, version: 1 }),
  'POST /api/workshops/:id/invitations': () => ({ emails: ['fuzz-guest@workshop.example'] }),
  'POST /api/workshops/join': () => ({ code: 'ABCD2345' }),
  'POST /api/workshops/:id/burns': () => ({ date: '2026-12-10T20:00:00Z', timeToJetsS: 120, notes: 'fuzz' }),
  'PATCH /api/burns/:burnId': () => ({ notes: 'fuzzed', charG: 12, ambientC: 5, date: '2026-12-01T10:00:00+01:00' }),
  'POST /api/render/pdf': () => ({ design: design(), print: { paper: 'letter', orientation: 'portrait', marginMm: 8 }, printer: { measuredXMm: 150, measuredYMm: 200 }, version: '2' }),
  'POST /api/render/svg': () => ({ design: design(), print: { paper: 'a4' } }),
  'POST /api/render/holes.csv': () => ({ design: design() }),
  '/sign-up/email': () => ({ name: 'Fuzz', email: 'fuzz@workshop.example', password: 'fuzz-password-1', callbackURL: '/verify' }),
  '/sign-in/email': () => ({ email: 'fuzz@workshop.example', password: 'fuzz-password-1', rememberMe: true }),
  '/request-password-reset': () => ({ email: 'fuzz@workshop.example', redirectTo: '/reset-password' }),
  '/reset-password': () => ({ token: 'abc', newPassword: 'fuzz-password-2' }),
  '/update-user': () => ({ name: 'Fuzz', image: null }),
  '/change-password': () => ({ currentPassword: 'fuzz-password-1', newPassword: 'fuzz-password-2', revokeOtherSessions: false }),
  '/change-email': () => ({ newEmail: 'fuzz2@workshop.example', callbackURL: '/account' }),
  '/send-verification-email': () => ({ email: 'fuzz@workshop.example', callbackURL: '/verify' }),
};

/** Values that have broken servers before: nulls, control characters, lone surrogates, huge and odd numbers, deep nesting. */
const hostile = fc.oneof(
  // null first and often: a field that is present but null slips past "optional" more than anything.
  { weight: 3, arbitrary: fc.constant(null) },
  fc.jsonValue({ maxDepth: 3 }),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.constantFrom('', ' ', '\u0000', 'a\u0000b', '\u202e', '\ud800', '__proto__', 'constructor', 'a'.repeat(5000), -1, 0, 1e308, -1e308, 2 ** 53 + 1, 0.1, true, [], {}, [[[[[[]]]]]], { __proto__: { admin: true } }),
  fc.double(),
  fc.integer(),
);

/** A valid body changed a little or a lot: keys dropped, replaced, added, and the same one level down. */
function mutated(value: unknown, depth: number): fc.Arbitrary<unknown> {
  if (depth === 0 || value === null || typeof value !== 'object') return fc.oneof({ weight: 3, arbitrary: fc.constant(value) }, { weight: 1, arbitrary: hostile });
  const entries = Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value);
  const fields = entries.map(([key, v]) =>
    fc.oneof({ weight: 4, arbitrary: mutated(v, depth - 1).map((m) => [key, m] as const) }, { weight: 1, arbitrary: fc.constant(undefined) }, { weight: 1, arbitrary: hostile.map((h) => [key, h] as const) }),
  );
  return fc.tuple(fc.tuple(...fields), fc.dictionary(fc.string({ maxLength: 8 }), hostile, { maxKeys: 2 })).map(([kept, extra]) => {
    const pairs = kept.filter((pair): pair is readonly [string, unknown] => pair !== undefined);
    return Array.isArray(value) ? pairs.map(([, v]) => v) : { ...extra, ...Object.fromEntries(pairs) };
  });
}

const bodyFor = (key: string) => {
  const base = validBodies[key]?.() ?? {};
  return fc.oneof({ weight: 6, arbitrary: mutated(base, 3) }, { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 4 }) }, { weight: 1, arbitrary: fc.constant(base) });
};

let server: TestServer;
let owner: HttpClient;
let admin: HttpClient;
let ids: { designId: string; profileId: string; userId: string; burnId: string; workshopId: string; kitDesignId: string };

beforeAll(async () => {
  server = await startTestServer({ rateLimits: unlimited });
  // An instructor: a maker who can also run workshops, so every route is reached.
  owner = await signedInClient(server, await createUser(server, { role: 'instructor' }));
  admin = await signedInClient(server, await createUser(server, { role: 'admin' }));
  const bystander = await createUser(server);
  const created = await owner.post('/api/designs', { document: design() });
  const profile = await owner.post('/api/printer-profiles', { name: 'Laser', measuredXMm: 150, measuredYMm: 200 });
  const burn = await owner.post(`/api/designs/${created.body.id}/burns`, { date: '2026-11-30T10:00:00Z' });
  const kit = await owner.post('/api/designs', { document: design() });
  const workshop = await owner.post('/api/workshops', { title: 'Fuzz night', designId: kit.body.id, startsAt: '2026-12-10T18:30:00Z' });
  ids = { designId: created.body.id, profileId: profile.body.id, userId: bystander.id, burnId: burn.body.id, workshopId: workshop.body.id, kitDesignId: kit.body.id };
});
afterAll(() => server.close());

describe('fuzzed bodies on every JSON route', () => {
  it(`never get a 5xx (seed ${SEED})`, async ({ task }) => {
    const routes = routeTable(server.app).filter((r) => ['POST', 'PATCH', 'PUT'].includes(r.method) && !r.path.startsWith('/api/auth/'));
    const authRoutes = Object.values(server.auth.api as Record<string, { path?: string; options?: { method?: string | string[] } }>)
      .filter((e) => e.path && [e.options?.method].flat().includes('POST'))
      .map((e) => e.path!);
    let bodies = 0;
    const failures: string[] = [];
    const send = async (http: HttpClient, method: string, path: string, body: unknown, label: string) => {
      const response = await http.request(method, path, body === undefined ? null : body);
      bodies++;
      if (response.status >= 500) failures.push(`${label} -> ${response.status} with ${JSON.stringify(body).slice(0, 300)}`);
      return response.status < 500;
    };

    for (const route of routes) {
      const key = `${route.method} ${route.path}`;
      const path = route.path
        .replace(/^\/api\/designs\/:id/, `/api/designs/${ids.designId}`)
        .replace(/^\/api\/printer-profiles\/:id/, `/api/printer-profiles/${ids.profileId}`)
        .replace(/^\/api\/admin\/users\/:id/, `/api/admin/users/${ids.userId}`)
        .replace(/^\/api\/workshops\/:id/, `/api/workshops/${ids.workshopId}`)
        .replace(':burnId', ids.burnId)
        .replace(':number', '1');
      const http = route.path.startsWith('/api/admin') ? admin : owner;
      await fc.assert(
        fc.asyncProperty(bodyFor(key), (body) => send(http, route.method, path, body, key)),
        { seed: SEED, numRuns: RUNS_PER_APP_ROUTE, endOnFailure: true },
      );
    }
    for (const path of authRoutes) {
      // A signed-in account of its own for each endpoint: some of them end or change the session.
      const fuzzer = await signedInClient(server, await createUser(server));
      await fc.assert(
        fc.asyncProperty(bodyFor(path), (body) => send(fuzzer, 'POST', `/api/auth${path}`, body, `POST /api/auth${path}`)),
        { seed: SEED, numRuns: RUNS_PER_AUTH_ROUTE, endOnFailure: true },
      );
    }
    expect(failures).toEqual([]);
    expect(bodies).toBeGreaterThan(2000);
    recordCount(task, 'fuzz bodies', `${bodies} bodies on ${routes.length} app routes and ${authRoutes.length} better-auth routes, 0 answered 5xx (seed ${SEED})`);
  });
});
