import { eq } from 'drizzle-orm';
import type { Db } from '../db/database.ts';
import { users } from '../db/schema.ts';

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
  };
}

export type AccountRepository = ReturnType<typeof createAccountRepository>;
