import { asc, count, eq, sql } from 'drizzle-orm';
import type { Db } from '../db/database.ts';
import { burnPhotos, burns, designs, designVersions, printerProfiles, users } from '../db/schema.ts';

type Insert<T extends { $inferInsert: unknown }> = T['$inferInsert'];

/** Everything an import writes, with new ids, ready for the tables. */
export interface ImportRows {
  designs: Insert<typeof designs>[];
  versions: Insert<typeof designVersions>[];
  burns: Insert<typeof burns>[];
  photos: Insert<typeof burnPhotos>[];
  profiles: Insert<typeof printerProfiles>[];
  /** Columns of the users row (the preference fields), or undefined to leave them. */
  preferences?: Partial<Insert<typeof users>>;
}

/** What the account holds already, for the caps and the default printer. */
export interface ExistingLibrary {
  designs: number;
  profiles: number;
  hasDefaultProfile: boolean;
}

/** Rows per INSERT: well under PostgreSQL's 65,535 parameters of one statement, even for the widest table. */
const CHUNK = 500;

/** The Drizzle queries of export and import: the owner's whole library, read or added in one go. */
export function createArchiveRepository(db: Db) {
  async function readExisting(on: Db, ownerId: string): Promise<ExistingLibrary> {
    const [designCount] = await on.select({ n: count() }).from(designs).where(eq(designs.ownerId, ownerId));
    const [profiles] = await on
      .select({ n: count(), defaults: sql<number>`count(*) filter (where ${printerProfiles.isDefault})`.mapWith(Number) })
      .from(printerProfiles)
      .where(eq(printerProfiles.userId, ownerId));
    return { designs: designCount?.n ?? 0, profiles: profiles?.n ?? 0, hasDefaultProfile: (profiles?.defaults ?? 0) > 0 };
  }

  return {
    readExisting: (ownerId: string) => readExisting(db, ownerId),

    /** Oldest first, so an export lists things in the order they were made; one snapshot, so a save meanwhile is all in or all out. */
    readLibrary(ownerId: string) {
      return db.transaction(
        async (tx) => {
          const designRows = await tx.select().from(designs).where(eq(designs.ownerId, ownerId)).orderBy(asc(designs.createdAt), asc(designs.name), asc(designs.id));
          const versionRows = await tx
            .select({ designId: designVersions.designId, number: designVersions.number, note: designVersions.note, createdAt: designVersions.createdAt, document: designVersions.document })
            .from(designVersions)
            .innerJoin(designs, eq(designs.id, designVersions.designId))
            .where(eq(designs.ownerId, ownerId))
            .orderBy(asc(designVersions.designId), asc(designVersions.number));
          const burnRows = await tx
            .select({ burn: burns, version: designVersions.number })
            .from(burns)
            .innerJoin(designVersions, eq(designVersions.id, burns.versionId))
            .where(eq(burns.ownerId, ownerId))
            .orderBy(asc(burns.burnedAt), asc(burns.createdAt), asc(burns.id));
          const photoRows = await tx.select().from(burnPhotos).where(eq(burnPhotos.ownerId, ownerId)).orderBy(asc(burnPhotos.createdAt), asc(burnPhotos.id));
          const profileRows = await tx.select().from(printerProfiles).where(eq(printerProfiles.userId, ownerId)).orderBy(asc(printerProfiles.createdAt), asc(printerProfiles.id));
          return { designs: designRows, versions: versionRows, burns: burnRows, photos: photoRows, profiles: profileRows };
        },
        { isolationLevel: 'repeatable read', accessMode: 'read only' },
      );
    },

    /**
     * One transaction: the owner's row is locked (so two imports, or an import and a save, take
     * their turn at the caps), `plan` sees what the account holds and answers the rows to add, or
     * throws to refuse; then every row goes in, or none does.
     */
    importAll(ownerId: string, plan: (existing: ExistingLibrary) => ImportRows): Promise<void> {
      return db.transaction(async (tx) => {
        await tx.select({ id: users.id }).from(users).where(eq(users.id, ownerId)).for('update');
        const rows = plan(await readExisting(tx, ownerId));
        for (let i = 0; i < rows.designs.length; i += CHUNK) await tx.insert(designs).values(rows.designs.slice(i, i + CHUNK));
        for (let i = 0; i < rows.versions.length; i += CHUNK) await tx.insert(designVersions).values(rows.versions.slice(i, i + CHUNK));
        for (let i = 0; i < rows.burns.length; i += CHUNK) await tx.insert(burns).values(rows.burns.slice(i, i + CHUNK));
        for (let i = 0; i < rows.photos.length; i += CHUNK) await tx.insert(burnPhotos).values(rows.photos.slice(i, i + CHUNK));
        if (rows.profiles.length) await tx.insert(printerProfiles).values(rows.profiles);
        if (rows.preferences) await tx.update(users).set({ ...rows.preferences, updatedAt: new Date() }).where(eq(users.id, ownerId));
      });
    },
  };
}

export type ArchiveRepository = ReturnType<typeof createArchiveRepository>;
