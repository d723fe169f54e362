import { normalizeDeg } from './angles.ts';

/**
 * The widest angular gap between neighbours round a circle, and where it starts: index `from`
 * into the sorted angles, the gap running to the next one (wrapping round to the first).
 * A single position leaves a gap of 360 degrees.
 */
export function findWidestGap(sortedAnglesDeg: readonly number[]): { gapDeg: number; from: number; to: number } {
  let widest = { gapDeg: -1, from: 0, to: 0 };
  const n = sortedAnglesDeg.length;
  for (let i = 0; i < n; i++) {
    const next = (i + 1) % n;
    const gapDeg = i + 1 < n ? sortedAnglesDeg[next]! - sortedAnglesDeg[i]! : normalizeDeg(sortedAnglesDeg[next]! - sortedAnglesDeg[i]!) || 360;
    if (gapDeg > widest.gapDeg) widest = { gapDeg, from: i, to: next };
  }
  return widest;
}

/** A gap round a can wall as metal length on the can: its share of pi x D. */
export const gapOnWallMm = (gapDeg: number, wallDiameterMm: number) => (gapDeg / 360) * Math.PI * wallDiameterMm;
