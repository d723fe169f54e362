import type { DrawingContext } from '../drawing/drawing-context.ts';
import type { Layout } from '../layout/layout-types.ts';
import { drawDisc } from './draw-disc.ts';
import { drawFurniture, type KitInfo, type LegendRow } from './draw-furniture.ts';
import { drawStrip } from './draw-strip.ts';
import type { Imposition, Sheet } from './imposition-types.ts';
import type { KitText } from './kit-text.ts';

/** Draws one sheet of a kit: its pieces (or tiles of them) and its furniture. */
export function drawKitSheet(ctx: DrawingContext, sheet: Sheet, imposition: Imposition, layout: Layout, info: KitInfo, text: KitText): void {
  const flagged = new Set(layout.findings.filter((f) => f.severity !== 'note').flatMap((f) => f.holeIds));
  const names: string[] = [];
  const legend = new Map<string, LegendRow>();
  for (const placement of sheet.placements) {
    const piece = layout.pieces.find((p) => p.id === placement.pieceId);
    if (!piece) continue;
    if (!names.includes(piece.name)) names.push(piece.name);
    if (piece.kind === 'wrap-strip') drawStrip(ctx, piece, placement, layout, text, flagged);
    else drawDisc(ctx, piece, placement, layout, text, flagged);
    const from = placement.tile?.fromXMm ?? -Infinity;
    const to = placement.tile?.toXMm ?? Infinity;
    for (const hole of layout.holes) {
      if (hole.pieceId !== piece.id || (piece.kind === 'wrap-strip' && (hole.xMm < from || hole.xMm > to))) continue;
      const row = legend.get(hole.drillId);
      if (row) row.count++;
      else legend.set(hole.drillId, { hole, count: 1 });
    }
  }
  const rows = [...legend.values()].sort((a, b) => b.hole.diameterMm - a.hole.diameterMm);
  drawFurniture(ctx, sheet, imposition.sheets.length, names.join(', '), rows, info, text);
}
