import { fileURLToPath } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { sql } from 'drizzle-orm';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { drizzle as drizzlePostgres } from 'drizzle-orm/node-postgres';
import { migrate as migratePostgres } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';
import { schema } from './schema.ts';

export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;

/** Where the data lives: an embedded PGlite folder, PGlite in memory (tests), or a PostgreSQL server. */
export type DatabaseTarget =
  | { kind: 'pglite'; dataDir: string }
  | { kind: 'memory' }
  | { kind: 'postgres'; url: string };

export interface Database {
  db: Db;
  kind: DatabaseTarget['kind'];
  /** Applies the committed drizzle/ migrations; safe to call on an up-to-date database. */
  migrate(): Promise<void>;
  /** Answers true when a trivial query round-trips. */
  ping(): Promise<boolean>;
  close(): Promise<void>;
}

const migrationsFolder = fileURLToPath(new URL('../../drizzle', import.meta.url));

export async function openDatabase(target: DatabaseTarget): Promise<Database> {
  if (target.kind === 'postgres') return openPostgres(target.url);
  const client = target.kind === 'memory' ? new PGlite() : new PGlite(target.dataDir);
  await client.waitReady;
  const db = drizzlePglite({ client, schema });
  return {
    db: db as unknown as Db,
    kind: target.kind,
    migrate: () => migratePglite(db, { migrationsFolder }),
    ping: () => ping(db as unknown as Db),
    close: () => client.close(),
  };
}

function openPostgres(url: string): Database {
  const pool = new pg.Pool({ connectionString: url, max: 10 });
  // An idle client that loses its connection must not crash the server; the next query reconnects.
  pool.on('error', (error) => console.error('PostgreSQL pool error:', error.message));
  const db = drizzlePostgres({ client: pool, schema });
  return {
    db: db as unknown as Db,
    kind: 'postgres',
    migrate: () => migrateOneAtATime(pool, () => migratePostgres(db, { migrationsFolder })),
    ping: () => ping(db as unknown as Db),
    close: () => pool.end(),
  };
}

/** Any number that names Canwright's migrations among the advisory locks of a database. */
const MIGRATION_LOCK = 7_245_091;

/**
 * Several servers may start at once against one database: an advisory lock (PostgreSQL manual,
 * "Advisory Locks") lets one apply the migrations while the others wait, then find nothing to do.
 */
async function migrateOneAtATime(pool: pg.Pool, migrate: () => Promise<void>): Promise<void> {
  const client = await pool.connect();
  try {
    await client.query('select pg_advisory_lock($1)', [MIGRATION_LOCK]);
    try {
      await migrate();
    } finally {
      await client.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK]);
    }
  } finally {
    client.release();
  }
}

async function ping(db: Db): Promise<boolean> {
  try {
    await db.execute(sql`select 1`);
    return true;
  } catch {
    return false;
  }
}
