import type { Design } from '../../shared/design/design-schema.ts';
import type { DesignDetail, DesignList, SharedDesign } from '../../shared/library/library-schemas.ts';
import { summarizeDesign } from '../../shared/library/summarize-design.ts';
import { AppError, notFound } from '../http/app-error.ts';
import type { DesignFilter, DesignRepository, DesignRow } from './design-repository.ts';
import { toDetail, toListItem, toSharedDesign } from './design-views.ts';
import { createShareToken, looksLikeShareToken } from './share-token.ts';

/** Plenty for a lifetime of stoves; a cap keeps one account from filling the database. */
export const MAX_DESIGNS = 500;

const NAME_MAX = 120;
const COPY_SUFFIX = ' (copy)';

export const missingDesign = () => notFound('That design');

/** What creating a design needs, after validation (the document already passed validateDesign). */
export interface NewDesign {
  name?: string;
  tags?: string[];
  document: Design;
}

/** "<name> (copy)", shortening the name so the whole stays within the 120-character limit. */
function nameCopy(name: string): string {
  return `${name.slice(0, NAME_MAX - COPY_SUFFIX.length).trimEnd()}${COPY_SUFFIX}`;
}

/** Files stored for a design outside the database (its burns' photos), deleted with it. */
export interface DesignFiles {
  keysOf(ownerId: string, designId: string): Promise<string[]>;
  forget(keys: string[]): Promise<void>;
}

/** What else uses a design: a workshop's kit keeps its design from being deleted. */
export interface DesignUses {
  workshopsUsing(designId: string): Promise<string[]>;
}

/** A signed-in maker's saved designs. Only the share link reads a design without its owner. */
export function createDesignUseCases(designs: DesignRepository, files?: DesignFiles, uses?: DesignUses) {
  /** Runs a change that answers the changed row, then reads the design back with its current version. */
  async function changeThenRead(ownerId: string, change: Promise<DesignRow | undefined>): Promise<DesignDetail> {
    const row = await change;
    if (!row) throw missingDesign();
    return getDesign(ownerId, row.id);
  }

  async function getDesign(ownerId: string, id: string): Promise<DesignDetail> {
    const found = await designs.find(ownerId, id);
    if (!found) throw missingDesign();
    return toDetail(found);
  }

  /** Inserts under the owner lock so the cap holds even when two tabs create at once. */
  function insertWithinCap(ownerId: string, fields: { name: string; tags: string[] }, document: Design, note: string | null): Promise<DesignDetail> {
    const summary = summarizeDesign(document);
    return designs.withOwnerLock(ownerId, async (queries) => {
      if ((await queries.countFor(ownerId)) >= MAX_DESIGNS) {
        throw new AppError(409, 'DESIGN_LIMIT', `You already have ${MAX_DESIGNS} saved designs, the most one account can keep. Delete one you no longer need, then save this one.`);
      }
      const design = await queries.insertDesign(ownerId, fields, { document, summary, note });
      return toDetail({ design, summary, document });
    });
  }

  return {
    async listDesigns(ownerId: string, filter: DesignFilter): Promise<DesignList> {
      const rows = await designs.list(ownerId, filter);
      return { designs: rows.map((row) => toListItem(row.design, row.summary)) };
    },

    getDesign,

    /** Version 1 is the given document; the name defaults to the document's own. */
    createDesign(ownerId: string, input: NewDesign): Promise<DesignDetail> {
      return insertWithinCap(ownerId, { name: input.name ?? input.document.name, tags: input.tags ?? [] }, input.document, null);
    },

    updateDesign(ownerId: string, id: string, change: { name?: string; tags?: string[] }): Promise<DesignDetail> {
      return changeThenRead(ownerId, designs.update(ownerId, id, change));
    },

    async deleteDesign(ownerId: string, id: string): Promise<void> {
      const workshops = (await designs.find(ownerId, id)) ? ((await uses?.workshopsUsing(id)) ?? []) : [];
      if (workshops.length > 0) {
        const names = workshops.map((t) => `“${t}”`).join(', ');
        throw new AppError(409, 'DESIGN_IN_USE', `This design is the kit of the workshop${workshops.length === 1 ? '' : 's'} ${names}. Delete ${workshops.length === 1 ? 'that workshop' : 'those workshops'} first; closing keeps the kit.`);
      }
      const keys = (await files?.keysOf(ownerId, id)) ?? [];
      if (!(await designs.remove(ownerId, id))) throw missingDesign();
      await files?.forget(keys);
    },

    /** A new design whose version 1 is the source's current version; tags kept, sharing and print date not. */
    async duplicateDesign(ownerId: string, id: string): Promise<DesignDetail> {
      const source = await designs.find(ownerId, id);
      if (!source) throw missingDesign();
      const { design, document } = source;
      const note = `Copied from "${design.name}", version ${design.currentVersion}`;
      return insertWithinCap(ownerId, { name: nameCopy(design.name), tags: design.tags }, document, note);
    },

    markPrinted(ownerId: string, id: string): Promise<DesignDetail> {
      return changeThenRead(ownerId, designs.markPrinted(ownerId, id));
    },

    shareDesign(ownerId: string, id: string): Promise<DesignDetail> {
      return changeThenRead(ownerId, designs.share(ownerId, id, createShareToken()));
    },

    /** The token is cleared, so the old link stops working; sharing again makes a new one. */
    unshareDesign(ownerId: string, id: string): Promise<DesignDetail> {
      return changeThenRead(ownerId, designs.unshare(ownerId, id));
    },

    async getSharedDesign(token: string): Promise<SharedDesign> {
      const found = looksLikeShareToken(token) ? await designs.findShared(token) : undefined;
      if (!found) throw notFound('That shared design');
      return toSharedDesign(found);
    },
  };
}

export type DesignUseCases = ReturnType<typeof createDesignUseCases>;
