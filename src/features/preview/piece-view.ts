import type { Bounds } from '../../../shared/drawing/drawing-bounds.ts';
import type { DrawingContext } from '../../../shared/drawing/drawing-context.ts';
import type { DiscPiece, Hole, Layout, Piece, WrapStripPiece } from '../../../shared/layout/layout-types.ts';
import { drawDisc } from '../../../shared/print/draw-disc.ts';
import { drawStrip } from '../../../shared/print/draw-strip.ts';
import { LABEL_BAND_MM, measurePiece, stripSideMm } from '../../../shared/print/footprint.ts';
import type { Placement } from '../../../shared/print/imposition-types.ts';
import type { KitText } from '../../../shared/print/kit-text.ts';
import type { ViewTransform } from './view-transform.ts';

/**
 * A whole strip on its own "sheet" at (0, 0): no tile, so drawStrip shows 0 .. length + tab. The
 * box and origin are the ones imposition gives an untiled strip (shared/print/impose.ts).
 */
export function placeWholeStrip(piece: WrapStripPiece): Placement {
  const { width, height } = measurePiece(piece);
  return { pieceId: piece.id, rect: { x: 0, y: 0, width, height }, originX: stripSideMm(piece), originY: LABEL_BAND_MM + piece.heightMm };
}

/** A disc in its labelled square at (0, 0), centred. */
export function placeWholeDisc(piece: DiscPiece): Placement {
  const { width, height } = measurePiece(piece);
  return { pieceId: piece.id, rect: { x: 0, y: 0, width, height }, originX: width / 2, originY: height / 2 };
}

export function placeWholePiece(piece: Piece): Placement {
  return piece.kind === 'wrap-strip' ? placeWholeStrip(piece) : placeWholeDisc(piece);
}

/**
 * The largest scale (CSS px per mm) that shows all of `bounds` inside a widthPx x heightPx view
 * with paddingPx clear on every side, centred.
 */
export function fitView(bounds: Bounds, widthPx: number, heightPx: number, paddingPx: number): ViewTransform {
  const width = Math.max(bounds.maxX - bounds.minX, 1e-6);
  const height = Math.max(bounds.maxY - bounds.minY, 1e-6);
  // A view smaller than its padding still gets one pixel to draw in, never a negative scale.
  const room = (px: number) => Math.max(px - 2 * paddingPx, Math.min(px, 1), 1e-3);
  const scale = Math.min(room(widthPx) / width, room(heightPx) / height);
  return {
    scale,
    offsetX: widthPx / 2 - (scale * (bounds.minX + bounds.maxX)) / 2,
    offsetY: heightPx / 2 - (scale * (bounds.minY + bounds.maxY)) / 2,
  };
}

/** Holes named by error and warning findings: the kit draws these highlighted. */
export function flaggedHoleIds(layout: Layout): Set<string> {
  return new Set(layout.findings.filter((f) => f.severity !== 'note').flatMap((f) => f.holeIds));
}

/** Where a hole's centre lands on the sheet, by the placement contract of drawStrip and drawDisc. */
export function locateHole(piece: Piece, placement: Placement, hole: Hole): [number, number] {
  if (piece.kind === 'disc') return [placement.originX + hole.xMm, placement.originY - hole.yMm];
  return [placement.originX + hole.xMm, placement.originY - (hole.yMm - piece.fromYMm)];
}

/** One piece as it prints: a white paper box under the kit's own drawing of the piece. */
export function drawPieceView(ctx: DrawingContext, layout: Layout, piece: Piece, placement: Placement, text: KitText, flagged: Set<string>, numbers?: ReadonlyMap<string, number>): void {
  const { x, y, width, height } = placement.rect;
  ctx.rect(x, y, width, height, { fill: 'paper' });
  if (piece.kind === 'wrap-strip') drawStrip(ctx, piece, placement, layout, text, flagged, numbers);
  else drawDisc(ctx, piece, placement, layout, text, flagged, numbers);
}
