import { randomUUID } from 'node:crypto';
import { and, count, desc, eq, inArray } from 'drizzle-orm';
import type { Db } from '../db/database.ts';
import { burnPhotos, burns, designs, designVersions, workshops } from '../db/schema.ts';

export type BurnRow = typeof burns.$inferSelect;
export type BurnPhotoRow = typeof burnPhotos.$inferSelect;
export type NewBurnRow = Omit<typeof burns.$inferInsert, 'id' | 'createdAt' | 'updatedAt'>;
export type BurnChange = Partial<Omit<NewBurnRow, 'ownerId' | 'designId' | 'versionId'>>;
/** A burn with the number of the version it tested. */
export interface BurnWithVersion {
  burn: BurnRow;
  version: number;
}

/** The Drizzle queries of the burn log. Every one is scoped to the owner: another maker's rows are not found. */
export function createBurnRepository(db: Db) {
  const ownBurn = (ownerId: string, burnId: string) => and(eq(burns.id, burnId), eq(burns.ownerId, ownerId));
  const withVersion = { burn: burns, version: designVersions.number };

  return {
    /** The owner's design and one of its versions (the current one when no number is given). */
    async findVersion(ownerId: string, designId: string, number?: number): Promise<{ found: false; design: boolean } | { found: true; versionId: string; number: number }> {
      const [design] = await db.select({ id: designs.id, current: designs.currentVersion }).from(designs).where(and(eq(designs.id, designId), eq(designs.ownerId, ownerId)));
      if (!design) return { found: false, design: false };
      const [version] = await db
        .select({ id: designVersions.id, number: designVersions.number })
        .from(designVersions)
        .where(and(eq(designVersions.designId, designId), eq(designVersions.number, number ?? design.current)));
      return version ? { found: true, versionId: version.id, number: version.number } : { found: false, design: true };
    },

    async insert(values: NewBurnRow): Promise<BurnRow> {
      const [row] = await db.insert(burns).values({ id: randomUUID(), ...values }).returning();
      return row!;
    },

    list(ownerId: string, designId: string): Promise<BurnWithVersion[]> {
      return db
        .select(withVersion)
        .from(burns)
        .innerJoin(designVersions, eq(designVersions.id, burns.versionId))
        .where(and(eq(burns.designId, designId), eq(burns.ownerId, ownerId)))
        .orderBy(desc(burns.burnedAt), desc(burns.id));
    },

    async find(ownerId: string, burnId: string): Promise<BurnWithVersion | undefined> {
      const [row] = await db.select(withVersion).from(burns).innerJoin(designVersions, eq(designVersions.id, burns.versionId)).where(ownBurn(ownerId, burnId));
      return row;
    },

    async update(ownerId: string, burnId: string, change: BurnChange): Promise<BurnRow | undefined> {
      const [row] = await db.update(burns).set({ ...change, updatedAt: new Date() }).where(ownBurn(ownerId, burnId)).returning();
      return row;
    },

    /** Deletes the burn (its photo rows go with it) and answers the photos' storage keys, or undefined when not found. */
    remove(ownerId: string, burnId: string): Promise<string[] | undefined> {
      return db.transaction(async (tx) => {
        const photos = await tx.select({ image: burnPhotos.imageKey, thumbnail: burnPhotos.thumbnailKey }).from(burnPhotos).where(eq(burnPhotos.burnId, burnId));
        const [gone] = await tx.delete(burns).where(ownBurn(ownerId, burnId)).returning({ id: burns.id });
        return gone ? photos.flatMap((p) => [p.image, p.thumbnail]) : undefined;
      });
    },

    photosOf(burnIds: string[]): Promise<BurnPhotoRow[]> {
      if (burnIds.length === 0) return Promise.resolve([]);
      return db.select().from(burnPhotos).where(inArray(burnPhotos.burnId, burnIds)).orderBy(burnPhotos.createdAt, burnPhotos.id);
    },

    /** Adds a photo unless the burn is not the owner's or already holds `max`; the burn row is locked, so two uploads at once cannot pass the cap. */
    addPhotoWithinCap(ownerId: string, photo: Omit<typeof burnPhotos.$inferInsert, 'createdAt' | 'ownerId'>, max: number): Promise<BurnPhotoRow | 'missing' | 'full'> {
      return db.transaction(async (tx) => {
        const [burn] = await tx.select({ id: burns.id }).from(burns).where(ownBurn(ownerId, photo.burnId)).for('update');
        if (!burn) return 'missing';
        const [held] = await tx.select({ n: count() }).from(burnPhotos).where(eq(burnPhotos.burnId, photo.burnId));
        if ((held?.n ?? 0) >= max) return 'full';
        const [row] = await tx.insert(burnPhotos).values({ ...photo, ownerId }).returning();
        return row!;
      });
    },

    async findPhoto(ownerId: string, photoId: string): Promise<BurnPhotoRow | undefined> {
      const [row] = await db.select().from(burnPhotos).where(and(eq(burnPhotos.id, photoId), eq(burnPhotos.ownerId, ownerId)));
      return row;
    },

    /** A photo of a burn logged in a workshop the viewer runs: instructors see their group's photos. */
    async findPhotoInWorkshopOf(instructorId: string, photoId: string): Promise<BurnPhotoRow | undefined> {
      const [row] = await db
        .select({ photo: burnPhotos })
        .from(burnPhotos)
        .innerJoin(burns, eq(burns.id, burnPhotos.burnId))
        .innerJoin(workshops, eq(workshops.id, burns.workshopId))
        .where(and(eq(burnPhotos.id, photoId), eq(workshops.ownerId, instructorId)));
      return row?.photo;
    },

    async removePhoto(ownerId: string, photoId: string): Promise<BurnPhotoRow | undefined> {
      const [row] = await db.delete(burnPhotos).where(and(eq(burnPhotos.id, photoId), eq(burnPhotos.ownerId, ownerId))).returning();
      return row;
    },

    /**
     * Storage keys of every photo of every burn of the owner's design (before the design is
     * deleted), workshop members' burns of it included: those rows go with the design too.
     */
    async photoKeysOfDesign(ownerId: string, designId: string): Promise<string[]> {
      const rows = await db
        .select({ image: burnPhotos.imageKey, thumbnail: burnPhotos.thumbnailKey })
        .from(burnPhotos)
        .innerJoin(burns, eq(burns.id, burnPhotos.burnId))
        .innerJoin(designs, eq(designs.id, burns.designId))
        .where(and(eq(burns.designId, designId), eq(designs.ownerId, ownerId)));
      return rows.flatMap((p) => [p.image, p.thumbnail]);
    },
  };
}

export type BurnRepository = ReturnType<typeof createBurnRepository>;
