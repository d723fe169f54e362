import type { Design } from '../../shared/design/design-schema.ts';
import type { DesignDetail, VersionDetail, VersionList } from '../../shared/library/library-schemas.ts';
import { sameDocument } from '../../shared/library/same-document.ts';
import { summarizeDesign } from '../../shared/library/summarize-design.ts';
import { AppError, notFound } from '../http/app-error.ts';
import type { DesignQueries, DesignRepository, VersionContent } from './design-repository.ts';
import { missingDesign } from './design-use-cases.ts';
import { toDetail, toVersionItems } from './design-views.ts';

/** A long evening of small changes stays well under this; older ones cannot be pruned yet. */
export const MAX_VERSIONS = 200;

const missingVersion = (number: number) => notFound(`Version ${number} of that design`);

/** Saving, listing and restoring the versions of a maker's own design. */
export function createDesignVersionUseCases(designs: DesignRepository) {
  /** Appends under a lock on the design row, so two saves get numbers in turn and the cap holds. */
  function appendVersion(ownerId: string, id: string, content: (queries: DesignQueries) => Promise<VersionContent>): Promise<DesignDetail> {
    return designs.inTransaction(async (queries) => {
      const design = await queries.lockOwned(ownerId, id);
      if (!design) throw missingDesign();
      // Versions are never deleted one by one, so the current number is also the count.
      if (design.currentVersion >= MAX_VERSIONS) {
        throw new AppError(409, 'VERSION_LIMIT', `This design already has ${MAX_VERSIONS} versions, the most one design can keep. Duplicate it to carry on from the current version.`);
      }
      await queries.appendVersion(design, await content(queries));
      const saved = await queries.find(ownerId, id);
      if (!saved) throw missingDesign();
      return toDetail(saved);
    });
  }

  return {
    /** The document passed validateDesign already; its summary comes from a fresh layout. */
    saveVersion(ownerId: string, id: string, input: { document: Design; note?: string }): Promise<DesignDetail> {
      const summary = summarizeDesign(input.document);
      return appendVersion(ownerId, id, async (queries) => {
        // A version that changes nothing would only bury the ones that did.
        const current = await queries.find(ownerId, id);
        if (current && sameDocument(current.document, input.document)) {
          throw new AppError(409, 'NO_CHANGE', `Nothing has changed since version ${current.design.currentVersion}, so no new version was made.`);
        }
        return { document: input.document, summary, note: input.note ?? null };
      });
    },

    async listVersions(ownerId: string, id: string): Promise<VersionList> {
      const rows = await designs.listVersions(ownerId, id);
      // Every design has version 1, so no rows means no such design for this maker.
      if (rows.length === 0) throw missingDesign();
      return { versions: toVersionItems(rows) };
    },

    async getVersion(ownerId: string, id: string, number: number): Promise<VersionDetail> {
      const row = await designs.findVersion(ownerId, id, number);
      if (!row) throw (await designs.find(ownerId, id)) ? missingVersion(number) : missingDesign();
      return { number: row.number, createdAt: row.createdAt.toISOString(), note: row.note, summary: row.summary, document: row.document };
    },

    /** Version N's document (and summary) saved again as the newest version; history is kept. */
    restoreVersion(ownerId: string, id: string, number: number): Promise<DesignDetail> {
      return appendVersion(ownerId, id, async (queries) => {
        const old = await queries.findVersion(ownerId, id, number);
        if (!old) throw missingVersion(number);
        return { document: old.document, summary: old.summary, note: `Restored version ${number}` };
      });
    },
  };
}

export type DesignVersionUseCases = ReturnType<typeof createDesignVersionUseCases>;
