import { parseCanCode } from './can-code.ts';
import type { CatalogueEntry } from './catalogue-entry.ts';
import { parseSizeQuery } from './size-query.ts';

/**
 * Rank catalogue entries against what a maker types: a can code ("303x406", "303"), a name
 * fragment ("no. 10", "paint") or a diameter ("81 mm", "3 3/16"). Higher score = better match.
 */

const SCORE = {
  exactCode: 100,
  codePrefix: 80,
  sameDiameterCode: 70,
  size: 60, // minus up to 10 for distance from the size asked
  namePhrase: 50,
  nameFragment: 40,
  allWords: 30,
} as const;

/** Lower case, punctuation to spaces, so "No. 10" and "no 10" compare equal. */
function normalizeText(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9/]+/g, ' ')
    .trim();
}

/** "303 X 406" -> "303x406", so partly typed codes can be prefix-matched. */
function normalizeCode(text: string): string {
  return text.toLowerCase().replace(/\s+/g, '').replace(/×/g, 'x');
}

function scoreCode(entry: CatalogueEntry, query: string): number {
  if (entry.code === undefined) return 0;
  const typed = normalizeCode(query);
  if (!/^\d{3,4}(x\d{0,4})?$/.test(typed)) return 0; // 3+ digits: "3" alone is too vague
  if (entry.code === typed) return SCORE.exactCode;
  if (entry.code.startsWith(typed)) return SCORE.codePrefix;
  const parsed = parseCanCode(typed);
  if (parsed.ok && entry.code.startsWith(`${typed.split('x')[0]}x`)) return SCORE.sameDiameterCode;
  return 0;
}

function scoreSize(entry: CatalogueEntry, query: string): number {
  const size = parseSizeQuery(query);
  if (!size) return 0;
  const distance = Math.abs(entry.diameterMm - size.mm);
  if (distance > size.toleranceMm) return 0;
  return SCORE.size - (10 * distance) / size.toleranceMm;
}

function scoreText(entry: CatalogueEntry, query: string): number {
  const typed = normalizeText(query);
  if (typed === '') return 0;
  const name = normalizeText(entry.name);
  if (` ${name} `.includes(` ${typed} `)) return SCORE.namePhrase;
  if (name.includes(typed)) return SCORE.nameFragment;
  const haystack = normalizeText(`${entry.name} ${entry.id} ${entry.kind} ${entry.note ?? ''}`);
  const words = typed.split(' ');
  return words.every((word) => haystack.includes(word)) ? SCORE.allWords : 0;
}

/** How well one entry matches the query; 0 = not at all. */
export function scoreCatalogueEntry(entry: CatalogueEntry, query: string): number {
  return Math.max(scoreCode(entry, query), scoreSize(entry, query), scoreText(entry, query));
}

/** Matching entries, best first, then smallest diameter; an empty query lists them all. */
export function searchEntries(entries: readonly CatalogueEntry[], query: string): CatalogueEntry[] {
  const scored = entries.map((entry) => ({
    entry,
    score: query.trim() === '' ? 1 : scoreCatalogueEntry(entry, query),
  }));
  return scored
    .filter(({ score }) => score > 0)
    .sort((a, b) => b.score - a.score || a.entry.diameterMm - b.entry.diameterMm || a.entry.id.localeCompare(b.entry.id))
    .map(({ entry }) => entry);
}
