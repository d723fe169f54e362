import { holeAreaMm2 } from './open-area.ts';

/**
 * Holes of one drill needed to reach an open area: the smallest count whose area is not below
 * the target (a hair of tolerance, so 45.0000000001 holes is 45).
 */
export function holesForArea(targetAreaMm2: number, diameterMm: number): number {
  if (targetAreaMm2 <= 0) return 0;
  return Math.ceil(targetAreaMm2 / holeAreaMm2(diameterMm) - 1e-9);
}

/** The primary area that puts primary : secondary at the target ratio. */
export function primaryAreaForRatio(secondaryAreaMm2: number, targetRatio: number): number {
  return secondaryAreaMm2 * targetRatio;
}
