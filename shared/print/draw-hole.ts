import type { DrawingContext } from '../drawing/drawing-context.ts';
import { MARK_REACH_PAST_HOLE_MM } from '../layout/build-pieces.ts';
import { strokes } from './draw-style.ts';

/** Centre dot for the punch (0.7 mm across): common practice, no source. */
const DOT_RADIUS_MM = 0.35;

/**
 * One hole mark: a circle of the true drill diameter, a crosshair reaching past it, and a
 * small centre dot to set the centre punch in.
 */
export function drawHoleMark(ctx: DrawingContext, x: number, y: number, diameterMm: number, highlighted = false): void {
  const r = diameterMm / 2;
  const reach = r + MARK_REACH_PAST_HOLE_MM;
  ctx.circle(x, y, r, { stroke: highlighted ? { ...strokes.hole, color: 'accent', widthMm: 0.4 } : strokes.hole });
  ctx.line(x - reach, y, x + reach, y, strokes.cross);
  ctx.line(x, y - reach, x, y + reach, strokes.cross);
  ctx.circle(x, y, DOT_RADIUS_MM, { fill: 'ink' });
  // Below and right of the crosshair, clear of the row label above the holes.
  if (highlighted) drawFlagSymbol(ctx, x + reach * Math.SQRT1_2, y + reach * Math.SQRT1_2);
}

/** Side of the flag triangle (common practice, no source: big enough to see at arm's length). */
export const FLAG_SIDE_MM = 3;

/**
 * The mark of a hole a check flagged, in ink so it survives a black-and-white printer: a filled
 * triangle, point up, its centre at (x, y). The sheet's legend and the build sheet explain it.
 */
export function drawFlagSymbol(ctx: DrawingContext, x: number, y: number): void {
  const s = FLAG_SIDE_MM;
  const h = (s * Math.sqrt(3)) / 2;
  ctx.polyline(
    [
      [x, y - (2 * h) / 3],
      [x + s / 2, y + h / 3],
      [x - s / 2, y + h / 3],
    ],
    { stroke: { widthMm: 0.2, color: 'ink' }, fill: 'ink', closed: true },
  );
}
