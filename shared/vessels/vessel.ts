import { z } from 'zod';

/**
 * A vessel is one can of a stove, treated as a plain cylinder. Lengths in millimetres.
 */

/** Office/printer paper is about 0.10 mm thick (80 g/m² copy paper; from memory). */
export const DEFAULT_PAPER_THICKNESS_MM = 0.1;

/** Typical tinplate for food cans is 0.15-0.30 mm (from memory); 0.25 is a middle value. */
export const DEFAULT_WALL_THICKNESS_MM = 0.25;

/** The bottom rim (chime) takes about 4 mm before the flat starts (common practice, no source). */
export const DEFAULT_BOTTOM_RIM_INSET_MM = 4;

/**
 * Plausible can sizes: from a 1 in (25.4 mm) tin to a 600 mm drum across, 25 mm to 1 m tall.
 * Anything outside is a typing slip (0.01 mm, 10 m), refused before any layout is tried
 * (common practice, no source).
 */
export const VESSEL_LIMITS = { minDiameterMm: 25.4, maxDiameterMm: 600, minHeightMm: 25, maxHeightMm: 1000, minWallMm: 0.05, maxWallMm: 5, maxRimInsetMm: 50 } as const;

export const vesselSchema = z
  .object({
    source: z.enum(['catalogue', 'measured']),
    catalogueId: z.string().min(1).optional(),
    name: z.string().trim().min(1),
    /** Over the seam or rim: the widest part, the size a shell must clear. */
    outerDiameterMm: z.number().min(VESSEL_LIMITS.minDiameterMm).max(VESSEL_LIMITS.maxDiameterMm),
    heightMm: z.number().min(VESSEL_LIMITS.minHeightMm).max(VESSEL_LIMITS.maxHeightMm),
    wallThicknessMm: z.number().min(VESSEL_LIMITS.minWallMm).max(VESSEL_LIMITS.maxWallMm).default(DEFAULT_WALL_THICKNESS_MM),
    /** Where the side seam is, so holes can avoid it; 0 = template start. */
    seamAngleDeg: z.number().min(0).max(360).default(0),
    bottomRimInsetMm: z.number().min(0).max(VESSEL_LIMITS.maxRimInsetMm).default(DEFAULT_BOTTOM_RIM_INSET_MM),
  })
  .strict();

export type Vessel = z.infer<typeof vesselSchema>;
export type VesselInput = z.input<typeof vesselSchema>;

/** Diameter of the flat part of the bottom, inside the rim. */
export function usableBottomDiameterMm(v: Vessel): number {
  return Math.max(0, v.outerDiameterMm - 2 * v.bottomRimInsetMm);
}

/**
 * Length of a paper strip that wraps once round the vessel. The paper's centre line runs on a
 * circle of diameter D + t, so its length is pi * (D + t) (circle circumference).
 */
export function wrapStripLengthMm(v: Vessel, paperThicknessMm = DEFAULT_PAPER_THICKNESS_MM): number {
  return Math.PI * (v.outerDiameterMm + paperThicknessMm);
}
