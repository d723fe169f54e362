import type { DrawingContext } from '../drawing/drawing-context.ts';
import type { Rect } from './imposition-types.ts';
import { strokes, type } from './draw-style.ts';

const MM_PER_INCH = 25.4;

/**
 * A calibration ruler: 100 mm with mm ticks on one edge and 4 in with 1/16 in ticks on the other,
 * from a common zero. Horizontal rulers run along x from rect.x + 2; vertical ones down y.
 * The maker measures it with a real ruler before drilling.
 */
export function drawRuler(ctx: DrawingContext, rect: Rect, axis: 'x' | 'y'): void {
  const start = 4; // room before zero for the unit names
  // Map "along" and "across" (0 = mm edge, 1 = inch edge) to sheet coordinates.
  const at = (along: number, across: number): [number, number] =>
    axis === 'x' ? [rect.x + start + along, rect.y + across * rect.height] : [rect.x + (1 - across) * rect.width, rect.y + start + along];
  const tick = (along: number, fromEdge: 0 | 1, length: number) => {
    const depth = Math.min(1, length / (axis === 'x' ? rect.height : rect.width));
    const [x1, y1] = at(along, fromEdge);
    const [x2, y2] = at(along, fromEdge === 0 ? depth : 1 - depth);
    ctx.line(x1, y1, x2, y2, strokes.tick);
  };
  // Numbers sit just past their tick (never on it), the mm numbers in the mm half and the inch
  // numbers in the inch half. Depths are measured from the mm edge; rotated text on the
  // vertical ruler has its glyphs on the other side of its baseline, hence the two depths.
  const label = (along: number, glyphFrom: number, glyphTo: number, text: string) => {
    const depth = axis === 'x' ? glyphTo : glyphFrom;
    const [x, y] = at(along + 0.5, depth / (axis === 'x' ? rect.height : rect.width));
    ctx.text(x, y, text, { ...type.tiny, anchor: axis === 'x' ? 'start' : 'end', rotateDeg: axis === 'x' ? 0 : 90 });
  };

  const [bx1, by1] = at(0, 0.5);
  const [bx2, by2] = at(100, 0.5);
  ctx.line(bx1, by1, bx2, by2, strokes.frame);
  for (let mm = 0; mm <= 100; mm++) {
    tick(mm, 0, mm % 10 === 0 ? 4.5 : mm % 5 === 0 ? 3.2 : 2);
    if (mm % 10 === 0) label(mm, 4.6, 6.1, String(mm));
  }
  for (let sixteenth = 0; sixteenth <= 64; sixteenth++) {
    const length = sixteenth % 16 === 0 ? 4.5 : sixteenth % 8 === 0 ? 3.6 : sixteenth % 4 === 0 ? 2.8 : sixteenth % 2 === 0 ? 2.2 : 1.6;
    tick((sixteenth * MM_PER_INCH) / 16, 1, length);
    if (sixteenth % 16 === 0) label((sixteenth * MM_PER_INCH) / 16, 6.3, 7.8, `${sixteenth / 16}`);
  }
  label(-4, 1.3, 2.8, 'mm');
  label(-4, 9, 10.5, 'in');
}

/** The 1 in and 25 mm check squares, side by side. */
export function drawCheckSquares(ctx: DrawingContext, rect: Rect): void {
  const y = rect.y + 2;
  ctx.rect(rect.x + 2, y, MM_PER_INCH, MM_PER_INCH, { stroke: strokes.edge });
  ctx.text(rect.x + 2 + MM_PER_INCH / 2, y + MM_PER_INCH / 2 + 1, '1 in', { ...type.small, anchor: 'middle' });
  const x2 = rect.x + 2 + MM_PER_INCH + 6;
  ctx.rect(x2, y, 25, 25, { stroke: strokes.edge });
  ctx.text(x2 + 12.5, y + 12.5 + 1, '25 mm', { ...type.small, anchor: 'middle' });
}
