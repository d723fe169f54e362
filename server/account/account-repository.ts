import { and, count, eq, ne, or } from 'drizzle-orm';
import type { Db } from '../db/database.ts';
import { burnPhotos, burns, designs, users, verifications } from '../db/schema.ts';

export function createAccountRepository(db: Db) {
  return {
    async findById(id: string) {
      const [row] = await db
        .select({ id: users.id, name: users.name, email: users.email, emailVerified: users.emailVerified, role: users.role, units: users.units, defaultPaper: users.defaultPaper, drillSetIds: users.drillSetIds, massUnit: users.massUnit, temperatureUnit: users.temperatureUnit, volumeUnit: users.volumeUnit })
        .from(users)
        .where(eq(users.id, id));
      return row;
    },
    async setPreferences(id: string, preferences: { units?: string; defaultPaper?: string; drillSetIds?: string[]; massUnit?: string; temperatureUnit?: string; volumeUnit?: string }) {
      await db.update(users).set({ ...preferences, updatedAt: new Date() }).where(eq(users.id, id));
    },
    async setName(id: string, name: string) {
      await db.update(users).set({ name, updatedAt: new Date() }).where(eq(users.id, id));
    },
    /** Admins other than this user. */
    async otherAdmins(id: string): Promise<number> {
      const [row] = await db.select({ n: count() }).from(users).where(and(eq(users.role, 'admin'), ne(users.id, id)));
      return row?.n ?? 0;
    },
    /**
     * Deletes the user and, through the foreign keys' ON DELETE CASCADE, everything that is theirs:
     * sessions, sign-in accounts, printer profiles, designs with their versions, burns and photo
     * rows; and tokens issued to them (a password reset's names the user id). In one transaction
     * that first locks the user's row, so no upload can add a photo meanwhile; `removeFiles` gets
     * the stored photos' keys before the rows go, and when it fails, nothing is deleted.
     */
    deleteUser(id: string, removeFiles: (keys: string[]) => Promise<void>): Promise<boolean> {
      return db.transaction(async (tx) => {
        const [user] = await tx.select({ id: users.id }).from(users).where(eq(users.id, id)).for('update');
        if (!user) return false;
        // Their own photos, and those of workshop members' burns of the user's designs (those rows go with the designs).
        const photos = await tx
          .select({ image: burnPhotos.imageKey, thumbnail: burnPhotos.thumbnailKey })
          .from(burnPhotos)
          .innerJoin(burns, eq(burns.id, burnPhotos.burnId))
          .innerJoin(designs, eq(designs.id, burns.designId))
          .where(or(eq(burnPhotos.ownerId, id), eq(designs.ownerId, id)));
        await removeFiles(photos.flatMap((p) => [p.image, p.thumbnail]));
        await tx.delete(verifications).where(eq(verifications.value, id));
        await tx.delete(users).where(eq(users.id, id));
        return true;
      });
    },
  };
}

export type AccountRepository = ReturnType<typeof createAccountRepository>;
