import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createUser, signedInClient } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

const base = '/api/printer-profiles';
// On-paper lengths of the calibration rulers: 150 mm across, 200 mm down (shared/print/draw-calibration.ts).
const trueSize = { measuredXMm: 150, measuredYMm: 200 };

async function makerClient(): Promise<HttpClient> {
  return signedInClient(server, await createUser(server));
}

async function listProfiles(http: HttpClient) {
  const response = await http.get(base);
  expect(response.status).toBe(200);
  return response.body.profiles as { id: string; name: string; isDefault: boolean }[];
}

async function createProfile(http: HttpClient, name: string, sizes = trueSize): Promise<string> {
  const response = await http.post(base, { name, ...sizes });
  expect(response.status).toBe(201);
  return response.body.id as string;
}

describe('/api/printer-profiles', () => {
  it('is 401 for a signed-out visitor on every route', async () => {
    const http = new HttpClient(server.url);
    expect((await http.get(base)).status).toBe(401);
    expect((await http.post(base, { name: 'Laser', ...trueSize })).status).toBe(401);
    expect((await http.patch(`${base}/some-id`, { name: 'Laser' })).status).toBe(401);
    expect((await http.post(`${base}/some-id/default`)).status).toBe(401);
    expect((await http.request('DELETE', `${base}/some-id`)).status).toBe(401);
  });

  it('creates a profile that is the default, with its scale and error', async () => {
    const http = await makerClient();
    expect(await listProfiles(http)).toEqual([]);

    const created = await http.post(base, { name: 'Office laser', measuredXMm: 152.25, measuredYMm: 197 });
    expect(created.status).toBe(201);
    const [only, ...rest] = await listProfiles(http);
    expect(rest).toEqual([]);
    expect(only).toEqual(created.body);
    expect(only).toMatchObject({ name: 'Office laser', measuredXMm: 152.25, measuredYMm: 197, isDefault: true });
    // Worked arithmetic: 152.25 / 150 = 1.015, so the printer prints 1.5 % long across.
    expect(created.body.scaleX).toBeCloseTo(1.015, 12);
    expect(created.body.errorXPercent).toBe(1.5);
    // Worked arithmetic: 197 / 200 = 0.985, so it prints 1.5 % short down the page.
    expect(created.body.scaleY).toBeCloseTo(0.985, 12);
    expect(created.body.errorYPercent).toBe(-1.5);
    expect(Number.isNaN(Date.parse(created.body.createdAt))).toBe(false);
  });

  it('adds a second profile that is not the default, and switching the default moves it', async () => {
    const http = await makerClient();
    const first = await createProfile(http, 'Laser');
    const second = await createProfile(http, 'Inkjet');
    expect((await listProfiles(http)).map((p) => [p.id, p.isDefault])).toEqual([
      [first, true],
      [second, false],
    ]);

    const switched = await http.post(`${base}/${second}/default`);
    expect(switched.status).toBe(200);
    expect(switched.body).toMatchObject({ id: second, isDefault: true });
    // Default first, then newest; exactly one default.
    expect((await listProfiles(http)).map((p) => [p.id, p.isDefault])).toEqual([
      [second, true],
      [first, false],
    ]);
  });

  it('updates the name and the measurements', async () => {
    const http = await makerClient();
    const id = await createProfile(http, 'Laser');
    const renamed = await http.patch(`${base}/${id}`, { name: '  Workshop laser  ' });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({ name: 'Workshop laser', measuredXMm: 150, isDefault: true });

    const remeasured = await http.patch(`${base}/${id}`, { measuredXMm: 148.5 });
    // Worked arithmetic: 148.5 / 150 = 0.99, 1 % short.
    expect(remeasured.body.scaleX).toBeCloseTo(0.99, 12);
    expect(remeasured.body.errorXPercent).toBe(-1);
    expect(remeasured.body.name).toBe('Workshop laser');
  });

  it('answers 400 with field paths for a bad measurement, a missing name or an empty change', async () => {
    const http = await makerClient();
    // Worked arithmetic: the limit is ±10 % of the ruler, 150 x 1.1 = 165 mm and 200 x 0.9 = 180 mm.
    const tooLong = await http.post(base, { name: 'Laser', measuredXMm: 165.5, measuredYMm: 200 });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.code).toBe('INVALID_INPUT');
    expect(tooLong.body.error.details.fields.map((f: { path: string }) => f.path)).toEqual(['measuredXMm']);

    const tooShort = await http.post(base, { name: 'Laser', measuredXMm: 150, measuredYMm: 179 });
    expect(tooShort.body.error.details.fields.map((f: { path: string }) => f.path)).toEqual(['measuredYMm']);

    const nameless = await http.post(base, trueSize);
    expect(nameless.status).toBe(400);
    expect(nameless.body.error.details.fields.map((f: { path: string }) => f.path)).toEqual(['name']);

    const smuggled = await http.post(base, { name: 'Laser', ...trueSize, userId: 'someone-else' });
    expect(smuggled.status).toBe(400);
    expect(await listProfiles(http)).toEqual([]);

    const id = await createProfile(http, 'Laser');
    const badChange = await http.patch(`${base}/${id}`, { measuredYMm: 230 });
    expect(badChange.status).toBe(400);
    expect(badChange.body.error.details.fields[0].path).toBe('measuredYMm');
    expect((await http.patch(`${base}/${id}`, {})).status).toBe(400);
  });

  it("answers 404 to another maker for the first maker's profile and changes nothing", async () => {
    const owner = await makerClient();
    const id = await createProfile(owner, 'Laser');
    const other = await makerClient();
    await createProfile(other, 'Their own');

    const patched = await other.patch(`${base}/${id}`, { name: 'Stolen' });
    expect(patched.status).toBe(404);
    expect(patched.body.error.code).toBe('NOT_FOUND');
    expect((await other.post(`${base}/${id}/default`)).status).toBe(404);
    expect((await other.request('DELETE', `${base}/${id}`)).status).toBe(404);
    expect((await listProfiles(other)).map((p) => p.name)).toEqual(['Their own']);

    // The owner's profile is untouched, and the other maker still has their own default.
    expect(await listProfiles(owner)).toMatchObject([{ id, name: 'Laser', isDefault: true }]);
    expect(await listProfiles(other)).toMatchObject([{ name: 'Their own', isDefault: true }]);
  });

  it('promotes the newest remaining profile when the default is deleted', async () => {
    const http = await makerClient();
    const first = await createProfile(http, 'First');
    const second = await createProfile(http, 'Second');
    const third = await createProfile(http, 'Third');

    const deleted = await http.request('DELETE', `${base}/${first}`);
    expect(deleted.status).toBe(204);
    expect((await listProfiles(http)).map((p) => [p.id, p.isDefault])).toEqual([
      [third, true],
      [second, false],
    ]);

    // Deleting a profile that is not the default leaves the default alone.
    expect((await http.request('DELETE', `${base}/${second}`)).status).toBe(204);
    expect((await listProfiles(http)).map((p) => [p.id, p.isDefault])).toEqual([[third, true]]);
    expect((await http.request('DELETE', `${base}/${second}`)).status).toBe(404);
  });

  it('refuses the 21st profile with 409', async () => {
    const http = await makerClient();
    // The cap is the brief's rule: 20 profiles per maker.
    const ids: string[] = [];
    for (let n = 1; n <= 20; n++) ids.push(await createProfile(http, `Printer ${n}`));
    const refused = await http.post(base, { name: 'Printer 21', ...trueSize });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('PRINTER_PROFILE_LIMIT');
    expect(refused.body.error.message).toMatch(/20 printer profiles/);
    expect(await listProfiles(http)).toHaveLength(20);

    // Room again after a delete.
    expect((await http.request('DELETE', `${base}/${ids[5]}`)).status).toBe(204);
    expect((await http.post(base, { name: 'Printer 21', ...trueSize })).status).toBe(201);
  });
});
