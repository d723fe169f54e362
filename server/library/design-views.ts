import { diffSummaries } from '../../shared/library/diff-summaries.ts';
import {
  sharedDesignPagePath,
  type DesignDetail,
  type DesignListItem,
  type DesignSummary,
  type SharedDesign,
  type VersionListItem,
} from '../../shared/library/library-schemas.ts';
import type { CurrentDesign, DesignRow } from './design-repository.ts';
import type { VersionRow } from './design-version-queries.ts';

/** Turns rows into the API shapes of shared/library/library-schemas.ts. */

export function toListItem(design: DesignRow, summary: DesignSummary): DesignListItem {
  return {
    id: design.id,
    name: design.name,
    tags: design.tags,
    updatedAt: design.updatedAt.toISOString(),
    lastPrintedAt: design.lastPrintedAt?.toISOString() ?? null,
    currentVersion: design.currentVersion,
    shared: design.shareToken !== null,
    holeCount: summary.holes,
    parts: summary.parts.length,
  };
}

export function toDetail({ design, summary, document }: CurrentDesign): DesignDetail {
  const detail: DesignDetail = { ...toListItem(design, summary), document };
  if (design.shareToken) detail.shareUrlPath = sharedDesignPagePath(design.shareToken);
  return detail;
}

/** Rows newest first; each is compared with the one before it (the next row in the list). */
export function toVersionItems(rows: VersionRow[]): VersionListItem[] {
  return rows.map((row, index) => {
    const previous = rows[index + 1];
    return {
      number: row.number,
      createdAt: row.createdAt.toISOString(),
      note: row.note,
      summary: row.summary,
      changes: previous ? diffSummaries(previous.summary, row.summary) : [],
    };
  });
}

/** Name, document, version and date only: nothing that says whose design it is. */
export function toSharedDesign({ design, document }: CurrentDesign): SharedDesign {
  return { name: design.name, document, version: design.currentVersion, updatedAt: design.updatedAt.toISOString() };
}
