import { eq } from 'drizzle-orm';
import type { Auth } from '../auth/auth.ts';
import type { Db } from '../db/database.ts';
import { createBurnLog } from '../burns/burn-log.ts';
import { createBurnRepository } from '../burns/burn-repository.ts';
import { users } from '../db/schema.ts';
import { createDesignLibrary } from '../library/design-library.ts';
import { createDesignRepository } from '../library/design-repository.ts';
import { demoAccounts, type DemoAccount } from './demo-accounts.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import { seedDemoBurns } from './demo-burns.ts';
import { seedDemoLibrary } from './demo-designs.ts';
import { seedDemoWorkshop } from './demo-workshop.ts';
import { createWorkshopRepository } from '../workshops/workshop-repository.ts';

/**
 * Creates the demo accounts that are missing, verified and with their roles, and fills the demo
 * maker's library and the class stove's burn log (photos go to `store`), and the instructor's
 * workshop with the maker in it. Idempotent: an account that exists is left alone (its password may have been
 * changed, its designs deleted, on purpose).
 * Uses better-auth's server-side admin API (no request, so no session is needed).
 */
export async function seedDemo(db: Db, auth: Auth, store: ObjectStore, accounts: DemoAccount[] = demoAccounts): Promise<{ created: string[] }> {
  const created: string[] = [];
  const ids = new Map<DemoAccount, string>();
  for (const account of accounts) {
    const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, account.email));
    if (existing) continue;
    const { user } = await auth.api.createUser({
      body: { name: account.name, email: account.email, password: account.password, role: account.role, data: { emailVerified: true } },
    });
    if (account.withDemoLibrary) {
      const { classStoveId } = await seedDemoLibrary(createDesignLibrary(createDesignRepository(db)), user.id);
      await seedDemoBurns(createBurnLog(createBurnRepository(db), store), user.id, classStoveId);
    }
    ids.set(account, user.id);
    created.push(account.email);
  }
  // The workshop needs both its instructor and its member, and is made with the instructor only.
  const instructor = accounts.find((a) => a.runsDemoWorkshop);
  const member = accounts.find((a) => a.withDemoLibrary);
  const instructorId = instructor && ids.get(instructor);
  if (instructorId && member) {
    const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, member.email));
    if (row) {
      await seedDemoWorkshop(
        { library: createDesignLibrary(createDesignRepository(db)), workshops: createWorkshopRepository(db), burnLog: createBurnLog(createBurnRepository(db), store) },
        instructorId,
        row.id,
      );
    }
  }
  return { created };
}
