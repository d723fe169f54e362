import { and, asc, count, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm';
import type { Design } from '../../shared/design/design-schema.ts';
import type { DesignSort, DesignSummary } from '../../shared/library/library-schemas.ts';
import type { Db } from '../db/database.ts';
import { designs, designVersions, users } from '../db/schema.ts';
import { createVersionQueries } from './design-version-queries.ts';

export type DesignRow = typeof designs.$inferSelect;

export interface DesignFilter {
  q?: string;
  tag?: string;
  sort: DesignSort;
}

/** What one saved version holds. */
export interface VersionContent {
  document: Design;
  summary: DesignSummary;
  note: string | null;
}

/** The design joined with its current version. */
export interface CurrentDesign {
  design: DesignRow;
  summary: DesignSummary;
  document: Design;
}

/** Ties broken by id so the order never wobbles; never-printed designs sort last. */
const sortOrders: Record<DesignSort, SQL[]> = {
  updated: [desc(designs.updatedAt), desc(designs.id)],
  name: [asc(sql`lower(${designs.name})`), asc(designs.id)],
  lastPrinted: [sql`${designs.lastPrintedAt} desc nulls last`, desc(designs.updatedAt), desc(designs.id)],
};

/** Joins a design to its current version: every design has one (version 1 is written with it). */
const currentVersionJoin = and(eq(designVersions.designId, designs.id), eq(designVersions.number, designs.currentVersion));

/** `%` and `_` in the search text are matched as themselves (backslash is LIKE's default escape). */
const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

function filterDesigns(ownerId: string, filter: DesignFilter): SQL | undefined {
  const conditions: SQL[] = [eq(designs.ownerId, ownerId)];
  if (filter.q) {
    const pattern = `%${escapeLike(filter.q)}%`;
    const tagMatches = sql`exists (select 1 from unnest(${designs.tags}) as tag where tag ilike ${pattern})`;
    const either = or(ilike(designs.name, pattern), tagMatches);
    if (either) conditions.push(either);
  }
  if (filter.tag) conditions.push(sql`${filter.tag} = any(${designs.tags})`);
  return and(...conditions);
}

/**
 * Every query names the owner next to the id (WHERE id AND owner_id), so another maker's design
 * behaves exactly like one that does not exist. The share-token lookup is the one exception.
 */
function createQueries(db: Db) {
  const owned = (ownerId: string, id: string) => and(eq(designs.id, id), eq(designs.ownerId, ownerId));
  const current = { design: designs, summary: designVersions.summary, document: designVersions.document };

  return {
    ...createVersionQueries(db),

    list(ownerId: string, filter: DesignFilter): Promise<{ design: DesignRow; summary: DesignSummary }[]> {
      return db
        .select({ design: designs, summary: designVersions.summary })
        .from(designs)
        .innerJoin(designVersions, currentVersionJoin)
        .where(filterDesigns(ownerId, filter))
        .orderBy(...sortOrders[filter.sort]);
    },
    async find(ownerId: string, id: string): Promise<CurrentDesign | undefined> {
      const [row] = await db.select(current).from(designs).innerJoin(designVersions, currentVersionJoin).where(owned(ownerId, id));
      return row;
    },
    async findShared(token: string): Promise<CurrentDesign | undefined> {
      const [row] = await db.select(current).from(designs).innerJoin(designVersions, currentVersionJoin).where(eq(designs.shareToken, token));
      return row;
    },
    async countFor(ownerId: string): Promise<number> {
      const [row] = await db.select({ total: count() }).from(designs).where(eq(designs.ownerId, ownerId));
      return row?.total ?? 0;
    },
    /** Locks the design row until the transaction ends, so two saves number their versions in turn. */
    async lockOwned(ownerId: string, id: string): Promise<DesignRow | undefined> {
      const [row] = await db.select().from(designs).where(owned(ownerId, id)).for('update');
      return row;
    },
    /** A new design and its version 1; call inside a transaction. */
    async insertDesign(ownerId: string, fields: { name: string; tags: string[] }, first: VersionContent): Promise<DesignRow> {
      const [row] = await db
        .insert(designs)
        .values({ id: crypto.randomUUID(), ownerId, ...fields, currentVersion: 1 })
        .returning();
      if (!row) throw new Error('INSERT ... RETURNING gave no row');
      await db.insert(designVersions).values({ id: crypto.randomUUID(), designId: row.id, number: 1, ...first });
      return row;
    },
    /** Version current + 1 becomes current; call inside a transaction that holds lockOwned. */
    async appendVersion(design: DesignRow, content: VersionContent): Promise<void> {
      const number = design.currentVersion + 1;
      await db.insert(designVersions).values({ id: crypto.randomUUID(), designId: design.id, number, ...content });
      await db.update(designs).set({ currentVersion: number, updatedAt: new Date() }).where(eq(designs.id, design.id));
    },
    async update(ownerId: string, id: string, fields: { name?: string; tags?: string[] }): Promise<DesignRow | undefined> {
      const [row] = await db
        .update(designs)
        .set({ ...fields, updatedAt: new Date() })
        .where(owned(ownerId, id))
        .returning();
      return row;
    },
    /** Printing is not editing: updated_at stays. */
    async markPrinted(ownerId: string, id: string): Promise<DesignRow | undefined> {
      const [row] = await db.update(designs).set({ lastPrintedAt: new Date() }).where(owned(ownerId, id)).returning();
      return row;
    },
    /** Keeps an existing token, so turning sharing on twice does not break the link already sent. */
    async share(ownerId: string, id: string, token: string): Promise<DesignRow | undefined> {
      const [row] = await db
        .update(designs)
        .set({ shareToken: sql`coalesce(${designs.shareToken}, ${token})` })
        .where(owned(ownerId, id))
        .returning();
      return row;
    },
    async unshare(ownerId: string, id: string): Promise<DesignRow | undefined> {
      const [row] = await db.update(designs).set({ shareToken: null }).where(owned(ownerId, id)).returning();
      return row;
    },
    async remove(ownerId: string, id: string): Promise<DesignRow | undefined> {
      const [row] = await db.delete(designs).where(owned(ownerId, id)).returning();
      return row;
    },
  };
}

export type DesignQueries = ReturnType<typeof createQueries>;

export function createDesignRepository(db: Db) {
  return {
    ...createQueries(db),
    /** One transaction; the work's queries run inside it. */
    inTransaction<T>(work: (queries: DesignQueries) => Promise<T>): Promise<T> {
      return db.transaction((tx) => work(createQueries(tx)));
    },
    /**
     * One transaction that first locks the owner's user row, so two creates by the same maker
     * (two tabs) queue up instead of both passing the cap.
     */
    withOwnerLock<T>(ownerId: string, work: (queries: DesignQueries) => Promise<T>): Promise<T> {
      return db.transaction(async (tx) => {
        await tx.select({ id: users.id }).from(users).where(eq(users.id, ownerId)).for('update');
        return work(createQueries(tx));
      });
    },
  };
}

export type DesignRepository = ReturnType<typeof createDesignRepository>;
