import { and, count, desc, eq } from 'drizzle-orm';
import type { Db } from '../db/database.ts';
import { printerProfiles, users } from '../db/schema.ts';

export type PrinterProfileRow = typeof printerProfiles.$inferSelect;

export interface PrinterProfileFields {
  name: string;
  measuredXMm: number;
  measuredYMm: number;
}

/** Default first, then newest; the id breaks ties so the order never wobbles. */
const listOrder = [desc(printerProfiles.isDefault), desc(printerProfiles.createdAt), desc(printerProfiles.id)];

/**
 * Every query names the owner next to the id (WHERE id AND user_id), so another user's id
 * behaves exactly like an id that does not exist.
 */
function createQueries(db: Db) {
  const owned = (userId: string, id: string) => and(eq(printerProfiles.id, id), eq(printerProfiles.userId, userId));

  return {
    list(userId: string): Promise<PrinterProfileRow[]> {
      return db.select().from(printerProfiles).where(eq(printerProfiles.userId, userId)).orderBy(...listOrder);
    },
    async find(userId: string, id: string): Promise<PrinterProfileRow | undefined> {
      const [row] = await db.select().from(printerProfiles).where(owned(userId, id));
      return row;
    },
    async countFor(userId: string): Promise<number> {
      const [row] = await db.select({ total: count() }).from(printerProfiles).where(eq(printerProfiles.userId, userId));
      return row?.total ?? 0;
    },
    async insert(userId: string, fields: PrinterProfileFields, isDefault: boolean): Promise<PrinterProfileRow> {
      const [row] = await db
        .insert(printerProfiles)
        .values({ id: crypto.randomUUID(), userId, ...fields, isDefault })
        .returning();
      if (!row) throw new Error('INSERT ... RETURNING gave no row');
      return row;
    },
    async update(userId: string, id: string, fields: Partial<PrinterProfileFields>): Promise<PrinterProfileRow | undefined> {
      const [row] = await db
        .update(printerProfiles)
        .set({ ...fields, updatedAt: new Date() })
        .where(owned(userId, id))
        .returning();
      return row;
    },
    /** Clears the user's default first: the partial unique index allows one default at a time. */
    async makeDefault(userId: string, id: string): Promise<PrinterProfileRow | undefined> {
      await db
        .update(printerProfiles)
        .set({ isDefault: false, updatedAt: new Date() })
        .where(and(eq(printerProfiles.userId, userId), eq(printerProfiles.isDefault, true)));
      const [row] = await db
        .update(printerProfiles)
        .set({ isDefault: true, updatedAt: new Date() })
        .where(owned(userId, id))
        .returning();
      return row;
    },
    async remove(userId: string, id: string): Promise<PrinterProfileRow | undefined> {
      const [row] = await db.delete(printerProfiles).where(owned(userId, id)).returning();
      return row;
    },
    async findNewest(userId: string): Promise<PrinterProfileRow | undefined> {
      const [row] = await db
        .select()
        .from(printerProfiles)
        .where(eq(printerProfiles.userId, userId))
        .orderBy(desc(printerProfiles.createdAt), desc(printerProfiles.id))
        .limit(1);
      return row;
    },
  };
}

export type PrinterProfileQueries = ReturnType<typeof createQueries>;

export function createPrinterProfileRepository(db: Db) {
  return {
    ...createQueries(db),
    /**
     * Runs `work` in one transaction that first locks the user's row, so two writes by the same
     * user (two tabs) queue up instead of both passing the cap or both leaving a default.
     */
    withUserLock<T>(userId: string, work: (queries: PrinterProfileQueries) => Promise<T>): Promise<T> {
      return db.transaction(async (tx) => {
        await tx.select({ id: users.id }).from(users).where(eq(users.id, userId)).for('update');
        return work(createQueries(tx));
      });
    },
  };
}

export type PrinterProfileRepository = ReturnType<typeof createPrinterProfileRepository>;
