import type { PaperId } from '../../../shared/print/imposition-types.ts';

/**
 * Regions where Letter is the everyday paper (from memory: the US, Canada, Mexico, the
 * Philippines, Chile and Colombia); elsewhere A4 (ISO 216) is.
 */
const LETTER_REGIONS = new Set(['US', 'CA', 'MX', 'PH', 'CL', 'CO']);

/** A first guess at the paper in the maker's printer, from the browser's language tag. */
export function guessPaper(languages: readonly string[] = navigator.languages): PaperId {
  const tag = languages[0];
  if (!tag) return 'letter';
  const region = tag.split('-').slice(1).find((part) => /^[A-Za-z]{2}$/.test(part));
  if (!region) return tag.toLowerCase().startsWith('en') ? 'letter' : 'a4';
  return LETTER_REGIONS.has(region.toUpperCase()) ? 'letter' : 'a4';
}
