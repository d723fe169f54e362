import { and, desc, eq } from 'drizzle-orm';
import type { Design } from '../../shared/design/design-schema.ts';
import type { DesignSummary } from '../../shared/library/library-schemas.ts';
import type { Db } from '../db/database.ts';
import { designs, designVersions } from '../db/schema.ts';

export interface VersionRow {
  number: number;
  createdAt: Date;
  note: string | null;
  summary: DesignSummary;
}

/**
 * Reads of a design's versions. Each joins the design and names its owner in the WHERE clause:
 * the versions of another maker's design read as no versions at all.
 */
export function createVersionQueries(db: Db) {
  const ownedDesign = (ownerId: string, designId: string) => and(eq(designs.id, designId), eq(designs.ownerId, ownerId));
  const versionColumns = { number: designVersions.number, createdAt: designVersions.createdAt, note: designVersions.note, summary: designVersions.summary };

  return {
    /** Newest first, without documents. Empty when the design is not the owner's. */
    listVersions(ownerId: string, designId: string): Promise<VersionRow[]> {
      return db
        .select(versionColumns)
        .from(designVersions)
        .innerJoin(designs, eq(designs.id, designVersions.designId))
        .where(ownedDesign(ownerId, designId))
        .orderBy(desc(designVersions.number));
    },
    async findVersion(ownerId: string, designId: string, number: number): Promise<(VersionRow & { document: Design }) | undefined> {
      const [row] = await db
        .select({ ...versionColumns, document: designVersions.document })
        .from(designVersions)
        .innerJoin(designs, eq(designs.id, designVersions.designId))
        .where(and(ownedDesign(ownerId, designId), eq(designVersions.number, number)));
      return row;
    },
  };
}
