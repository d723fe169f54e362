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
}
