import type { DrawingContext } from '../drawing/drawing-context.ts';
import type { Layout } from '../layout/layout-types.ts';
import { drawDisc } from './draw-disc.ts';
import { drawFurniture, type KitInfo, type LegendRow } from './draw-furniture.ts';
import { drawStrip } from './draw-strip.ts';
import type { Imposition, Placement, Sheet } from './imposition-types.ts';
import type { KitText } from './kit-text.ts';

/** Draws one sheet of a kit: its pieces (or tiles of them) and its furniture. */
export function drawKitSheet(ctx: DrawingContext, sheet: Sheet, imposition: Imposition, layout: Layout, info: KitInfo, text: KitText, numbers: ReadonlyMap<string, number>): void {
  const flagged = new Set(layout.findings.filter((f) => f.severity !== 'note').flatMap((f) => f.holeIds));
  const names: string[] = [];
  const legend = new Map<string, LegendRow>();
  let flaggedOnSheet = false;
  for (const placement of sheet.placements) {
    const piece = layout.pieces.find((p) => p.id === placement.pieceId);
    if (!piece) continue;
    if (!names.includes(piece.name)) names.push(piece.name);
    if (piece.kind === 'wrap-strip') drawStrip(ctx, piece, placement, layout, text, flagged, numbers);
    else drawDisc(ctx, piece, placement, layout, text, flagged, numbers);
    for (const hole of layout.holes) {
      if (hole.pieceId !== piece.id || !ownsHole(placement, hole.xMm)) continue;
      if (flagged.has(hole.id)) flaggedOnSheet = true;
      const row = legend.get(hole.drillId);
      if (row) row.count++;
      else legend.set(hole.drillId, { hole, count: 1 });
    }
  }
  const rows = [...legend.values()].sort((a, b) => b.hole.diameterMm - a.hole.diameterMm);
  drawFurniture(ctx, sheet, imposition.sheets.length, names.join(', '), rows, { ...info, flaggedOnSheet }, text);
}

/**
 * Whether a placement counts a hole in its sheet's drill legend. A hole in the band two tiles of a
 * strip share is drawn on both (so the tiles line up) but drilled once: the later tile counts it,
 * so the legends of all sheets add up to the design's holes.
 */
export function ownsHole(placement: Placement, holeXMm: number): boolean {
  const tile = placement.tile;
  if (!tile) return true;
  const last = tile.number === tile.count;
  return holeXMm >= tile.fromXMm && (last ? holeXMm <= tile.toXMm : holeXMm < tile.toXMm - tile.overlapMm);
}
