import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { users } from '../../server/db/schema.ts';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { createUser, signedInClient } from '../helpers/factories.ts';
import { HttpClient, type HttpResponse } from '../helpers/http-client.ts';
import { routeTable, type RouteEntry } from '../helpers/route-table.ts';
import { recordCount } from '../helpers/security-counts.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/**
 * Every route of the app, for every actor who is not the owner, against the first maker's
 * resources (OWASP API Security Top 10 2023, API1 "Broken Object Level Authorization" and API5
 * "Broken Function Level Authorization"): each attempt is refused, nothing of the owner's shows,
 * and the owner's data is unchanged afterwards. The routes are read from the app, so a new one is
 * in the matrix without editing this file; a route meant for everyone is listed below with why.
 */
const publicRoutes: Record<string, string> = {
  'GET /api/health': 'a health check for load balancers',
  'GET /api/app-info': 'the name and version the sign-in page shows',
  'POST /api/render/pdf': 'printing needs no account: the design travels in the body',
  'POST /api/render/svg': 'printing needs no account: the design travels in the body',
  'POST /api/render/holes.csv': 'printing needs no account: the design travels in the body',
  'GET /api/render/calibration.pdf': 'the calibration sheet is the same for everybody',
  'GET /api/shared/:token': 'a share link is for whoever holds it (its own tests: designs-access)',
  'GET /api/dev/mail': 'the local mailbox, for callers on this machine only (its own tests: local-mailbox)',
};

const document = () => structuredClone(pintCanStove);
/** Bodies an owner's request would carry, so that only authorization can refuse the others. */
const bodies: Record<string, () => unknown> = {
  'POST /api/designs': () => ({ document: document() }),
  'PATCH /api/designs/:id': () => ({ name: 'Taken over' }),
  'POST /api/designs/:id/versions': () => ({ document: { ...document(), name: 'Taken over' }, note: 'taken over' }),
  'POST /api/printer-profiles': () => ({ name: 'Taken over', measuredXMm: 150, measuredYMm: 200 }),
  'PATCH /api/printer-profiles/:id': () => ({ name: 'Taken over' }),
  'PATCH /api/account/preferences': () => ({ units: 'mm' }),
  'PATCH /api/admin/users/:id': () => ({ role: 'admin', disabled: true }),
  'POST /api/designs/:id/burns': () => ({ date: '2026-11-30T10:00:00Z', notes: 'taken over' }),
  'PATCH /api/burns/:burnId': () => ({ notes: 'taken over' }),
  // Each actor acts on their own account here; a wrong password, so that none deletes theirs.
  'PATCH /api/account': () => ({ name: 'Taken over' }),
  'POST /api/account/delete': () => ({ password: 'not-the-owners-password' }),
  'POST /api/workshops': () => ({ title: 'Taken over', designId: target.kitDesignId, startsAt: '2026-12-10T18:30:00Z' }),
  'PATCH /api/workshops/:id': () => ({ title: 'Taken over', joinCode: 'new' }),
  'POST /api/workshops/:id/invitations': () => ({ emails: ['taken-over@workshop.example'] }),
  'POST /api/workshops/join': () => ({ code: 'ZZZZ9999' }),
  'POST /api/workshops/:id/burns': () => ({ date: '2026-12-10T20:00:00Z', notes: 'taken over' }),
};

/** Routes that take a file rather than JSON: the request an owner's browser would send. */
let photo: Buffer;
/** A library exported by a maker of its own (nothing of the owner's in it): an import always goes into the caller's own account. */
let archive: Uint8Array;
const uploads: Record<string, (http: HttpClient, path: string) => Promise<HttpResponse>> = {
  'POST /api/burns/:burnId/photos': (http, path) => http.upload(path, 'photo', photo, 'stove.jpg', 'image/jpeg'),
  'POST /api/library/import': (http, path) => http.upload(path, 'archive', archive, 'library.zip', 'application/zip'),
};
const send = (http: HttpClient, route: RouteEntry, path: string) =>
  uploads[keyOf(route)]?.(http, path) ?? http.request(route.method, path, route.method === 'GET' || route.method === 'DELETE' ? undefined : (bodies[keyOf(route)]?.() ?? {}));

type Actor = 'second maker' | 'instructor' | 'admin' | 'anonymous';

let server: TestServer;
let owner: HttpClient;
let ownerId: string;
let ownerEmail: string;
let actors: Record<Actor, HttpClient>;
/** The owner's resources the attempts aim at. */
let target: Resources;
type Resources = { designId: string; profileId: string; shareToken: string; burnId: string; photoId: string; kitDesignId: string; workshopId: string; workshopCode: string; memberId: string };

beforeAll(async () => {
  photo = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#8b4513' } }).jpeg().toBuffer();
  server = await startTestServer();
  // An instructor is a maker who also runs workshops: the owner has both kinds of resource.
  const first = await createUser(server, { name: 'Owner Tamsin', role: 'instructor' });
  ownerId = first.id;
  ownerEmail = first.email;
  owner = await signedInClient(server, first);
  target = await createResources(owner);
  const archivist = await signedInClient(server, await createUser(server));
  await archivist.post('/api/designs', { document: { ...document(), name: 'A stove of my own' } });
  archive = (await archivist.bytes('/api/library/export')).bytes;
  actors = {
    'second maker': await signedInClient(server, await createUser(server)),
    instructor: await signedInClient(server, await createUser(server, { role: 'instructor' })),
    admin: await signedInClient(server, await createUser(server, { role: 'admin' })),
    anonymous: new HttpClient(server.url),
  };
});
afterAll(() => server.close());

/** The owner's design (two versions, shared), a burn with a photo and, unless one is given, a printer profile. */
async function createResources(http: HttpClient, profileId?: string): Promise<Resources> {
  const design = await http.post('/api/designs', { document: { ...document(), name: "Tamsin's secret stove" }, tags: ['secret'] });
  expect(design.status).toBe(201);
  await http.post(`/api/designs/${design.body.id}/versions`, { document: document(), note: 'second' });
  const shared = await http.post(`/api/designs/${design.body.id}/share`, {});
  const profile = profileId ? { status: 201, body: { id: profileId } } : await http.post('/api/printer-profiles', { name: "Tamsin's laser", measuredXMm: 149.5, measuredYMm: 200.4 });
  expect(profile.status).toBe(201);
  const burn = await http.post(`/api/designs/${design.body.id}/burns`, { date: '2026-11-30T10:00:00Z', notes: "Tamsin's secret burn" });
  expect(burn.status).toBe(201);
  const picture = await http.upload(`/api/burns/${burn.body.id}/photos`, 'photo', photo, 'stove.jpg', 'image/jpeg');
  expect(picture.status).toBe(201);
  // The workshop's kit is a design of its own: the first one stays deletable.
  const kit = await http.post('/api/designs', { document: { ...document(), name: "Tamsin's secret stove" } });
  const workshop = await http.post('/api/workshops', { title: "Tamsin's secret workshop", designId: kit.body.id, startsAt: '2026-12-10T18:30:00Z', capacity: 40 });
  expect(workshop.status).toBe(201);
  const member = await createUser(server);
  expect((await (await signedInClient(server, member)).post('/api/workshops/join', { code: workshop.body.code })).status).toBe(201);
  return {
    designId: design.body.id,
    profileId: profile.body.id,
    shareToken: shared.body.shareToken,
    burnId: burn.body.id,
    photoId: picture.body.id,
    kitDesignId: kit.body.id,
    workshopId: workshop.body.id,
    workshopCode: workshop.body.code,
    memberId: member.id,
  };
}

/** Everything of the owner's that could change: the library, every version, profiles, account and the user row. */
async function ownerSnapshot() {
  const designs = (await owner.get('/api/designs')).body;
  const versions = await Promise.all(
    designs.designs.map(async (d: { id: string }) => [(await owner.get(`/api/designs/${d.id}`)).body, (await owner.get(`/api/designs/${d.id}/versions`)).body, (await owner.get(`/api/designs/${d.id}/burns`)).body]),
  );
  const photoBytes = (await owner.bytes(`/api/photos/${target.photoId}`)).bytes.length;
  const [row] = await server.database.db.select().from(users).where(eq(users.id, ownerId));
  const workshop = (await owner.get(`/api/workshops/${target.workshopId}`)).body;
  return { designs, versions, photoBytes, workshop, profiles: (await owner.get('/api/printer-profiles')).body, account: (await owner.get('/api/account')).body, row };
}

const keyOf = (route: RouteEntry) => `${route.method} ${route.path}`;
const isAdminRoute = (route: RouteEntry) => route.path.startsWith('/api/admin');
/** Admins manage every workshop by design (tests/api/workshops.test.ts); everyone else is tried on them. */
const isManagedByAdmins = (route: RouteEntry) => route.path.startsWith('/api/workshops/:id');
const fill = (path: string, resources: Resources, userId: string) =>
  path
    .replace(':burnId', resources.burnId)
    .replace(':photoId', resources.photoId)
    .replace(/^\/api\/designs\/:id/, `/api/designs/${resources.designId}`)
    .replace(/^\/api\/printer-profiles\/:id/, `/api/printer-profiles/${resources.profileId}`)
    .replace(/^\/api\/admin\/users\/:id/, `/api/admin/users/${userId}`)
    .replace(/^\/api\/workshops\/:id/, `/api/workshops/${resources.workshopId}`)
    .replace(':userId', resources.memberId)
    .replace(':number', '1');

describe('the route table', () => {
  it('is read from the app and every route in it is either public (with a reason) or in the matrix', () => {
    const routes = routeTable(server.app);
    expect(routes.length).toBeGreaterThan(25);
    for (const route of routes.filter((r) => r.path.includes(':') && !publicRoutes[keyOf(r)])) {
      // Each parameter names one of the owner's resources, or the matrix cannot aim at it.
      expect(fill(route.path, target, ownerId), keyOf(route)).not.toContain(':');
    }
  });
});

describe("every route, for everyone but the owner, against the owner's resources", () => {
  it('is refused (or shows nothing of the owner\'s), never a 5xx, and leaves the owner\'s data unchanged', async ({ task }) => {
    const before = await ownerSnapshot();
    const secrets = [target.designId, target.profileId, target.shareToken, target.burnId, target.photoId, target.kitDesignId, target.workshopId, target.workshopCode, ownerEmail, "Tamsin's secret stove", "Tamsin's laser", "Tamsin's secret burn", "Tamsin's secret workshop"];
    const routes = routeTable(server.app).filter((route) => !route.path.startsWith('/api/auth/') && !publicRoutes[keyOf(route)]);
    let attempts = 0;
    for (const route of routes) {
      for (const [actor, http] of Object.entries(actors) as [Actor, HttpClient][]) {
        // Admin routes are meant for admins (their own tests: roles); everyone else is tried.
        if (actor === 'admin' && (isAdminRoute(route) || isManagedByAdmins(route))) continue;
        const response = await send(http, route, fill(route.path, target, ownerId));
        attempts++;
        const label = `${actor}: ${keyOf(route)} -> ${response.status} ${JSON.stringify(response.body ?? null).slice(0, 200)}`;
        expect(response.status, label).toBeLessThan(500);
        if (route.path.includes(':') || isAdminRoute(route) || actor === 'anonymous') expect([401, 403, 404], label).toContain(response.status);
        const text = JSON.stringify(response.body ?? '');
        for (const secret of secrets) expect(text.includes(secret), `${label} shows ${secret}`).toBe(false);
      }
    }
    expect(await ownerSnapshot()).toEqual(before);
    recordCount(task, 'routes x actors', `${routes.length} routes x 4 actors (admin not on admin or workshop routes): ${attempts} attempts`);
  });

  it("better-auth's admin endpoints refuse everyone but an admin, and change nothing", async ({ task }) => {
    const before = await ownerSnapshot();
    const endpoints = Object.values(server.auth.api as Record<string, { path?: string; options?: { method?: string | string[] } }>).filter((e) => e.path?.startsWith('/admin/'));
    expect(endpoints.length).toBeGreaterThan(10);
    const body = { userId: ownerId, sessionToken: 'owner-session', role: 'admin', newPassword: 'taken-over-123', banReason: 'x', email: 'new@workshop.example', password: 'taken-over-123', name: 'X', data: { name: 'X' }, permissions: { user: ['list'] } };
    let attempts = 0;
    for (const endpoint of endpoints) {
      const method = [endpoint.options?.method ?? 'POST'].flat()[0]!;
      for (const actor of ['second maker', 'instructor', 'anonymous'] as const) {
        const path = `/api/auth${endpoint.path}${method === 'GET' ? `?id=${ownerId}&userId=${ownerId}` : ''}`;
        const response = await actors[actor].request(method, path, method === 'GET' ? undefined : body);
        attempts++;
        const label = `${actor}: ${method} ${path} -> ${response.status} ${JSON.stringify(response.body ?? null).slice(0, 200)}`;
        expect(response.status, label).toBeLessThan(500);
        // has-permission answers whether the caller may; it grants nothing.
        if (endpoint.path === '/admin/has-permission') expect(response.status === 200 ? response.body.success : false, label).toBe(false);
        // Stopping an impersonation acts on the caller's own session only; one who is not impersonating gets 400.
        else if (endpoint.path === '/admin/stop-impersonating') expect([400, 401, 403], label).toContain(response.status);
        else expect([401, 403, 404], label).toContain(response.status);
      }
    }
    expect(await ownerSnapshot()).toEqual(before);
    recordCount(task, 'better-auth admin endpoints x actors', `${endpoints.length} endpoints x 3 actors: ${attempts} attempts`);
  });

  it('would let the owner make each of those requests (so it is authorization that refused them)', async () => {
    const routes = routeTable(server.app).filter((route) => route.path.includes(':') && !route.path.startsWith('/api/auth/') && !publicRoutes[keyOf(route)] && !isAdminRoute(route));
    for (const route of routes) {
      // Fresh resources each time: some of these requests delete what they aim at.
      // (A profile of its own only for the profile routes: an account holds a limited number.)
      const own = await createResources(owner, route.path.startsWith('/api/printer-profiles') ? undefined : target.profileId);
      const response = await send(owner, route, fill(route.path, own, ownerId));
      expect(response.status, `owner: ${keyOf(route)} -> ${response.status} ${JSON.stringify(response.body ?? null).slice(0, 200)}`).toBeLessThan(300);
    }
  });
});
