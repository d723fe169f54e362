import { randomUUID } from 'node:crypto';
import { and, count, desc, eq, inArray, isNotNull, or, sql } from 'drizzle-orm';
import type { Db } from '../db/database.ts';
import { burns, designs, designVersions, printerProfiles, users, workshopInvitations, workshopMembers, workshops } from '../db/schema.ts';

export type WorkshopRow = typeof workshops.$inferSelect;
export type InvitationRow = typeof workshopInvitations.$inferSelect;
export type NewWorkshopRow = Omit<typeof workshops.$inferInsert, 'id' | 'createdAt' | 'updatedAt'>;

/** A workshop with its kit's design and version, and the instructor's name. */
export interface WorkshopWithKit {
  workshop: WorkshopRow;
  designName: string;
  version: number;
  latestVersion: number;
  summary: typeof designVersions.$inferSelect.summary;
  document: typeof designVersions.$inferSelect.document;
  instructorName: string;
}

export function createWorkshopRepository(db: Db) {
  const withKit = {
    workshop: workshops,
    designName: designs.name,
    version: designVersions.number,
    latestVersion: designs.currentVersion,
    summary: designVersions.summary,
    document: designVersions.document,
    instructorName: users.name,
  };
  const selectWithKit = () =>
    db
      .select(withKit)
      .from(workshops)
      .innerJoin(designs, eq(designs.id, workshops.designId))
      .innerJoin(designVersions, eq(designVersions.id, workshops.versionId))
      .innerJoin(users, eq(users.id, workshops.ownerId));

  return {
    /** One of the instructor's own design versions: the current one when no number is given. */
    async findOwnVersion(ownerId: string, designId: string, number?: number): Promise<{ design: boolean; versionId?: string; number?: number }> {
      const [design] = await db.select({ current: designs.currentVersion }).from(designs).where(and(eq(designs.id, designId), eq(designs.ownerId, ownerId)));
      if (!design) return { design: false };
      const [version] = await db
        .select({ id: designVersions.id, number: designVersions.number })
        .from(designVersions)
        .where(and(eq(designVersions.designId, designId), eq(designVersions.number, number ?? design.current)));
      return { design: true, versionId: version?.id, number: version?.number };
    },

    async insert(values: NewWorkshopRow): Promise<string> {
      const id = randomUUID();
      await db.insert(workshops).values({ id, ...values });
      return id;
    },

    async find(id: string): Promise<WorkshopWithKit | undefined> {
      const [row] = await selectWithKit().where(eq(workshops.id, id));
      return row;
    },

    async findByCode(code: string): Promise<WorkshopRow | undefined> {
      const [row] = await db.select().from(workshops).where(eq(workshops.joinCode, code));
      return row;
    },

    /** Workshops the user runs or is in, the next first. */
    listFor(userId: string): Promise<(WorkshopWithKit & { member: boolean })[]> {
      const membership = db.select({ id: workshopMembers.workshopId }).from(workshopMembers).where(eq(workshopMembers.userId, userId));
      return db
        .select({ ...withKit, member: sql<boolean>`${workshops.ownerId} <> ${userId}` })
        .from(workshops)
        .innerJoin(designs, eq(designs.id, workshops.designId))
        .innerJoin(designVersions, eq(designVersions.id, workshops.versionId))
        .innerJoin(users, eq(users.id, workshops.ownerId))
        .where(or(eq(workshops.ownerId, userId), inArray(workshops.id, membership)))
        .orderBy(desc(workshops.startsAt), desc(workshops.id));
    },

    async update(id: string, change: Partial<NewWorkshopRow>): Promise<void> {
      await db.update(workshops).set({ ...change, updatedAt: new Date() }).where(eq(workshops.id, id));
    },

    async remove(id: string): Promise<void> {
      await db.delete(workshops).where(eq(workshops.id, id));
    },

    async usesDesign(designId: string): Promise<string[]> {
      const rows = await db.select({ title: workshops.title }).from(workshops).where(eq(workshops.designId, designId));
      return rows.map((r) => r.title);
    },

    async memberCount(workshopId: string): Promise<number> {
      const [row] = await db.select({ n: count() }).from(workshopMembers).where(eq(workshopMembers.workshopId, workshopId));
      return row?.n ?? 0;
    },

    async findMember(workshopId: string, userId: string) {
      const [row] = await db.select().from(workshopMembers).where(and(eq(workshopMembers.workshopId, workshopId), eq(workshopMembers.userId, userId)));
      return row;
    },

    /**
     * Adds the member unless the workshop is full; the workshop row is locked, so two people
     * joining at once cannot pass the capacity. Answers whether they were new.
     */
    addMemberWithinCapacity(workshopId: string, userId: string, invitationId?: string): Promise<'joined' | 'already' | 'full'> {
      return db.transaction(async (tx) => {
        const [workshop] = await tx.select({ capacity: workshops.capacity }).from(workshops).where(eq(workshops.id, workshopId)).for('update');
        if (!workshop) return 'full';
        const [existing] = await tx.select({ userId: workshopMembers.userId }).from(workshopMembers).where(and(eq(workshopMembers.workshopId, workshopId), eq(workshopMembers.userId, userId)));
        if (existing) return 'already';
        const [held] = await tx.select({ n: count() }).from(workshopMembers).where(eq(workshopMembers.workshopId, workshopId));
        if ((held?.n ?? 0) >= workshop.capacity) return 'full';
        await tx.insert(workshopMembers).values({ workshopId, userId });
        if (invitationId) await tx.update(workshopInvitations).set({ acceptedAt: new Date() }).where(eq(workshopInvitations.id, invitationId));
        return 'joined';
      });
    },

    async removeMember(workshopId: string, userId: string): Promise<boolean> {
      const gone = await db.delete(workshopMembers).where(and(eq(workshopMembers.workshopId, workshopId), eq(workshopMembers.userId, userId))).returning({ userId: workshopMembers.userId });
      return gone.length > 0;
    },

    async markPrinted(workshopId: string, userId: string): Promise<void> {
      await db.update(workshopMembers).set({ printedAt: new Date() }).where(and(eq(workshopMembers.workshopId, workshopId), eq(workshopMembers.userId, userId)));
    },

    /** Writes (or renews) the invitation of each address: a new token and expiry each time. */
    async upsertInvitation(workshopId: string, email: string, tokenHash: string, expiresAt: Date): Promise<void> {
      await db
        .insert(workshopInvitations)
        .values({ id: randomUUID(), workshopId, email, tokenHash, expiresAt })
        .onConflictDoUpdate({ target: [workshopInvitations.workshopId, workshopInvitations.email], set: { tokenHash, expiresAt, sentAt: new Date(), acceptedAt: null } });
    },

    async findInvitation(tokenHash: string): Promise<InvitationRow | undefined> {
      const [row] = await db.select().from(workshopInvitations).where(eq(workshopInvitations.tokenHash, tokenHash));
      return row;
    },

    invitations(workshopId: string): Promise<InvitationRow[]> {
      return db.select().from(workshopInvitations).where(eq(workshopInvitations.workshopId, workshopId)).orderBy(workshopInvitations.email);
    },

    /** Members with their name, address and burn count in this workshop. */
    members(workshopId: string) {
      return db
        .select({
          userId: workshopMembers.userId,
          joinedAt: workshopMembers.joinedAt,
          printedAt: workshopMembers.printedAt,
          name: users.name,
          email: users.email,
          defaultPaper: users.defaultPaper,
          burns: sql<number>`(select count(*)::int from ${burns} where ${burns.workshopId} = ${workshopId} and ${burns.ownerId} = ${workshopMembers.userId})`,
        })
        .from(workshopMembers)
        .innerJoin(users, eq(users.id, workshopMembers.userId))
        .where(eq(workshopMembers.workshopId, workshopId))
        .orderBy(users.name, users.email);
    },

    /** Burns logged in the workshop: everybody's, or one member's. */
    burns(workshopId: string, ownerId?: string) {
      return db
        .select({ burn: burns, version: designVersions.number, memberName: users.name })
        .from(burns)
        .innerJoin(designVersions, eq(designVersions.id, burns.versionId))
        .innerJoin(users, eq(users.id, burns.ownerId))
        .where(and(eq(burns.workshopId, workshopId), ownerId ? eq(burns.ownerId, ownerId) : isNotNull(burns.ownerId)))
        .orderBy(desc(burns.burnedAt), desc(burns.id));
    },

    /** The person's default printer profile (or newest), for a kit printed for them. */
    async printerOf(userId: string): Promise<{ name: string; measuredXMm: number; measuredYMm: number } | undefined> {
      const [row] = await db
        .select({ name: printerProfiles.name, measuredXMm: printerProfiles.measuredXMm, measuredYMm: printerProfiles.measuredYMm })
        .from(printerProfiles)
        .where(eq(printerProfiles.userId, userId))
        .orderBy(desc(printerProfiles.isDefault), desc(printerProfiles.updatedAt))
        .limit(1);
      return row;
    },

    async userEmail(userId: string): Promise<{ email: string; emailVerified: boolean; defaultPaper: string; role: string } | undefined> {
      const [row] = await db.select({ email: users.email, emailVerified: users.emailVerified, defaultPaper: users.defaultPaper, role: users.role }).from(users).where(eq(users.id, userId));
      return row;
    },
  };
}

export type WorkshopRepository = ReturnType<typeof createWorkshopRepository>;
