/**
 * Read a size typed into a search box: "81 mm", "81", "3 3/16", "3-3/16 in", `3.1875"`.
 * A fraction or an inch unit means inches; otherwise the number is millimetres.
 */

export type SizeQuery = { mm: number; toleranceMm: number; unit: 'mm' | 'in' };

const MM_PER_INCH = 25.4; // exact by definition
/** Match within ±2 mm for millimetres (common practice, no source): rims and labels vary. */
export const MM_SEARCH_TOLERANCE = 2;
/** Match within ±1/16 in for inches: the resolution of the can code (CMI manual). */
export const INCH_SEARCH_TOLERANCE_MM = MM_PER_INCH / 16;

const UNIT_PATTERN = /\s*(mm|inches|inch|in|")$/;
const DECIMAL_PATTERN = /^\d+(?:\.\d+)?$/;
const FRACTION_PATTERN = /^(\d+)\/(\d+)$/;

/** A plain decimal or a fraction such as "3/16", or undefined. */
function parseNumberToken(token: string): { value: number; isFraction: boolean } | undefined {
  if (DECIMAL_PATTERN.test(token)) return { value: Number(token), isFraction: false };
  const fraction = FRACTION_PATTERN.exec(token);
  const denominator = Number(fraction?.[2]);
  if (!fraction || !(denominator > 0)) return undefined;
  return { value: Number(fraction[1]) / denominator, isFraction: true };
}

/** The size in a query, or undefined when the query is not a size. */
export function parseSizeQuery(query: string): SizeQuery | undefined {
  let text = query.trim().toLowerCase();
  const unitMatch = UNIT_PATTERN.exec(text);
  const unit = unitMatch?.[1];
  if (unitMatch) text = text.slice(0, unitMatch.index).trim();
  const tokens = text.split(/\s*-\s*|\s+/).filter((token) => token !== '');
  const parts = tokens.map(parseNumberToken);
  if (parts.length === 0 || parts.length > 2 || parts.some((part) => part === undefined)) return undefined;
  const [first, second] = parts as { value: number; isFraction: boolean }[];
  if (!first) return undefined;
  // Two parts must read as whole-plus-fraction: "3 3/16".
  if (second && (first.isFraction || !second.isFraction)) return undefined;
  const value = first.value + (second?.value ?? 0);
  const hasFraction = first.isFraction || second !== undefined;
  if (unit === 'mm' && hasFraction) return undefined;
  const isInches = hasFraction || (unit !== undefined && unit !== 'mm');
  if (!(value > 0)) return undefined;
  return isInches
    ? { mm: value * MM_PER_INCH, toleranceMm: INCH_SEARCH_TOLERANCE_MM, unit: 'in' }
    : { mm: value, toleranceMm: MM_SEARCH_TOLERANCE, unit: 'mm' };
}
