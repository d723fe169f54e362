import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDesignRepository } from '../../server/library/design-repository.ts';
import { designSchema } from '../../shared/design/design-schema.ts';
import { summarizeDesign } from '../../shared/library/summarize-design.ts';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { createUser, signedInClient } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/** Who may see a design: the owner, anyone with a live share link, nobody else. And what is refused. */

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

const base = '/api/designs';
const pintDocument = (): typeof pintCanStove => structuredClone(pintCanStove);

async function signUp() {
  const user = await createUser(server);
  return { user, http: await signedInClient(server, user) };
}

async function createDesign(http: HttpClient): Promise<{ id: string; [key: string]: unknown }> {
  const response = await http.post(base, { document: pintDocument(), tags: ['pint'] });
  expect(response.status).toBe(201);
  return response.body;
}

const fieldPaths = (body: any): string[] => body.error.details.fields.map((f: { path: string }) => f.path);

describe("another maker's design", () => {
  it('answers 404 on every route, changes nothing and never shows up in their list', async () => {
    const { http: owner } = await signUp();
    const design = await createDesign(owner);
    const { http: other } = await signUp();
    const id = design.id;

    const attempts: [string, string, unknown?][] = [
      ['GET', `${base}/${id}`],
      ['PATCH', `${base}/${id}`, { name: 'Stolen' }],
      ['DELETE', `${base}/${id}`],
      ['POST', `${base}/${id}/duplicate`, {}],
      ['POST', `${base}/${id}/printed`, {}],
      ['POST', `${base}/${id}/share`, {}],
      ['DELETE', `${base}/${id}/share`],
      ['GET', `${base}/${id}/versions`],
      ['POST', `${base}/${id}/versions`, { document: pintDocument() }],
      ['GET', `${base}/${id}/versions/1`],
      ['POST', `${base}/${id}/versions/1/restore`, {}],
    ];
    for (const [method, path, body] of attempts) {
      const response = await other.request(method, path, body);
      expect(response.status, `${method} ${path}`).toBe(404);
      expect(response.body.error.code).toBe('NOT_FOUND');
    }
    expect((await other.get(base)).body.designs).toEqual([]);
    expect((await other.get(`${base}?q=pint`)).body.designs).toEqual([]);

    // The owner's design is as it was: same name, one version, not shared, never printed.
    expect((await owner.get(`${base}/${id}`)).body).toEqual(design);
    expect((await owner.get(`${base}/${id}/versions`)).body.versions).toHaveLength(1);
  });
});

describe('share links', () => {
  it('serve the design without a session and without the owner, until sharing is turned off', async () => {
    const { user, http } = await signUp();
    const { id } = await createDesign(http);

    const shared = await http.post(`${base}/${id}/share`);
    expect(shared.status).toBe(200);
    expect(shared.body.shared).toBe(true);
    // 32 random bytes in base64url are 43 characters (RFC 4648 §5: 4 characters per 3 bytes, no padding).
    expect(shared.body.shareUrlPath).toMatch(/^\/shared\/[A-Za-z0-9_-]{43}$/);
    const token = shared.body.shareUrlPath.split('/').pop() as string;
    // Turning sharing on again keeps the link already sent.
    expect((await http.post(`${base}/${id}/share`)).body.shareUrlPath).toBe(shared.body.shareUrlPath);
    expect((await http.get(base)).body.designs[0].shared).toBe(true);

    const visitor = new HttpClient(server.url);
    const seen = await visitor.get(`/api/shared/${token}`);
    expect(seen.status).toBe(200);
    expect(Object.keys(seen.body).sort()).toEqual(['document', 'name', 'updatedAt', 'version']);
    expect(seen.body).toMatchObject({ name: pintCanStove.name, version: 1, document: { name: pintCanStove.name } });
    expect(seen.headers.get('cache-control')).toBe('no-store');
    const text = JSON.stringify(seen.body);
    expect(text).not.toContain(user.email);
    expect(text).not.toContain(user.name);

    const off = await http.request('DELETE', `${base}/${id}/share`);
    expect(off.status).toBe(200);
    expect(off.body.shared).toBe(false);
    expect(off.body.shareUrlPath).toBeUndefined();
    expect((await visitor.get(`/api/shared/${token}`)).status).toBe(404);

    // Sharing again makes a new link; the old one stays dead.
    const again = await http.post(`${base}/${id}/share`);
    expect(again.body.shareUrlPath).not.toBe(shared.body.shareUrlPath);
    expect((await visitor.get(`/api/shared/${token}`)).status).toBe(404);
    expect((await visitor.get(`/api/shared/${again.body.shareUrlPath.split('/').pop()}`)).status).toBe(200);
  });

  it('answer 404 for unknown and malformed tokens', async () => {
    const visitor = new HttpClient(server.url);
    expect((await visitor.get(`/api/shared/${'A'.repeat(43)}`)).status).toBe(404);
    expect((await visitor.get('/api/shared/not-a-token')).status).toBe(404);
  });
});

describe('refused input', () => {
  it('answers 400 with document field paths for an invalid design', async () => {
    const { http } = await signUp();
    const bad = pintDocument() as any;
    // design-schema.ts: a side row needs at least 1 hole; drill ids must name a real drill.
    bad.parts[0].sideRows[0].count = 0;
    bad.parts[0].endPatterns[0].drillId = 'frac:1/0';
    const created = await http.post(base, { document: bad });
    expect(created.status).toBe(400);
    expect(created.body.error.code).toBe('INVALID_INPUT');
    expect(fieldPaths(created.body)).toEqual(['document.parts.0.sideRows.0.count']);

    const wrongDrill = pintDocument() as any;
    wrongDrill.parts[0].endPatterns[0].drillId = 'frac:1/0';
    expect(fieldPaths((await http.post(base, { document: wrongDrill })).body)).toEqual(['document.parts.0.endPatterns.0.drillId']);
    expect(fieldPaths((await http.post(base, { name: 'No document' })).body)).toEqual(['document']);

    const { id } = await createDesign(http);
    const version = await http.post(`${base}/${id}/versions`, { document: bad, note: 'broken' });
    expect(version.status).toBe(400);
    expect(fieldPaths(version.body)).toEqual(['document.parts.0.sideRows.0.count']);
    expect((await http.get(`${base}/${id}`)).body.currentVersion).toBe(1);
  });

  it('answers 413 for a body over 256 kB, and reads one under it', async () => {
    const { http } = await signUp();
    const { id } = await createDesign(http);
    // 256 kB is 262 144 bytes (the bytes package body-parser uses counts 1 kB as 1024 bytes).
    const huge = { ...pintDocument(), notes: 'x'.repeat(270_000) };
    const created = await http.post(base, { document: huge });
    expect(created.status).toBe(413);
    expect(created.body.error.code).toBe('TOO_LARGE');
    expect((await http.post(`${base}/${id}/versions`, { document: huge })).status).toBe(413);

    // Under the limit the body is read and validated: notes are capped at 4000 characters (design-schema.ts).
    const long = await http.post(base, { document: { ...pintDocument(), notes: 'x'.repeat(250_000) } });
    expect(long.status).toBe(400);
    expect(fieldPaths(long.body)).toEqual(['document.notes']);
  });
});

describe('caps', () => {
  it('refuses the 501st design and the 201st version with 409', async () => {
    const { user, http } = await signUp();
    const repository = createDesignRepository(server.database.db);
    const document = designSchema.parse(pintDocument());
    const content = { document, summary: summarizeDesign(document), note: null };
    // The caps are the brief's rule (500 designs, 200 versions). Most are written straight through
    // the repository: hundreds of HTTP saves would test the same path, only slower.
    await repository.inTransaction(async (queries) => {
      for (let n = 1; n <= 499; n++) await queries.insertDesign(user.id, { name: `Stove ${n}`, tags: [] }, content);
    });
    const last = await createDesign(http);
    const refused = await http.post(base, { document: pintDocument() });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('DESIGN_LIMIT');
    expect(refused.body.error.message).toMatch(/500 saved designs/);
    expect((await http.post(`${base}/${last.id}/duplicate`)).status).toBe(409);

    await repository.inTransaction(async (queries) => {
      for (let n = 2; n <= 200; n++) {
        const row = await queries.lockOwned(user.id, last.id);
        await queries.appendVersion(row!, content);
      }
    });
    const full = await http.post(`${base}/${last.id}/versions`, { document: pintDocument() });
    expect(full.status).toBe(409);
    expect(full.body.error.code).toBe('VERSION_LIMIT');
    expect((await http.post(`${base}/${last.id}/versions/1/restore`)).status).toBe(409);
    expect((await http.get(`${base}/${last.id}`)).body.currentVersion).toBe(200);

    // Room again after a delete.
    expect((await http.request('DELETE', `${base}/${last.id}`)).status).toBe(204);
    expect((await http.post(base, { document: pintDocument() })).status).toBe(201);
  });
});
