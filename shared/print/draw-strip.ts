import { estimateTextWidthMm, type DrawingContext } from '../drawing/drawing-context.ts';
import type { Hole, Layout, WrapStripPiece } from '../layout/layout-types.ts';
import { drawHoleMark } from './draw-hole.ts';
import { strokes, type } from './draw-style.ts';
import type { Placement } from './imposition-types.ts';
import { describeDrill, type KitText } from './kit-text.ts';

/**
 * A wrap strip (or one tile of it): outline, the bottom edge that sits on the can's bottom, the
 * seam line at the start, the overlap tab past the end, row guides, hole marks and labels. Sheet
 * x = originX + strip x; sheet y = originY - strip y (strip y is up from the bottom edge).
 */
export function drawStrip(ctx: DrawingContext, piece: WrapStripPiece, placement: Placement, layout: Layout, text: KitText, flagged: Set<string>): void {
  const L = piece.lengthMm;
  const H = piece.heightMm;
  const from = placement.tile?.fromXMm ?? 0;
  const to = placement.tile?.toXMm ?? L + piece.overlapTabMm;
  const sx = (x: number) => placement.originX + x;
  // Strip y runs up from the strip's own bottom edge; holes and row lines are in can y.
  const sy = (y: number) => placement.originY - y;
  const canY = (y: number) => sy(y - piece.fromYMm);
  const clip = (a: number, b: number): [number, number] | null => (Math.min(b, to) > Math.max(a, from) ? [Math.max(a, from), Math.min(b, to)] : null);

  const body = clip(0, L);
  if (body) {
    // The reference edge (set level with the can's bottom or rim) is drawn heavier than the cut edge.
    ctx.line(sx(body[0]), sy(0), sx(body[1]), sy(0), piece.reference === 'bottom' ? strokes.edge : strokes.cut);
    ctx.line(sx(body[0]), sy(H), sx(body[1]), sy(H), piece.reference === 'top' ? strokes.edge : strokes.cut);
  }
  const tab = clip(L, L + piece.overlapTabMm);
  if (tab) {
    ctx.polyline([[sx(tab[0]), sy(0)], [sx(tab[1]), sy(0)], [sx(tab[1]), sy(H)], [sx(tab[0]), sy(H)]], { stroke: strokes.cut });
    if (tab[1] - tab[0] > 6) ctx.text(sx((tab[0] + tab[1]) / 2) + 1, sy(H / 2), text.tapeTab, { ...type.small, anchor: 'middle', rotateDeg: 90 });
  }
  if (from <= 0) {
    ctx.line(sx(0), sy(0), sx(0), sy(H), strokes.edge);
    ctx.text(sx(0) + 1.5, sy(H) + 4, text.seamStart, type.small);
  }
  if (L >= from && L <= to) ctx.line(sx(L), sy(0), sx(L), sy(H), { ...strokes.guide, color: 'ink' });
  if (piece.reference === 'bottom') ctx.text(sx(body ? body[0] : from) + 1.5, sy(0) - 1.5, text.bottomEdge, type.tiny);
  else ctx.text(sx(body ? body[0] : from) + 1.5, sy(H) + 2.6, text.topEdge, type.tiny);

  for (const mark of layout.marks) {
    if (mark.kind !== 'row-line' || mark.pieceId !== piece.id) continue;
    const span = clip(0, L);
    if (span) ctx.line(sx(span[0]), canY(mark.yMm), sx(span[1]), canY(mark.yMm), strokes.guide);
  }

  for (const mark of layout.marks) if (mark.kind === 'collar-scale' && mark.pieceId === piece.id) drawCollarScale(ctx, mark.ticks, H, from, to, sx, sy, text);

  const rows = new Map<string, Hole[]>();
  for (const hole of layout.holes) {
    if (hole.pieceId !== piece.id) continue;
    rows.set(hole.sourceId, [...(rows.get(hole.sourceId) ?? []), hole]);
    if (hole.xMm >= from - 1e-9 && hole.xMm <= to + 1e-9) drawHoleMark(ctx, sx(hole.xMm), canY(hole.yMm), hole.diameterMm, flagged.has(hole.id));
  }
  for (const [rowId, holes] of rows) {
    const first = holes[0]!;
    const visible = holes.filter((h) => h.xMm >= from && h.xMm <= to).sort((a, b) => a.xMm - b.xMm)[0];
    if (!visible) continue;
    const rowMark = layout.marks.find((m) => m.kind === 'row-line' && m.pieceId === piece.id && m.sourceId === rowId);
    const name = rowMark?.kind === 'row-line' ? rowMark.label : rowId;
    const label = `${name}: ${holes.length} × ${describeDrill(first, text)}`;
    // Beside the row's first hole on this tile, but never past the tile's right end.
    const room = sx(Math.min(to, L + piece.overlapTabMm)) - estimateTextWidthMm(label, type.label.sizeMm) - 1;
    const labelX = Math.max(sx(from) + 1, Math.min(sx(visible.xMm) - 3, room));
    ctx.text(labelX, canY(first.yMm) - first.diameterMm / 2 - 2.6, label, type.label);
  }

  const title = placement.tile && placement.tile.count > 1 ? `${piece.name} · ${text.tile(placement.tile.number, placement.tile.count)}` : piece.name;
  ctx.text(placement.rect.x + 1, placement.rect.y + 4, title, type.title);
  if (placement.tile) drawJoins(ctx, placement, H, sx, sy, text);
}

/** Alignment marks in the shared band: the same strip x on both tiles, labelled with the join letter. */
function drawJoins(ctx: DrawingContext, placement: Placement, H: number, sx: (x: number) => number, sy: (y: number) => number, text: KitText): void {
  const tile = placement.tile!;
  const joins: [string | undefined, number, number][] = [
    [tile.joinLeft, tile.fromXMm, tile.fromXMm + tile.overlapMm],
    [tile.joinRight, tile.toXMm - tile.overlapMm, tile.toXMm],
  ];
  for (const [letter, a, b] of joins) {
    if (!letter) continue;
    const mid = (a + b) / 2;
    // Near both edges of the strip, clear of the upright join label in the middle.
    for (const y of [Math.min(6, H * 0.15), H - Math.min(6, H * 0.15)]) {
      ctx.line(sx(mid) - 3, sy(y), sx(mid) + 3, sy(y), strokes.cross);
      ctx.line(sx(mid), sy(y) - 3, sx(mid), sy(y) + 3, strokes.cross);
      ctx.circle(sx(mid), sy(y), 1.5, { stroke: strokes.cross });
    }
    ctx.line(sx(a), sy(0), sx(a), sy(H), strokes.guide);
    ctx.line(sx(b), sy(0), sx(b), sy(H), strokes.guide);
    // Upright in the narrow shared band, so it never runs past the tile.
    ctx.text(sx(mid) + 1, sy(H / 2), text.join(letter), { ...type.label, anchor: 'middle', weight: 'bold', rotateDeg: 90 });
  }
}

/**
 * An intake collar's scale: a tick down from the top edge at each setting's turn, labelled, and the
 * way to read it. Ticks are strip x, so they go through the same placement as the holes.
 */
function drawCollarScale(
  ctx: DrawingContext,
  ticks: { xMm: number; label: string }[],
  H: number,
  from: number,
  to: number,
  sx: (x: number) => number,
  sy: (y: number) => number,
  text: KitText,
): void {
  const shown = ticks.filter((t) => t.xMm >= from - 1e-9 && t.xMm <= to + 1e-9);
  if (shown.length === 0) return;
  for (const tick of shown) {
    ctx.line(sx(tick.xMm), sy(H), sx(tick.xMm), sy(H - 3), strokes.edge);
    // Upright, hanging from the tick: marks a few mm apart still read apart.
    ctx.text(sx(tick.xMm) + 0.7, sy(H - 3.5), tick.label, { ...type.tiny, anchor: 'end', rotateDeg: 90 });
  }
  const leftmost = Math.min(...shown.map((t) => t.xMm));
  ctx.text(sx(leftmost) - 2, sy(H) + 2.6, text.collarScale, { ...type.tiny, anchor: 'end' });
}
