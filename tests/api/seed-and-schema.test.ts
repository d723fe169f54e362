import { getAuthTables } from 'better-auth/db';
import { getTableConfig } from 'drizzle-orm/pg-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { schema } from '../../server/db/schema.ts';
import { demoAccounts } from '../../server/seed/demo-accounts.ts';
import { seedDemo } from '../../server/seed/seed-demo.ts';
import { signedInClient } from '../helpers/factories.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({ seedDemo: true });
});
afterAll(() => server.close());

describe('demo seed', () => {
  it('creates the demo accounts, and the demo sign-ins work with their roles', async () => {
    expect(server.seeded.sort()).toEqual(demoAccounts.map((a) => a.email).sort());
    for (const account of demoAccounts) {
      const http = await signedInClient(server, account);
      expect((await http.get('/api/account')).body).toMatchObject({ email: account.email, role: account.role, emailVerified: true });
    }
  });

  it('fills the demo maker library from the example designs, the class stove with two versions, shared and printed', async () => {
    const maker = await signedInClient(server, demoAccounts.find((a) => a.withDemoLibrary)!);
    const { designs } = (await maker.get('/api/designs?sort=name')).body;
    // templates/*.json: the invented Alder Street examples, by their own names.
    // Sorted by name ignoring case.
    expect(designs.map((d: { name: string }) => d.name)).toEqual(['Alder Street metric tin stove', 'Alder Street No. 10 group cooker', 'Alder Street pint-can stove', 'Alder Street stove with seam keep-outs and concentrator']);
    const pint = designs.find((d: { name: string }) => d.name === 'Alder Street pint-can stove');
    expect(pint).toMatchObject({ currentVersion: 2, shared: true, tags: ['class kit', 'pint'] });
    expect(pint.lastPrintedAt).not.toBeNull();
    const { versions } = (await maker.get(`/api/designs/${pint.id}/versions`)).body;
    // Version 1 has 14 jets, version 2 the example's 16: the change line counts them.
    expect(versions).toHaveLength(2);
  });

  it("gives the demo instructor a workshop with the demo maker in it, printed and burned once", async () => {
    const instructor = await signedInClient(server, demoAccounts.find((a) => a.role === 'instructor')!);
    expect((await instructor.get('/api/designs')).body.designs.map((d: { name: string }) => d.name)).toEqual(['Alder Street evening build stove']);
    const [listed] = (await instructor.get('/api/workshops')).body.workshops;
    expect(listed).toMatchObject({ title: 'Thursday evening stove build', role: 'instructor', members: 1 });
    const workshop = (await instructor.get(`/api/workshops/${listed.id}`)).body;
    expect(workshop.roster.map((r: { status: string }) => r.status).sort()).toEqual(['burned', 'invited', 'invited']);
    const maker = await signedInClient(server, demoAccounts.find((a) => a.withDemoLibrary)!);
    expect((await maker.get(`/api/workshops/${listed.id}`)).body).toMatchObject({ role: 'member', roster: null });
  });

  it('logs the class stove\'s test burns on both versions, with drawn photos', async () => {
    const maker = await signedInClient(server, demoAccounts.find((a) => a.withDemoLibrary)!);
    const pint = (await maker.get('/api/designs?sort=name')).body.designs.find((d: { name: string }) => d.name === 'Alder Street pint-can stove');
    const { burns } = (await maker.get(`/api/designs/${pint.id}/burns`)).body;
    expect(burns.map((b: { version: number }) => b.version).sort()).toEqual([1, 1, 2, 2, 2]);
    const photos = burns.flatMap((b: { photos: { url: string; thumbnailUrl: string }[] }) => b.photos);
    expect(photos).toHaveLength(3);
    const picture = await maker.bytes(photos[0].url);
    expect(picture.status).toBe(200);
    // JPEG files start with the SOI marker FF D8 FF (ITU-T T.81, annex B).
    expect([...picture.bytes.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]);
  });

  it('is idempotent', async () => {
    // Nothing is written a second time, so nothing reaches the store.
    const untouchable = { kind: 'disk' as const, put: () => Promise.reject(new Error('written')), get: () => Promise.reject(new Error('read')), delete: () => Promise.reject(new Error('deleted')) };
    expect((await seedDemo(server.database.db, server.auth, untouchable)).created).toEqual([]);
  });
});

describe('database schema', () => {
  it('has every table and column better-auth (with the admin plugin) expects', () => {
    const expected = getAuthTables(server.auth.options);
    const tables = Object.values(schema).map((table) => getTableConfig(table));
    const snakeCase = (name: string) => name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
    // Its rate-limit counts too: better-auth keeps them in the database, shared by every server.
    expect(Object.keys(expected)).toContain('rateLimit');
    for (const model of Object.values(expected)) {
      const table = tables.find((t) => t.name === `${snakeCase(model.modelName)}s`);
      expect(table, model.modelName).toBeDefined();
      const columns = new Set(table!.columns.map((column) => column.name));
      for (const field of Object.keys(model.fields)) {
        expect(columns.has(snakeCase(field)), `${table!.name}.${snakeCase(field)}`).toBe(true);
      }
    }
  });
});
