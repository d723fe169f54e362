import { z } from 'zod';
import { unitSystems } from '../units/length.ts';
import { vesselSchema } from '../vessels/vessel.ts';

/**
 * A stove design: the one document makers save, share and print from. It is also the JSON file
 * format (schemaVersion marks its shape). Lengths in mm, angles in degrees counter-clockwise seen
 * from above for walls, and seen from the outside face for can ends; 0 deg is the design's
 * reference line, and each vessel says where its side seam sits.
 */
export const DESIGN_SCHEMA_VERSION = 1;

/** Hard caps: beyond these a request is an error, not a long wait. */
export const MAX_HOLES = 2000;
export const MAX_HOLES_PER_ROW = 720;
export const MAX_PARTS = 6;
export const MAX_SIDE_ROWS = 12;
export const MAX_END_PATTERNS = 4;
export const MAX_KEEP_OUTS = 12;
export const MAX_EXPLICIT_RINGS = 20;

const id = z.string().trim().min(1).max(60);
const label = z.string().trim().max(80);
const angleDeg = z.number().min(-360).max(720);
const drillId = z.string().trim().min(1).max(20);

/** What a hole is for: primary air, secondary air (jets), shell intake, or anything else. */
export const holeGroupSchema = z.enum(['primary', 'secondary', 'intake', 'other']);
export type HoleGroup = z.infer<typeof holeGroupSchema>;

/** An arc of wall where holes may not go (seam, handle, window), from startDeg counter-clockwise to endDeg. */
export const keepOutSchema = z.object({ label: label.default('keep-out'), startDeg: angleDeg, endDeg: angleDeg });
export type KeepOut = z.infer<typeof keepOutSchema>;

export const sideRowSchema = z.object({
  id,
  label: label.optional(),
  group: holeGroupSchema,
  drillId,
  /** Number of equally spaced positions around the wall. */
  count: z.number().int().min(1).max(MAX_HOLES_PER_ROW),
  /** Positions (0 = at startDeg) left empty, e.g. the one at the seam. */
  skip: z.array(z.number().int().min(0)).max(MAX_HOLES_PER_ROW).default([]),
  /** Height of the hole centres, from the bottom edge or below the top edge. */
  height: z.object({ from: z.enum(['bottom', 'top']), mm: z.number().min(0).max(1000) }),
  startDeg: angleDeg.default(0),
  keepOuts: z.array(keepOutSchema).max(MAX_KEEP_OUTS).default([]),
  /** drop: holes inside a keep-out are left out; respace: all `count` holes share the free arc. */
  keepOutPolicy: z.enum(['drop', 'respace']).default('drop'),
});
export type SideRow = z.infer<typeof sideRowSchema>;

export const explicitRingSchema = z.object({
  radiusMm: z.number().positive().max(400),
  count: z.number().int().min(1).max(MAX_HOLES_PER_ROW),
  phaseDeg: angleDeg.default(0),
});
export type ExplicitRing = z.infer<typeof explicitRingSchema>;

/** How the rings of an end pattern are made. */
export const ringPlanSchema = z.discriminatedUnion('strategy', [
  /** Counts double ring by ring (4, 8, 16...), easy to mark with a centre finder and dividers. */
  z.object({
    strategy: z.literal('divider'),
    ringCount: z.number().int().min(1).max(8),
    firstCount: z.number().int().min(1).max(64).default(4),
    firstRadiusMm: z.number().positive().max(400),
    ringSpacingMm: z.number().positive().max(400),
  }),
  /** The count grows with the radius so that neighbours stay about targetPitchMm apart. */
  z.object({
    strategy: z.literal('equal-pitch'),
    ringCount: z.number().int().min(1).max(20),
    targetPitchMm: z.number().positive().max(400),
    firstRadiusMm: z.number().positive().max(400),
    ringSpacingMm: z.number().positive().max(400),
  }),
  z.object({ strategy: z.literal('explicit'), rings: z.array(explicitRingSchema).max(MAX_EXPLICIT_RINGS) }),
]);
export type RingPlan = z.infer<typeof ringPlanSchema>;

export const endPatternSchema = z.object({
  id,
  label: label.optional(),
  group: holeGroupSchema,
  face: z.enum(['bottom', 'lid']).default('bottom'),
  drillId,
  centerHole: z.boolean().default(false),
  rings: ringPlanSchema,
  /** Turn each ring by half its own pitch against the ring inside it, so holes do not line up radially. */
  stagger: z.boolean().default(false),
  /** Phase of the first ring, degrees from the index mark. */
  phaseDeg: angleDeg.default(0),
});
export type EndPattern = z.infer<typeof endPatternSchema>;

export const partRoleSchema = z.enum(['burn-chamber', 'shell', 'concentrator', 'pot-stand', 'intake-collar']);
export type PartRole = z.infer<typeof partRoleSchema>;

export const partSchema = z.object({
  id,
  role: partRoleSchema,
  name: label.optional(),
  vessel: vesselSchema,
  sideRows: z.array(sideRowSchema).max(MAX_SIDE_ROWS).default([]),
  endPatterns: z.array(endPatternSchema).max(MAX_END_PATTERNS).default([]),
  /** Concentrator only: diameter of the opening the flame passes through. */
  openingDiameterMm: z.number().positive().max(600).optional(),
  /**
   * Where this can's bottom stands, measured up from the bottom of the shell; empty for where such
   * a part usually sits (shared/layout/assembly.ts: a chamber's top level with the shell's top, a
   * concentrator and a pot stand each on what is below).
   */
  bottomAtMm: z.number().min(0).max(1000).optional(),
});
export type Part = z.infer<typeof partSchema>;
export type PartInput = z.input<typeof partSchema>;

/**
 * Limits the checks use; every default is a rule of thumb (common practice, no source): 3 mm of
 * metal between holes, jets at most 5/8 in apart (warning) and 3/4 in (error), hole edges 3 mm
 * clear of the welded side seam, 6 mm below the top rim and above the bottom chime, 3 mm inside
 * the rim of a can end.
 */
export const rulesSchema = z.object({
  minLigamentMm: z.number().min(0).max(50).default(3),
  jetPitchWarnMm: z.number().positive().max(200).default(15.875),
  jetPitchErrorMm: z.number().positive().max(200).default(19.05),
  seamMarginMm: z.number().min(0).max(50).default(3),
  topMarginMm: z.number().min(0).max(50).default(6),
  chimeMarginMm: z.number().min(0).max(50).default(6),
  rimMarginMm: z.number().min(0).max(50).default(3),
  /** Across parts (shared/layout/checks/check-fit.ts and its neighbours), all common practice, no source: */
  /** the gap round the chamber, 3 mm to 25 mm (1 in), */
  minGapMm: z.number().min(0).max(100).default(3),
  maxGapMm: z.number().positive().max(300).default(25),
  /** room under the chamber for primary air to reach its bottom holes, */
  minClearanceBelowMm: z.number().min(0).max(200).default(6),
  /** the jets' top edge this far below the shell's top, where it closes against the chamber, */
  jetsBelowShellTopMm: z.number().min(0).max(100).default(3),
  /** the shell's intake at least as open as the primary and secondary holes it feeds, */
  minIntakeRatio: z.number().min(0).max(10).default(1),
  /** a concentrator opening 0.5 to 0.7 of the chamber's diameter, */
  concentratorMinRatio: z.number().min(0.05).max(1).default(0.5),
  concentratorMaxRatio: z.number().min(0.05).max(1).default(0.7),
  /** 25 mm (1 in) of flame between the stove's top and the pot, */
  minFlameRoomMm: z.number().min(0).max(300).default(25),
  /** and a pot stand's openings at least as large as the opening the flame comes out of. */
  minExhaustRatio: z.number().min(0).max(10).default(1),
});
export type Rules = z.infer<typeof rulesSchema>;

export const designSchema = z.object({
  schemaVersion: z.literal(DESIGN_SCHEMA_VERSION),
  name: z.string().trim().min(1).max(120),
  notes: z.string().max(4000).default(''),
  units: z.enum(unitSystems).default('in'),
  paperThicknessMm: z.number().min(0).max(2).default(0.1),
  /** The maker's own drills (ids such as "frac:1/4", "num:7", "mm:4.8"); empty means every drill. */
  drillSet: z.object({ name: label.default('My drills'), drillIds: z.array(drillId).max(400) }).default({ name: 'Every drill', drillIds: [] }),
  airflow: z
    .object({
      /**
       * Primary : secondary open area (common practice 5 : 1, no source; published figures disagree).
       * Under 0.5 : 1 no stove draws its jets (common practice, no source).
       */
      targetRatio: z.number().min(0.5).max(50).default(5),
    })
    .default({ targetRatio: 5 }),
  rules: rulesSchema.default(rulesSchema.parse({})),
  parts: z.array(partSchema).min(1).max(MAX_PARTS),
});
export type Design = z.output<typeof designSchema>;
export type DesignInput = z.input<typeof designSchema>;
