import type { DrawingContext } from '../drawing/drawing-context.ts';
import type { DiscPiece, Hole, Layout } from '../layout/layout-types.ts';
import { drawHoleMark } from './draw-hole.ts';
import { strokes, type } from './draw-style.ts';
import type { Placement } from './imposition-types.ts';
import { describeDrill, describeLength, type KitText } from './kit-text.ts';

/**
 * A can-end disc: the cut circle (the flat inside the rim), centre cross, a construction circle
 * per ring, hole marks, and the index mark straight up that lines up with the wall's seam.
 * Sheet point of disc (x, y) is (originX + x, originY - y), y up.
 */
export function drawDisc(ctx: DrawingContext, piece: DiscPiece, placement: Placement, layout: Layout, text: KitText, flagged: Set<string>): void {
  const cx = placement.originX;
  const cy = placement.originY;
  const R = piece.diameterMm / 2;
  ctx.circle(cx, cy, R, { stroke: strokes.cut });
  ctx.line(cx - 4, cy, cx + 4, cy, strokes.cross);
  ctx.line(cx, cy - 4, cx, cy + 4, strokes.cross);

  for (const mark of layout.marks) {
    if (mark.pieceId !== piece.id) continue;
    if (mark.kind === 'ring-circle') ctx.circle(cx, cy, mark.radiusMm, { stroke: strokes.guide });
    if (mark.kind === 'opening-circle') {
      ctx.circle(cx, cy, mark.radiusMm, { stroke: strokes.cut });
      // Below the centre cross, inside the opening when there is room, else under it.
      const y = mark.radiusMm > 14 ? cy + 7 : cy + mark.radiusMm + 3.5;
      ctx.text(cx, y, text.cutOpening, { ...type.small, anchor: 'middle' });
      ctx.text(cx, y + 3.6, describeLength(mark.radiusMm * 2, text), { ...type.small, anchor: 'middle' });
    }
  }
  // Index mark: a small triangle pointing at the rim, straight up.
  ctx.polyline([[cx, cy - R], [cx - 1.6, cy - R - 3], [cx + 1.6, cy - R - 3]], { fill: 'ink', closed: true });
  ctx.text(cx + 2.5, cy - R - 1.2, text.indexMark, type.tiny);

  const sizes = new Map<string, { hole: Hole; count: number }>();
  for (const hole of layout.holes) {
    if (hole.pieceId !== piece.id) continue;
    drawHoleMark(ctx, cx + hole.xMm, cy - hole.yMm, hole.diameterMm, flagged.has(hole.id));
    const size = sizes.get(hole.drillId);
    if (size) size.count++;
    else sizes.set(hole.drillId, { hole, count: 1 });
  }
  ctx.text(placement.rect.x + 1, placement.rect.y + 4, piece.name, type.title);
  const summary = [...sizes.values()].map(({ hole, count }) => `${count} × ${describeDrill(hole, text)}`).join(', ');
  ctx.text(cx, cy + R + 4.2, summary ? `${text.cutOut} · ${summary}` : text.cutOut, { ...type.small, anchor: 'middle' });
}
