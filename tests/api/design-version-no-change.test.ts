import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { createUser, signedInClient } from '../helpers/factories.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

describe('saving a version that changes nothing', () => {
  it('is refused with 409 NO_CHANGE in words, and makes no version', async () => {
    const http = await signedInClient(server, await createUser(server));
    const created = await http.post('/api/designs', { document: pintCanStove });
    expect(created.status).toBe(201);
    const id = created.body.id as string;

    // The same document with its keys in another order is still the same design.
    const reordered = Object.fromEntries(Object.entries(structuredClone(pintCanStove)).reverse());
    const same = await http.post(`/api/designs/${id}/versions`, { document: reordered, note: 'nothing really' });
    expect(same.status).toBe(409);
    expect(same.body.error.code).toBe('NO_CHANGE');
    expect(same.body.error.message).toBe('Nothing has changed since version 1, so no new version was made.');
    expect((await http.get(`/api/designs/${id}/versions`)).body.versions).toHaveLength(1);

    const changed = structuredClone(pintCanStove);
    changed.parts[0]!.sideRows[0]!.count = 17;
    expect((await http.post(`/api/designs/${id}/versions`, { document: changed })).status).toBe(201);
  });
});
