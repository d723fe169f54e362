import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { createUser, signedInClient } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

const base = '/api/designs';
type Document = typeof pintCanStove;

/** A fresh copy of templates/pint-can-stove.json to change freely. */
const pintDocument = (): Document => structuredClone(pintCanStove);

/** The pint-can stove with `count` jets instead of 16. */
function withJets(count: number): Document {
  const document = pintDocument();
  document.parts[0]!.sideRows[0]!.count = count;
  return document;
}

async function makerClient(): Promise<HttpClient> {
  return signedInClient(server, await createUser(server));
}

async function createDesign(http: HttpClient, body: Record<string, unknown> = {}): Promise<any> {
  const response = await http.post(base, { document: pintDocument(), ...body });
  expect(response.status).toBe(201);
  return response.body;
}

async function listNames(http: HttpClient, query = ''): Promise<string[]> {
  const response = await http.get(`${base}${query}`);
  expect(response.status).toBe(200);
  return response.body.designs.map((d: { name: string }) => d.name);
}

describe('/api/designs', () => {
  it('is 401 for a signed-out visitor on every route', async () => {
    const http = new HttpClient(server.url);
    const routes: [string, string][] = [
      ['GET', base],
      ['POST', base],
      ['GET', `${base}/some-id`],
      ['PATCH', `${base}/some-id`],
      ['DELETE', `${base}/some-id`],
      ['POST', `${base}/some-id/duplicate`],
      ['POST', `${base}/some-id/printed`],
      ['POST', `${base}/some-id/share`],
      ['DELETE', `${base}/some-id/share`],
      ['GET', `${base}/some-id/versions`],
      ['POST', `${base}/some-id/versions`],
      ['GET', `${base}/some-id/versions/1`],
      ['POST', `${base}/some-id/versions/1/restore`],
    ];
    for (const [method, path] of routes) {
      const body = method === 'POST' || method === 'PATCH' ? { document: pintDocument(), name: 'x' } : undefined;
      expect((await http.request(method, path, body)).status, `${method} ${path}`).toBe(401);
    }
  });

  it('creates a design as version 1 and lists and reads it', async () => {
    const http = await makerClient();
    expect(await listNames(http)).toEqual([]);

    const created = await createDesign(http, { tags: [' Pint ', 'build night', 'pint'] });
    expect(created).toMatchObject({
      name: 'Alder Street pint-can stove', // the document's own name when none is given
      tags: ['pint', 'build night'],
      currentVersion: 1,
      shared: false,
      lastPrintedAt: null,
      // Template notes: 16 jets + 45 primary; worked arithmetic: 15 intake positions less the skipped one = 14; 16 + 45 + 14 = 75.
      holeCount: 75,
      parts: 2,
    });
    expect(created.shareUrlPath).toBeUndefined();
    // The stored document is the validated one: defaults such as paperThicknessMm are filled in.
    expect(created.document).toMatchObject({ name: pintCanStove.name, paperThicknessMm: 0.1, parts: [{ id: 'chamber' }, { id: 'shell' }] });

    const list = await http.get(base);
    const { document: _document, ...listItem } = created;
    expect(list.body.designs).toEqual([listItem]);
    expect((await http.get(`${base}/${created.id}`)).body).toEqual(created);

    const named = await createDesign(http, { name: '  Thursday stove  ' });
    expect(named.name).toBe('Thursday stove');
  });

  it('renames and retags, refuses an empty or smuggled change', async () => {
    const http = await makerClient();
    const { id } = await createDesign(http);
    const renamed = await http.patch(`${base}/${id}`, { name: 'Pint stove, mark II' });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({ name: 'Pint stove, mark II', tags: [], currentVersion: 1 });
    const retagged = await http.patch(`${base}/${id}`, { tags: ['Hobo', 'pint'] });
    expect(retagged.body).toMatchObject({ name: 'Pint stove, mark II', tags: ['hobo', 'pint'] });

    expect((await http.patch(`${base}/${id}`, {})).status).toBe(400);
    const smuggled = await http.patch(`${base}/${id}`, { name: 'Mine now', ownerId: 'someone-else' });
    expect(smuggled.status).toBe(400);
    expect((await http.patch(`${base}/${id}`, { name: '   ' })).body.error.details.fields[0].path).toBe('name');
  });

  it('searches names and tags in any case, filters by tag and sorts three ways', async () => {
    const http = await makerClient();
    const pint = await createDesign(http, { name: 'Pint stove', tags: ['pint'] });
    const hobo = await createDesign(http, { name: 'no. 10 hobo', tags: ['big', 'hobo'] });
    const ring = await createDesign(http, { name: 'Tuna ring', tags: ['concentrator', 'Pint'] });

    expect(await listNames(http, '?q=PINT')).toEqual(['Tuna ring', 'Pint stove']);
    expect(await listNames(http, '?q=hob')).toEqual(['no. 10 hobo']);
    expect(await listNames(http, '?q=centr')).toEqual(['Tuna ring']);
    // LIKE wildcards in the search text match only themselves.
    expect(await listNames(http, '?q=%25')).toEqual([]);
    expect(await listNames(http, '?tag=pint')).toEqual(['Tuna ring', 'Pint stove']);
    expect(await listNames(http, '?tag=pin')).toEqual([]);
    expect(await listNames(http, '?q=tuna&tag=pint')).toEqual(['Tuna ring']);

    // Newest change first; renaming the oldest brings it to the top.
    expect(await listNames(http)).toEqual(['Tuna ring', 'no. 10 hobo', 'Pint stove']);
    await http.patch(`${base}/${pint.id}`, { name: 'Pint stove' });
    expect(await listNames(http, '?sort=updated')).toEqual(['Pint stove', 'Tuna ring', 'no. 10 hobo']);
    // By name, ignoring case.
    expect(await listNames(http, '?sort=name')).toEqual(['no. 10 hobo', 'Pint stove', 'Tuna ring']);

    // Last printed first; never printed last.
    expect((await http.post(`${base}/${hobo.id}/printed`)).status).toBe(200);
    const printed = await http.post(`${base}/${ring.id}/printed`);
    expect(Number.isNaN(Date.parse(printed.body.lastPrintedAt))).toBe(false);
    expect(await listNames(http, '?sort=lastPrinted')).toEqual(['Tuna ring', 'no. 10 hobo', 'Pint stove']);
    expect((await http.get(`${base}?sort=oldest`)).status).toBe(400);
  });

  it('saves version 2, lists versions newest first with what changed, and restores version 1 as version 3', async () => {
    const http = await makerClient();
    const { id } = await createDesign(http);

    const saved = await http.post(`${base}/${id}/versions`, { document: withJets(20), note: 'More jets' });
    expect(saved.status).toBe(201);
    // Worked arithmetic: 75 holes with 4 more jets = 79.
    expect(saved.body).toMatchObject({ currentVersion: 2, holeCount: 79 });
    expect(saved.body.document.parts[0].sideRows[0].count).toBe(20);

    const versions = (await http.get(`${base}/${id}/versions`)).body.versions;
    expect(versions.map((v: any) => [v.number, v.note])).toEqual([
      [2, 'More jets'],
      [1, null],
    ]);
    // Worked arithmetic: 45 x (1/4)^2 / (16 x (3/16)^2) = 5.0 and / (20 x (3/16)^2) = 4.0.
    expect(versions[0].changes).toEqual(['jets: 16 -> 20 holes of 3/16 in', 'primary ratio 5.0 : 1 -> 4.0 : 1']);
    expect(versions[1].changes).toEqual([]);
    expect(versions[0].summary.bySize).toContainEqual({ group: 'secondary', drillLabel: '3/16 in', count: 20 });
    expect(Number.isNaN(Date.parse(versions[0].createdAt))).toBe(false);

    const restored = await http.post(`${base}/${id}/versions/1/restore`);
    expect(restored.status).toBe(201);
    expect(restored.body).toMatchObject({ currentVersion: 3, holeCount: 75 });
    const first = (await http.get(`${base}/${id}/versions/1`)).body;
    expect(restored.body.document).toEqual(first.document);
    expect((await http.get(`${base}/${id}`)).body.document).toEqual(first.document);

    const after = (await http.get(`${base}/${id}/versions`)).body.versions;
    expect(after.map((v: any) => [v.number, v.note])).toEqual([
      [3, 'Restored version 1'],
      [2, 'More jets'],
      [1, null],
    ]);
    expect(after[0].changes).toEqual(['jets: 20 -> 16 holes of 3/16 in', 'primary ratio 4.0 : 1 -> 5.0 : 1']);

    expect((await http.post(`${base}/${id}/versions/9/restore`)).status).toBe(404);
    expect((await http.get(`${base}/${id}/versions/9`)).status).toBe(404);
    expect((await http.get(`${base}/${id}/versions/two`)).status).toBe(400);
  });

  it('duplicates the current version as version 1 of a new design', async () => {
    const http = await makerClient();
    const source = await createDesign(http, { name: 'Pint stove', tags: ['pint'] });
    await http.post(`${base}/${source.id}/versions`, { document: withJets(20) });
    await http.post(`${base}/${source.id}/share`);

    const copy = await http.post(`${base}/${source.id}/duplicate`);
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: 'Pint stove (copy)', tags: ['pint'], currentVersion: 1, shared: false, holeCount: 79 });
    expect(copy.body.id).not.toBe(source.id);
    expect(copy.body.document).toEqual((await http.get(`${base}/${source.id}`)).body.document);
    const versions = (await http.get(`${base}/${copy.body.id}/versions`)).body.versions;
    expect(versions.map((v: any) => [v.number, v.note])).toEqual([[1, 'Copied from "Pint stove", version 2']]);
    expect(await listNames(http, '?sort=name')).toEqual(['Pint stove', 'Pint stove (copy)']);
  });

  it('deletes a design with its versions', async () => {
    const http = await makerClient();
    const kept = await createDesign(http, { name: 'Kept' });
    const { id } = await createDesign(http, { name: 'Gone' });
    expect((await http.request('DELETE', `${base}/${id}`)).status).toBe(204);
    expect((await http.get(`${base}/${id}`)).status).toBe(404);
    expect((await http.get(`${base}/${id}/versions`)).status).toBe(404);
    expect((await http.request('DELETE', `${base}/${id}`)).status).toBe(404);
    expect(await listNames(http)).toEqual([kept.name]);
  });
});
