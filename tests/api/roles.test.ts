import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createUser, signedInClient } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

let server: TestServer;
let admin: Awaited<ReturnType<typeof createUser>>;
let maker: Awaited<ReturnType<typeof createUser>>;
beforeAll(async () => {
  server = await startTestServer();
  admin = await createUser(server, { role: 'admin', name: 'Ada Admin' });
  maker = await createUser(server, { role: 'maker', name: 'Milo Maker' });
});
afterAll(() => server.close());

/** Every route that manages users: Canwright's own and better-auth's admin endpoints. */
const adminRoutes = (targetId: () => string): [string, string, () => unknown][] => [
  ['GET', '/api/admin/users', () => undefined],
  ['PATCH', `/api/admin/users/{id}`, () => ({ role: 'admin' })],
  ['PATCH', `/api/admin/users/{id}`, () => ({ disabled: true })],
  ['GET', '/api/auth/admin/list-users', () => undefined],
  ['POST', '/api/auth/admin/set-role', () => ({ userId: targetId(), role: 'admin' })],
  ['POST', '/api/auth/admin/ban-user', () => ({ userId: targetId() })],
  ['POST', '/api/auth/admin/create-user', () => ({ email: 'intruder@workshop.example', password: 'intruder-pass', name: 'X', role: 'admin' })],
  ['POST', '/api/auth/admin/remove-user', () => ({ userId: targetId() })],
  ['POST', '/api/auth/admin/impersonate-user', () => ({ userId: targetId() })],
];

describe('role checks on the server', () => {
  it.each(adminRoutes(() => admin.id))('a signed-out visitor gets 401 on %s %s', async (method, path, body) => {
    const response = await new HttpClient(server.url).request(method, path.replace('{id}', admin.id), body());
    expect(response.status).toBe(401);
  });

  it.each(adminRoutes(() => admin.id))('a maker gets 403 on %s %s', async (method, path, body) => {
    const http = await signedInClient(server, maker);
    const response = await http.request(method, path.replace('{id}', admin.id), body());
    expect(response.status).toBe(403);
  });

  it('an instructor gets 403 on the users list too', async () => {
    const instructor = await createUser(server, { role: 'instructor' });
    expect((await (await signedInClient(server, instructor)).get('/api/admin/users')).status).toBe(403);
  });

  it('nothing the maker tried changed anything', async () => {
    const http = await signedInClient(server, admin);
    const list = await http.get('/api/admin/users?search=workshop.example');
    const roles = Object.fromEntries(list.body.users.map((u: { email: string; role: string }) => [u.email, u.role]));
    expect(roles[admin.email]).toBe('admin');
    expect(roles[maker.email]).toBe('maker');
    expect(roles['intruder@workshop.example']).toBeUndefined();
  });
});

describe('what an admin can do', () => {
  it('lists and searches users', async () => {
    const http = await signedInClient(server, admin);
    const all = await http.get('/api/admin/users');
    expect(all.status).toBe(200);
    expect(all.body.total).toBeGreaterThanOrEqual(2);
    const found = await http.get(`/api/admin/users?search=${encodeURIComponent('Milo')}`);
    expect(found.body.users.map((u: { email: string }) => u.email)).toEqual([maker.email]);
    const literal = await http.get(`/api/admin/users?search=${encodeURIComponent('%')}`);
    expect(literal.body.total).toBe(0);
  });

  it('changes a role, which takes effect at once', async () => {
    const user = await createUser(server);
    const userHttp = await signedInClient(server, user);
    const http = await signedInClient(server, admin);
    const changed = await http.patch(`/api/admin/users/${user.id}`, { role: 'instructor' });
    expect(changed.status).toBe(200);
    expect(changed.body.role).toBe('instructor');
    expect((await userHttp.get('/api/account')).body.role).toBe('instructor');
  });

  it('disables a user, which ends their sessions and stops sign-in; enabling restores it', async () => {
    const user = await createUser(server);
    const userHttp = await signedInClient(server, user);
    const http = await signedInClient(server, admin);

    const disabled = await http.patch(`/api/admin/users/${user.id}`, { disabled: true });
    expect(disabled.status).toBe(200);
    expect(disabled.body.disabled).toBe(true);
    expect((await userHttp.get('/api/account')).status).toBe(401);
    const refused = await new HttpClient(server.url).post('/api/auth/sign-in/email', { email: user.email, password: user.password });
    expect(refused.status).toBe(403);

    const enabled = await http.patch(`/api/admin/users/${user.id}`, { disabled: false });
    expect(enabled.body.disabled).toBe(false);
    expect((await signedInClient(server, user).then((c) => c.get('/api/account'))).status).toBe(200);
  });

  it('cannot demote or disable themselves', async () => {
    const http = await signedInClient(server, admin);
    expect((await http.patch(`/api/admin/users/${admin.id}`, { role: 'maker' })).status).toBe(409);
    expect((await http.patch(`/api/admin/users/${admin.id}`, { disabled: true })).status).toBe(409);
  });

  it('gets 400 with field paths for a bad change and 404 for an unknown user', async () => {
    const http = await signedInClient(server, admin);
    const bad = await http.patch(`/api/admin/users/${maker.id}`, { role: 'overlord' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fields.map((f: { path: string }) => f.path)).toContain('role');
    expect((await http.patch(`/api/admin/users/${maker.id}`, {})).status).toBe(400);
    expect((await http.patch('/api/admin/users/no-such-user', { role: 'maker' })).status).toBe(404);
    expect((await http.get('/api/admin/users?limit=5000')).status).toBe(400);
  });
});
