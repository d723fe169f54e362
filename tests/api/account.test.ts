import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createUser, signedInClient } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

describe('/api/account', () => {
  it('is 401 for a signed-out visitor', async () => {
    const http = new HttpClient(server.url);
    expect((await http.get('/api/account')).status).toBe(401);
    expect((await http.patch('/api/account/preferences', { units: 'mm' })).status).toBe(401);
  });

  it('keeps the units preference', async () => {
    const user = await createUser(server);
    const http = await signedInClient(server, user);
    expect((await http.get('/api/account')).body.units).toBe('in');

    const changed = await http.patch('/api/account/preferences', { units: 'mm' });
    expect(changed.status).toBe(200);
    expect(changed.body.units).toBe('mm');
    expect((await http.get('/api/account')).body.units).toBe('mm');
  });

  it('keeps the burn log units, which follow the length units until chosen', async () => {
    const user = await createUser(server);
    const http = await signedInClient(server, user);
    expect((await http.get('/api/account')).body).toMatchObject({ massUnit: 'oz', temperatureUnit: 'F', volumeUnit: 'qt' });
    await http.patch('/api/account/preferences', { units: 'mm' });
    expect((await http.get('/api/account')).body).toMatchObject({ massUnit: 'g', temperatureUnit: 'C', volumeUnit: 'L' });

    const chosen = await http.patch('/api/account/preferences', { massUnit: 'oz', volumeUnit: 'L' });
    expect(chosen.status).toBe(200);
    expect(chosen.body).toMatchObject({ units: 'mm', massUnit: 'oz', temperatureUnit: 'C', volumeUnit: 'L' });
    await http.patch('/api/account/preferences', { units: 'in' });
    expect((await http.get('/api/account')).body).toMatchObject({ massUnit: 'oz', temperatureUnit: 'F', volumeUnit: 'L' });

    const bad = await http.patch('/api/account/preferences', { temperatureUnit: 'K' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).not.toMatch(/invalid_enum|Invalid option/);
  });

  it('keeps the default paper and the maker\'s own drill set', async () => {
    const user = await createUser(server);
    const http = await signedInClient(server, user);
    expect((await http.get('/api/account')).body).toMatchObject({ defaultPaper: 'letter', drillSetIds: [] });
    const changed = await http.patch('/api/account/preferences', { defaultPaper: 'a4', drillSetIds: ['frac:3/16', 'frac:1/4', 'frac:1/4'] });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ defaultPaper: 'a4', drillSetIds: ['frac:3/16', 'frac:1/4'], units: 'in' });
    const unknown = await http.patch('/api/account/preferences', { drillSetIds: ['frac:1/3'] });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.details.fields[0].path).toBe('drillSetIds');
    expect((await http.patch('/api/account/preferences', {})).status).toBe(400);
  });

  it('answers 400 with the field path for a bad preference', async () => {
    const user = await createUser(server);
    const http = await signedInClient(server, user);
    const response = await http.patch('/api/account/preferences', { units: 'cubits' });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('INVALID_INPUT');
    expect(response.body.error.details.fields[0].path).toBe('units');

    const extra = await http.patch('/api/account/preferences', { units: 'mm', role: 'admin' });
    expect(extra.status).toBe(400);
    expect((await http.get('/api/account')).body.role).toBe('maker');
  });

  it('changes the password with the current one and signs other devices out', async () => {
    const user = await createUser(server);
    const phone = await signedInClient(server, user);
    const laptop = await signedInClient(server, user);
    const refused = await laptop.post('/api/auth/change-password', { currentPassword: 'wrong-password', newPassword: 'brand-new-pass' });
    expect(refused.status).toBe(400);

    const changed = await laptop.post('/api/auth/change-password', { currentPassword: user.password, newPassword: 'brand-new-pass', revokeOtherSessions: true });
    expect(changed.status).toBe(200);
    expect((await laptop.get('/api/account')).status).toBe(200);
    expect((await phone.get('/api/account')).status).toBe(401);
  });
});
