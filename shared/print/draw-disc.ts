import type { DrawingContext } from '../drawing/drawing-context.ts';
import type { DiscPiece, Hole, Layout } from '../layout/layout-types.ts';
import { MARK_REACH_PAST_HOLE_MM } from '../layout/build-pieces.ts';
import { describeNumberRange } from '../layout/hole-numbers.ts';
import { drawHoleMark } from './draw-hole.ts';
import { HOLE_NUMBER_SIZE_MM, strokes, type } from './draw-style.ts';
import { placeHoleNumbers, textRect, type MarkedHole } from './hole-labels.ts';
import type { Placement, Rect } from './imposition-types.ts';
import { describeDrill, describeLength, type KitText } from './kit-text.ts';

/**
 * A can-end disc: the cut circle (the flat inside the rim), centre cross, a construction circle
 * per ring, hole marks, and the index mark straight up that lines up with the wall's seam.
 * Sheet point of disc (x, y) is (originX + x, originY - y), y up.
 */
export function drawDisc(
  ctx: DrawingContext,
  piece: DiscPiece,
  placement: Placement,
  layout: Layout,
  text: KitText,
  flagged: ReadonlySet<string>,
  numbers: ReadonlyMap<string, number> = new Map(),
): void {
  const cx = placement.originX;
  const cy = placement.originY;
  const R = piece.diameterMm / 2;
  ctx.circle(cx, cy, R, { stroke: strokes.cut });
  ctx.line(cx - 4, cy, cx + 4, cy, strokes.cross);
  ctx.line(cx, cy - 4, cx, cy + 4, strokes.cross);

  const openingWords: Rect[] = [];
  for (const mark of layout.marks) {
    if (mark.pieceId !== piece.id) continue;
    if (mark.kind === 'ring-circle') ctx.circle(cx, cy, mark.radiusMm, { stroke: strokes.guide });
    if (mark.kind === 'opening-circle') {
      ctx.circle(cx, cy, mark.radiusMm, { stroke: strokes.cut });
      // Below the centre cross, inside the opening when there is room, else under it.
      const y = mark.radiusMm > 14 ? cy + 7 : cy + mark.radiusMm + 3.5;
      const size = describeLength(mark.radiusMm * 2, text);
      ctx.text(cx, y, text.cutOpening, { ...type.small, anchor: 'middle' });
      ctx.text(cx, y + 3.6, size, { ...type.small, anchor: 'middle' });
      openingWords.push(textRect(cx, y, text.cutOpening, type.small.sizeMm, 'middle'), textRect(cx, y + 3.6, size, type.small.sizeMm, 'middle'));
    }
  }
  // Index mark: a small triangle pointing at the rim, straight up.
  ctx.polyline([[cx, cy - R], [cx - 1.6, cy - R - 3], [cx + 1.6, cy - R - 3]], { fill: 'ink', closed: true });
  ctx.text(cx + 2.5, cy - R - 1.2, text.indexMark, type.tiny);

  const sizes = new Map<string, { hole: Hole; count: number }>();
  const rows = new Map<string, MarkedHole[]>();
  const shown: number[] = [];
  for (const hole of layout.holes) {
    if (hole.pieceId !== piece.id) continue;
    drawHoleMark(ctx, cx + hole.xMm, cy - hole.yMm, hole.diameterMm, flagged.has(hole.id));
    const size = sizes.get(hole.drillId);
    if (size) size.count++;
    else sizes.set(hole.drillId, { hole, count: 1 });
    const number = numbers.get(hole.id);
    if (number === undefined) continue;
    shown.push(number);
    // Outward from the centre (sheet y runs down); a hole at the centre gets its number below.
    const r = Math.hypot(hole.xMm, hole.yMm);
    const out: [number, number] = r > 1e-6 ? [hole.xMm / r, -hole.yMm / r] : [0, 1];
    const ring = `${hole.sourceId}@${Math.round(r * 10)}`;
    const mark = { x: cx + hole.xMm, y: cy - hole.yMm, radiusMm: hole.diameterMm / 2, reachMm: hole.diameterMm / 2 + MARK_REACH_PAST_HOLE_MM, number, towards: numberPlaces(out) };
    const row = rows.get(ring);
    if (row) row.push(mark);
    else rows.set(ring, [mark]);
  }
  // Numbers stay on the paper disc, clear of the centre cross and any opening's words.
  const reserved = [{ x: cx - 4, y: cy - 4, width: 8, height: 8 }, ...openingWords];
  const onDisc = (box: { x: number; y: number; width: number; height: number }) =>
    [box.x, box.x + box.width].every((x) => [box.y, box.y + box.height].every((y) => Math.hypot(x - cx, y - cy) <= R - 0.5));
  for (const n of placeHoleNumbers([...rows.values()], { x: cx - R, y: cy - R, width: 2 * R, height: 2 * R }, reserved, HOLE_NUMBER_SIZE_MM, onDisc)) {
    ctx.text(n.x, n.y, n.text, { ...type.tiny, sizeMm: HOLE_NUMBER_SIZE_MM, anchor: 'middle', color: 'ink' });
  }
  ctx.text(placement.rect.x + 1, placement.rect.y + 4, piece.name, type.title);
  const summary = [...sizes.values()].map(({ hole, count }) => `${count} × ${describeDrill(hole, text)}`).join(', ');
  const range = describeNumberRange(shown);
  const line = summary ? `${text.cutOut} · ${summary}${range ? ` · ${text.holeNumbers(range)}` : ''}` : text.cutOut;
  ctx.text(cx, cy + R + 4.2, line, { ...type.small, anchor: 'middle' });
}

/** Where a disc hole's number goes, best first: straight out from the centre, then between the crosshair's arms, nearest the outward side first. */
function numberPlaces(out: [number, number]): [number, number][] {
  const d = Math.SQRT1_2;
  // Below and right is the flag's place (draw-hole.ts).
  const diagonals: [number, number][] = [[-d, d], [d, -d], [-d, -d]];
  return [out, ...diagonals.sort((a, b) => b[0] * out[0] + b[1] * out[1] - (a[0] * out[0] + a[1] * out[1]))];
}
