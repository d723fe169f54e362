import { vesselSchema, type Vessel } from './vessel.ts';

/** A can measured by the maker rather than picked from the catalogue. */

export type CircumferenceMeasurement = { circumferenceMm: number; heightMm: number; tapeThicknessMm?: number };
export type DiameterMeasurement = { diameterMm: number; heightMm: number };

/** Build a measured vessel; throws if the numbers cannot be a can (zod explains which). */
function createMeasuredVessel(diameterMm: number, heightMm: number): Vessel {
  return vesselSchema.parse({
    source: 'measured',
    name: `Measured can, ${diameterMm.toFixed(1)} mm`,
    outerDiameterMm: diameterMm,
    heightMm,
  });
}

/**
 * From a tape round the can. A tape of thickness t reads pi * (D + t), so D = C / pi - t.
 */
export function vesselFromCircumference({ circumferenceMm, heightMm, tapeThicknessMm = 0 }: CircumferenceMeasurement): Vessel {
  if (!Number.isFinite(tapeThicknessMm) || tapeThicknessMm < 0) {
    throw new RangeError(`Tape thickness must be 0 mm or more, got ${tapeThicknessMm}.`);
  }
  return createMeasuredVessel(circumferenceMm / Math.PI - tapeThicknessMm, heightMm);
}

/** From a calliper across the seam or rim. */
export function vesselFromDiameter({ diameterMm, heightMm }: DiameterMeasurement): Vessel {
  return createMeasuredVessel(diameterMm, heightMm);
}
