import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { DatabaseTarget } from '../../server/db/database.ts';

/**
 * The database a test file runs on: in-memory PGlite by default; with TEST_DB=postgres, a
 * fresh database created on the server at TEST_DATABASE_URL and dropped afterwards.
 */
export async function createTestDatabase(): Promise<{ target: DatabaseTarget; drop(): Promise<void> }> {
  if (process.env.TEST_DB !== 'postgres') return { target: { kind: 'memory' }, drop: async () => undefined };
  return createPostgresTestDatabase();
}

/** A fresh database on the PostgreSQL server at TEST_DATABASE_URL, whatever TEST_DB says. */
export async function createPostgresTestDatabase(): Promise<{ target: DatabaseTarget & { kind: 'postgres' }; drop(): Promise<void> }> {
  const adminUrl = process.env.TEST_DATABASE_URL;
  if (!adminUrl) throw new Error('TEST_DB=postgres needs TEST_DATABASE_URL');
  const name = `canwright_test_${randomBytes(6).toString('hex')}`;
  await withClient(adminUrl, (client) => client.query(`CREATE DATABASE ${name}`));
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    target: { kind: 'postgres' as const, url: url.toString() },
    drop: () => withClient(adminUrl, (client) => client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`)).then(() => undefined),
  };
}

async function withClient<T>(url: string, run: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await run(client);
  } finally {
    await client.end();
  }
}
