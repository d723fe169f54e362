import { MAX_HOLES_PER_ROW, type Rules, type SideRow } from '../design/design-schema.ts';
import { placeSideRow } from './side-row.ts';
import { findWidestGap, gapOnWallMm } from './widest-gap.ts';

export interface JetCountAnswer {
  /** Fewest positions whose widest gap stays within the warning pitch; null when none up to the row cap does. */
  fewest: { count: number; pitchMm: number } | null;
  /** Most holes of this drill that still leave the minimum metal between neighbours (equal pitch, no keep-outs). */
  most: number;
}

/** The widest gap between the holes a row would place, as metal length on the can. */
function widestPitchMm(row: SideRow, drillDiameterMm: number, wallDiameterMm: number): number {
  const { positions } = placeSideRow(row, drillDiameterMm, wallDiameterMm);
  if (positions.length < 2) return Infinity;
  const angles = positions.map((p) => p.angleDeg).sort((a, b) => a - b);
  return gapOnWallMm(findWidestGap(angles).gapDeg, wallDiameterMm);
}

/**
 * How many jets a row needs so their flames join into one ring on this can with this drill:
 * the fewest positions that keep every gap (keep-outs and left-out positions included, as the
 * jet-pitch check counts them) at or under the design's warning pitch, and the most that still
 * leave the design's minimum metal between holes. Pitch is arc length on the can, as the check measures it.
 */
export function solveJetCount(row: SideRow, drillDiameterMm: number, wallDiameterMm: number, rules: Pick<Rules, 'jetPitchWarnMm' | 'minLigamentMm'>): JetCountAnswer {
  const most = Math.max(0, Math.floor((Math.PI * wallDiameterMm) / (drillDiameterMm + rules.minLigamentMm)));
  // No count can beat an even ring, so start the search where an even ring first fits.
  const first = Math.max(2, Math.ceil((Math.PI * wallDiameterMm) / rules.jetPitchWarnMm));
  for (let count = first; count <= MAX_HOLES_PER_ROW; count++) {
    const trial = { ...row, count, skip: row.skip.filter((s) => s < count) };
    const pitchMm = widestPitchMm(trial, drillDiameterMm, wallDiameterMm);
    if (pitchMm <= rules.jetPitchWarnMm) return { fewest: { count, pitchMm }, most };
  }
  return { fewest: null, most };
}
