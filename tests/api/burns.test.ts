import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { createUser, signedInClient } from '../helpers/factories.ts';
import type { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/** The burn log's entries: pinned to the version they tested, checked at the boundary, the owner's only. */
let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

async function makerWithDesign(): Promise<{ http: HttpClient; designId: string }> {
  const http = await signedInClient(server, await createUser(server));
  const created = await http.post('/api/designs', { document: structuredClone(pintCanStove) });
  expect(created.status).toBe(201);
  return { http, designId: created.body.id };
}

describe('a burn entry', () => {
  it('needs only a date, pins the latest saved version, and keeps that version when the design changes', async () => {
    const { http, designId } = await makerWithDesign();
    const logged = await http.post(`/api/designs/${designId}/burns`, { date: '2026-11-30T10:00:00Z' });
    expect(logged.status).toBe(201);
    expect(logged.body).toMatchObject({ id: expect.any(String), designId, version: 1, date: '2026-11-30T10:00:00.000Z', fuelMassG: null, photos: [] });

    const changed = await http.post(`/api/designs/${designId}/versions`, { document: { ...structuredClone(pintCanStove), name: 'Pint stove, more jets' } });
    expect(changed.status).toBe(201);
    expect((await http.get(`/api/burns/${logged.body.id}`)).body.version).toBe(1);
    const onTwo = await http.post(`/api/designs/${designId}/burns`, { date: '2026-12-01T09:30:00+01:00' });
    expect(onTwo.body.version).toBe(2);
    const pinned = await http.post(`/api/designs/${designId}/burns`, { date: '2026-12-02T09:30:00Z', version: 1 });
    expect(pinned.body.version).toBe(1);
    expect((await http.post(`/api/designs/${designId}/burns`, { date: '2026-12-02T09:30:00Z', version: 9 })).body.error.message).toBe('This design has no version 9.');

    const list = await http.get(`/api/designs/${designId}/burns`);
    expect(list.body.burns.map((b: { version: number }) => b.version)).toEqual([1, 2, 1]);
  });

  it('stores every measure in SI as given, changes and clears fields, and is deleted', async () => {
    const { http, designId } = await makerWithDesign();
    const full = {
      date: '2026-11-28T16:45:00Z',
      fuelKind: 'pine pellets',
      fuelMassG: 120,
      starter: 'cotton ball with wax',
      ambientC: 6.5,
      wind: 'light',
      windscreen: true,
      windFacing: 'intake row away from the wind',
      timeToLightS: 25,
      timeToJetsS: 140,
      timeToBoilS: 480,
      boilWaterL: 0.5,
      boilStartC: 9,
      burnTimeS: 1320,
      charG: 18,
      smoke: 'some',
      flameRing: 4,
      notes: 'Jets lit all round after the first minute.',
    };
    const logged = await http.post(`/api/designs/${designId}/burns`, full);
    expect(logged.status).toBe(201);
    const { date, ...measures } = full;
    expect(logged.body).toMatchObject({ ...measures, date: '2026-11-28T16:45:00.000Z' });

    const changed = await http.patch(`/api/burns/${logged.body.id}`, { smoke: 'none', notes: null, charG: 15.5 });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ smoke: 'none', notes: null, charG: 15.5, fuelMassG: 120, date: `${date.slice(0, 19)}.000Z` });

    expect((await http.request('DELETE', `/api/burns/${logged.body.id}`)).status).toBe(204);
    expect((await http.get(`/api/burns/${logged.body.id}`)).status).toBe(404);
  });

  it('refuses bad values with 400 naming each field, and writes nothing', async () => {
    const { http, designId } = await makerWithDesign();
    const refused = await http.post(`/api/designs/${designId}/burns`, { date: 'yesterday', flameRing: 6, wind: 'gale', fuelMassG: -3, colour: 'blue' });
    expect(refused.status).toBe(400);
    const paths = refused.body.error.details.fields.map((f: { path: string }) => f.path).sort();
    expect(paths).toEqual(['(body)', 'date', 'flameRing', 'fuelMassG', 'wind']);
    expect(refused.body.error.details.fields.find((f: { path: string }) => f.path === 'date').message).toBe('must be a date and time, e.g. 2026-11-30T10:00:00Z');
    expect((await http.post(`/api/designs/${designId}/burns`, {})).status).toBe(400);
    expect((await http.get(`/api/designs/${designId}/burns`)).body.burns).toEqual([]);
    const logged = await http.post(`/api/designs/${designId}/burns`, { date: '2026-11-30T10:00:00Z' });
    expect((await http.patch(`/api/burns/${logged.body.id}`, {})).status).toBe(400);
  });

  it("is another maker's 404 on every route, and theirs stays as it was", async () => {
    const { http: owner, designId } = await makerWithDesign();
    const logged = await owner.post(`/api/designs/${designId}/burns`, { date: '2026-11-30T10:00:00Z', notes: 'mine' });
    const other = await signedInClient(server, await createUser(server));
    for (const [method, path, body] of [
      ['GET', `/api/designs/${designId}/burns`],
      ['POST', `/api/designs/${designId}/burns`, { date: '2026-11-30T10:00:00Z' }],
      ['GET', `/api/burns/${logged.body.id}`],
      ['PATCH', `/api/burns/${logged.body.id}`, { notes: 'theirs' }],
      ['DELETE', `/api/burns/${logged.body.id}`],
    ] as const) {
      expect((await other.request(method, path, body)).status, `${method} ${path}`).toBe(404);
    }
    expect((await owner.get(`/api/burns/${logged.body.id}`)).body.notes).toBe('mine');
  });

  it('goes with its design when the design is deleted', async () => {
    const { http, designId } = await makerWithDesign();
    const logged = await http.post(`/api/designs/${designId}/burns`, { date: '2026-11-30T10:00:00Z' });
    expect((await http.request('DELETE', `/api/designs/${designId}`)).status).toBe(204);
    expect((await http.get(`/api/burns/${logged.body.id}`)).status).toBe(404);
  });
});
