import type { HoleGroup } from '../design/design-schema.ts';
import type { DesignSummary } from './library-schemas.ts';

type SummaryPart = DesignSummary['parts'][number];

/** The word a maker uses for each hole group; secondary holes are the jets. */
const groupWords: Record<HoleGroup, string> = { primary: 'primary', secondary: 'jets', intake: 'intake', other: 'other' };

/**
 * What changed from one version to the next, one short line each: hole counts per group and
 * drill, the primary : secondary ratio, and the can of each part. An empty list means no change
 * the summary can see (a note or a margin may still differ).
 */
export function diffSummaries(older: DesignSummary, newer: DesignSummary): string[] {
  return [...diffHoles(older, newer), ...diffRatio(older.ratio, newer.ratio), ...diffParts(older.parts, newer.parts)];
}

function diffHoles(older: DesignSummary, newer: DesignSummary): string[] {
  const counts = new Map<string, { group: HoleGroup; drillLabel: string; before: number; after: number }>();
  const entry = (group: HoleGroup, drillLabel: string) => {
    const key = `${group}\u0000${drillLabel}`;
    let found = counts.get(key);
    if (!found) {
      found = { group, drillLabel, before: 0, after: 0 };
      counts.set(key, found);
    }
    return found;
  };
  for (const size of older.bySize) entry(size.group, size.drillLabel).before += size.count;
  for (const size of newer.bySize) entry(size.group, size.drillLabel).after += size.count;
  return [...counts.values()]
    .filter((c) => c.before !== c.after)
    .map((c) => `${groupWords[c.group]}: ${c.before} -> ${c.after} holes of ${c.drillLabel}`);
}

/** Compared as shown, to one decimal: a change the list would print the same is no change. */
function diffRatio(older: number | null, newer: number | null): string[] {
  const before = formatRatio(older);
  const after = formatRatio(newer);
  return before === after ? [] : [`primary ratio ${before} -> ${after}`];
}

function formatRatio(ratio: number | null): string {
  return ratio === null ? 'none (no jets)' : `${ratio.toFixed(1)} : 1`;
}

/** Parts are matched by id: a part whose id changed reads as one removed and one added. */
function diffParts(older: SummaryPart[], newer: SummaryPart[]): string[] {
  const lines: string[] = [];
  for (const before of older) {
    const after = newer.find((part) => part.id === before.id);
    if (!after) {
      lines.push(`${roleWords(before)} removed: ${canLabel(before)}`);
      continue;
    }
    if (after.role !== before.role) lines.push(`${before.id}: ${roleWords(before)} -> ${roleWords(after)}`);
    if (canLabel(after) !== canLabel(before)) lines.push(`${roleWords(after)} can: ${canLabel(before)} -> ${canLabel(after)}`);
    else if (after.vesselName !== before.vesselName) lines.push(`${roleWords(after)} can: ${before.vesselName} -> ${after.vesselName}`);
  }
  for (const after of newer) {
    if (!older.some((part) => part.id === after.id)) lines.push(`${roleWords(after)} added: ${canLabel(after)}`);
  }
  return lines;
}

const roleWords = (part: SummaryPart) => part.role.replace(/-/g, ' ');
const canLabel = (part: SummaryPart) => part.canCode ?? part.vesselName;
