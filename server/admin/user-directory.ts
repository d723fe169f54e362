import { count, desc, eq, ilike, or } from 'drizzle-orm';
import type { Db } from '../db/database.ts';
import { users } from '../db/schema.ts';

/** Read side of user management: the admin's searchable list of accounts. */
const columns = {
  id: users.id,
  name: users.name,
  email: users.email,
  emailVerified: users.emailVerified,
  role: users.role,
  banned: users.banned,
  createdAt: users.createdAt,
};

export function createUserDirectory(db: Db) {
  return {
    async findById(id: string) {
      const [row] = await db.select(columns).from(users).where(eq(users.id, id));
      return row;
    },
    async list({ search, limit, offset }: { search?: string; limit: number; offset: number }) {
      const pattern = search ? `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : undefined;
      const where = pattern ? or(ilike(users.email, pattern), ilike(users.name, pattern)) : undefined;
      const [rows, [total]] = await Promise.all([
        db
          .select(columns)
          .from(users)
          .where(where)
          .orderBy(desc(users.createdAt), users.email)
          .limit(limit)
          .offset(offset),
        db.select({ value: count() }).from(users).where(where),
      ]);
      return { rows, total: total?.value ?? 0 };
    },
  };
}

export type UserDirectory = ReturnType<typeof createUserDirectory>;
