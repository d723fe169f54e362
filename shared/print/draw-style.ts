import type { Stroke, TextStyle } from '../drawing/drawing-context.ts';

/** Line weights and type sizes of the printed kit, in mm (0.35 mm is a fine pen line). */
export const strokes = {
  cut: { widthMm: 0.35, color: 'ink' },
  edge: { widthMm: 0.5, color: 'ink' },
  hole: { widthMm: 0.25, color: 'ink' },
  cross: { widthMm: 0.15, color: 'ink' },
  guide: { widthMm: 0.15, color: 'guide', dashMm: [1.5, 1] },
  tick: { widthMm: 0.15, color: 'ink' },
  frame: { widthMm: 0.2, color: 'soft' },
} satisfies Record<string, Stroke>;

/** Type sizes (em in mm): labels at 2.8 mm are 8 pt, readable at arm's length; nothing below 2 mm (5.7 pt). */
export const type = {
  title: { sizeMm: 3.6, weight: 'bold', color: 'ink' },
  label: { sizeMm: 2.8, color: 'ink' },
  small: { sizeMm: 2.4, color: 'soft' },
  tiny: { sizeMm: 2.0, color: 'soft' },
} satisfies Record<string, TextStyle>;

/** Hole numbers: small upright digits in ink, readable at arm's length (common practice, no source). */
export const HOLE_NUMBER_SIZE_MM = 2;
