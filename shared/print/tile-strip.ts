import type { StripTile } from './imposition-types.ts';

/**
 * Width of the band two neighbouring tiles of a strip share, where the alignment marks go
 * and the tape goes over (common practice, no source).
 */
export const TILE_OVERLAP_MM = 12;

/** Room for float error when comparing lengths, well under anything a printer can show. */
const EPS_MM = 1e-9;

/** The fewest tiles no wider than maxWidthMm that cover totalMm, neighbours sharing overlapMm. */
export function countTiles(totalMm: number, maxWidthMm: number, overlapMm = TILE_OVERLAP_MM): number {
  if (totalMm <= maxWidthMm + EPS_MM) return 1;
  if (maxWidthMm <= overlapMm) return Infinity;
  // n tiles cover n * w - (n - 1) * overlap.
  return Math.ceil((totalMm - overlapMm) / (maxWidthMm - overlapMm) - EPS_MM);
}

/**
 * Splits a strip's x range 0..totalMm into equal tiles (equal so that no sheet carries a sliver),
 * each starting overlapMm before the previous one ends. Tiles are numbered 1..n and the joins
 * lettered A, B, C... from the seam end. A strip that fits in one piece gets one tile, no joins.
 */
export function splitStrip(totalMm: number, maxWidthMm: number, overlapMm = TILE_OVERLAP_MM): StripTile[] {
  const count = countTiles(totalMm, maxWidthMm, overlapMm);
  if (!Number.isFinite(count)) {
    throw new RangeError(`A ${maxWidthMm} mm wide tile cannot overlap its neighbour by ${overlapMm} mm.`);
  }
  const width = (totalMm + (count - 1) * overlapMm) / count;
  const tiles: StripTile[] = [];
  let fromXMm = 0;
  for (let number = 1; number <= count; number++) {
    const toXMm = number === count ? totalMm : fromXMm + width;
    tiles.push({
      number,
      count,
      fromXMm,
      toXMm,
      ...(number > 1 ? { joinLeft: nameJoin(number - 2) } : {}),
      ...(number < count ? { joinRight: nameJoin(number - 1) } : {}),
      overlapMm,
    });
    fromXMm = toXMm - overlapMm;
  }
  return tiles;
}

/** Join letters as spreadsheet columns: 0 -> A, 25 -> Z, 26 -> AA. */
export function nameJoin(index: number): string {
  let name = '';
  for (let n = index + 1; n > 0; n = Math.floor((n - 1) / 26)) {
    name = String.fromCharCode(65 + ((n - 1) % 26)) + name;
  }
  return name;
}
