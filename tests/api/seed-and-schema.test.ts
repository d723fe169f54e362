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
    const instructor = await signedInClient(server, demoAccounts.find((a) => a.role === 'instructor')!);
    expect((await instructor.get('/api/designs')).body.designs).toEqual([]);
  });

  it('is idempotent', async () => {
    expect((await seedDemo(server.database.db, server.auth)).created).toEqual([]);
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
