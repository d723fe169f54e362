/**
 * The one small drawing interface that the canvas preview, the PDF writer and the SVG writer
 * implement, so a hole cannot be in one place on screen and another on paper. Units are mm on
 * the sheet, origin at its top-left corner, y downwards (as in SVG and canvas; the PDF writer
 * flips). Colours are named from a small palette that each writer maps to its own values.
 */
export type InkColor = 'ink' | 'soft' | 'guide' | 'accent' | 'paper';

export interface Stroke {
  widthMm: number;
  color?: InkColor;
  /** Dash and gap lengths in mm. */
  dashMm?: number[];
}

export interface ShapeStyle {
  stroke?: Stroke;
  fill?: InkColor;
}

export interface TextStyle {
  sizeMm: number;
  weight?: 'regular' | 'bold';
  /** Where x is: at the start, the middle or the end of the text. */
  anchor?: 'start' | 'middle' | 'end';
  color?: InkColor;
  /** Turned counter-clockwise about (x, y), degrees. */
  rotateDeg?: number;
}

export interface DrawingContext {
  line(x1: number, y1: number, x2: number, y2: number, stroke: Stroke): void;
  /** An open or closed chain of straight segments. */
  polyline(points: readonly (readonly [number, number])[], style: ShapeStyle & { closed?: boolean }): void;
  rect(x: number, y: number, width: number, height: number, style: ShapeStyle): void;
  /** A true circle: holes stay circles in SVG for cutters and drawing programs. */
  circle(cx: number, cy: number, r: number, style: ShapeStyle): void;
  /** Text with its baseline at y. */
  text(x: number, y: number, text: string, style: TextStyle): void;
}

/** RGB for each palette colour, 0-1 (print-safe dark inks; guides in a light grey). */
export const palette: Record<InkColor, readonly [number, number, number]> = {
  ink: [0.1, 0.1, 0.1],
  soft: [0.35, 0.33, 0.3],
  guide: [0.62, 0.62, 0.62],
  accent: [0.7, 0.3, 0.11],
  paper: [1, 1, 1],
};

/** The font every writer uses (IBM Plex Sans, shipped with the app); metrics for layout below. */
export const FONT_FAMILY = 'IBM Plex Sans';

/**
 * Advance width of text in mm, estimated from IBM Plex Sans's average character width (about
 * 0.53 em regular, 0.56 em bold; measured on its metrics, from memory). Used to reserve room for
 * labels; writers draw with the real font.
 */
export function estimateTextWidthMm(text: string, sizeMm: number, weight: 'regular' | 'bold' = 'regular'): number {
  return text.length * sizeMm * (weight === 'bold' ? 0.56 : 0.53);
}
